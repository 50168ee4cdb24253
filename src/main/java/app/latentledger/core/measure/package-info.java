/**
 * One vocabulary for a reading: which humidity reading, which coil temperature, where and on what
 * basis the airflow was taken, and every accepted range ({@link app.latentledger.core.measure.FieldLimits}).
 * The field records ({@code core.records}), the coil check ({@code core.coil}), the keypad, the log
 * analysis and the importer all speak it, so a choice is spelled once and a range is decided once.
 * Pure: imports nothing but {@code core.units} and {@code core.InvalidInputException}.
 */
package app.latentledger.core.measure;
