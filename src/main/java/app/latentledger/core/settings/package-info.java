/**
 * A tech's settings: units, default site elevation, instrument tolerances, the indoor humidity
 * target, finding-threshold overrides, theme and paper size. Pure values with their accepted
 * ranges; the store keeps them and the commands and screens read them. No storage or UI here.
 */
package app.latentledger.core.settings;
