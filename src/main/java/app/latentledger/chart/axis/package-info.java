/** Axis arithmetic shared by the charts: tick steps and label placement. Pure Java. */
package app.latentledger.chart.axis;
