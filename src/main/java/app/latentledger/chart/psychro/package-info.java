/**
 * The psychrometric chart: line families computed from {@code core.psychro} at the site's pressure,
 * the mapping between (dry bulb, humidity ratio) and device coordinates, the coil-process overlays
 * and the state readout. Pure Java; paints through {@code chart.draw.Painter}.
 */
package app.latentledger.chart.psychro;
