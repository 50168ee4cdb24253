/**
 * A small drawing interface of our own so that one chart description paints to a JavaFX canvas, to
 * a PDF page or into a recording for tests. Device units (pixels or points), y grows downwards.
 * Pure Java: no JavaFX, AWT or PDF types here.
 */
package app.latentledger.chart.draw;
