/**
 * Invented demo data for looking at the charts: a humid-coast call in the invented town of Saltreed.
 * Nothing here is a measurement; nothing here feeds a computation.
 */
package app.latentledger.chart.demo;
