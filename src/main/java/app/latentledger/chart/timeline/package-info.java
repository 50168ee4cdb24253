/**
 * The cycle timeline of a logged system: temperatures and humidity ratios of return and supply air,
 * compressor and blower bands, per-cycle moisture bars, onset marks. Min/max decimation keeps a
 * week of 1 Hz samples fast to paint without losing a peak. Pure Java; paints through a Painter.
 */
package app.latentledger.chart.timeline;
