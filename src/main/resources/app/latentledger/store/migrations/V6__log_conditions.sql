-- Version 6: what a log was analysed with is kept with it, so its water figures never change
-- silently when a later reading set brings another airflow, and its clock times read the same on
-- reopening. Logs kept before this version have conditions_stored = 0: they are analysed with the
-- visit's conditions, and the screens say so.

ALTER TABLE imported_log ADD COLUMN conditions_stored INTEGER NOT NULL DEFAULT 0 CHECK (conditions_stored IN (0, 1));
-- airflow during runs, m³/s, NULL when none was known at import
ALTER TABLE imported_log ADD COLUMN airflow_m3_per_s REAL;
ALTER TABLE imported_log ADD COLUMN airflow_from TEXT NOT NULL DEFAULT '';
-- airflow with the blower alone (fan-only speed), m³/s, NULL when the same as during runs
ALTER TABLE imported_log ADD COLUMN fan_airflow_m3_per_s REAL;
-- time zone (region id or fixed offset) the clock times were read and are shown in; '' for none
ALTER TABLE imported_log ADD COLUMN time_zone TEXT NOT NULL DEFAULT '';
