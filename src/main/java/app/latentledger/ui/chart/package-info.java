/**
 * JavaFX views of the charts: a canvas painter and Canvas-based regions that repaint through it,
 * with touch zoom, pan and tap-to-read. The charts themselves live in {@code app.latentledger.chart}.
 */
package app.latentledger.ui.chart;
