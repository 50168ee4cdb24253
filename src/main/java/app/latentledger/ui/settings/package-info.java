/**
 * The settings screen: {@link app.latentledger.ui.settings.SettingsViewModel} loads and saves the
 * tech's settings through the ledger, {@link app.latentledger.ui.settings.SettingsView} only binds.
 * Enter it with {@link app.latentledger.ui.settings.SettingsScreen#create}.
 */
package app.latentledger.ui.settings;
