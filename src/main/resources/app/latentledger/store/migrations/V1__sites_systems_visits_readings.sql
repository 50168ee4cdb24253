-- Version 1: what a tech types on a visit. All values SI; every tolerance is a ± half-width in the
-- same unit as its value. STRICT tables: SQLite refuses a value of the wrong type instead of
-- storing it silently.

CREATE TABLE site (
    id          TEXT PRIMARY KEY,
    name        TEXT NOT NULL,
    address     TEXT NOT NULL DEFAULT '',
    elevation_m REAL NOT NULL,
    notes       TEXT NOT NULL DEFAULT ''
) STRICT;

CREATE TABLE hvac_system (
    id                 TEXT PRIMARY KEY,
    site_id            TEXT NOT NULL REFERENCES site (id),
    label              TEXT NOT NULL,
    type               TEXT NOT NULL CHECK (type IN ('single-stage', 'two-stage', 'variable-capacity')),
    nominal_capacity_w REAL NOT NULL CHECK (nominal_capacity_w > 0),
    refrigerant        TEXT NOT NULL DEFAULT '',
    blower_type        TEXT NOT NULL DEFAULT '',
    fan_setting        TEXT NOT NULL DEFAULT '',
    thermostat_notes   TEXT NOT NULL DEFAULT ''
) STRICT;

CREATE INDEX hvac_system_by_site ON hvac_system (site_id);

CREATE TABLE visit (
    id              TEXT PRIMARY KEY,
    site_id         TEXT NOT NULL REFERENCES site (id),
    system_id       TEXT NOT NULL REFERENCES hvac_system (id),
    -- ISO-8601 local date-time with offset as the tablet had it; epoch seconds for ordering
    started_at      TEXT NOT NULL,
    started_epoch_s INTEGER NOT NULL,
    technician      TEXT NOT NULL,
    purpose         TEXT NOT NULL CHECK (purpose IN ('complaint', 'commissioning', 'before', 'after', 'follow-up')),
    notes           TEXT NOT NULL DEFAULT ''
) STRICT;

CREATE INDEX visit_by_site ON visit (site_id, started_epoch_s);

CREATE TABLE reading_set (
    id                      TEXT PRIMARY KEY,
    visit_id                TEXT NOT NULL REFERENCES visit (id),
    taken_at                TEXT NOT NULL,
    taken_epoch_s           INTEGER NOT NULL,
    instrument              TEXT NOT NULL DEFAULT '',
    return_db_c             REAL NOT NULL,
    return_db_tol_k         REAL NOT NULL,
    return_hum_kind         TEXT NOT NULL CHECK (return_hum_kind IN ('wet-bulb', 'rh', 'dew-point')),
    return_hum_value        REAL NOT NULL,
    return_hum_tol          REAL NOT NULL,
    supply_db_c             REAL NOT NULL,
    supply_db_tol_k         REAL NOT NULL,
    supply_hum_kind         TEXT NOT NULL CHECK (supply_hum_kind IN ('wet-bulb', 'rh', 'dew-point')),
    supply_hum_value        REAL NOT NULL,
    supply_hum_tol          REAL NOT NULL,
    outdoor_db_c            REAL,
    outdoor_db_tol_k        REAL,
    outdoor_hum_kind        TEXT CHECK (outdoor_hum_kind IN ('wet-bulb', 'rh', 'dew-point')),
    outdoor_hum_value       REAL,
    outdoor_hum_tol         REAL,
    coil_kind               TEXT CHECK (coil_kind IN ('coil-surface', 'evaporator-saturation')),
    coil_c                  REAL,
    coil_tol_k              REAL,
    airflow_m3_per_s        REAL,
    airflow_tol_m3_per_s    REAL,
    airflow_point           TEXT CHECK (airflow_point IN ('entering', 'leaving')),
    airflow_method          TEXT,
    station_pressure_pa     REAL,
    station_pressure_tol_pa REAL,
    condensate_m3           REAL,
    condensate_tol_m3       REAL,
    condensate_s            REAL,
    condensate_tol_s        REAL,
    notes                   TEXT NOT NULL DEFAULT ''
) STRICT;

CREATE INDEX reading_set_by_visit ON reading_set (visit_id, taken_epoch_s);
