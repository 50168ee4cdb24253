-- Version 9: the house around the system, for its moisture budget. Facts about the house are kept
-- with the site (one row per site); the readings a budget needs beyond the coil check (the day's
-- weather, and the return grille, return plenum and attic/crawlspace air of the return-leak check)
-- are kept with the visit (one row per visit, each column filled as the tech types it). All SI;
-- every tolerance is a ± half-width in the unit of its value.

CREATE TABLE house_facts (
    site_id                  TEXT PRIMARY KEY REFERENCES site (id),
    floor_area_m2            REAL NOT NULL CHECK (floor_area_m2 > 0),
    ceiling_height_m         REAL NOT NULL CHECK (ceiling_height_m > 0),
    stories                  INTEGER NOT NULL CHECK (stories BETWEEN 1 AND 3),
    bedrooms                 INTEGER NOT NULL CHECK (bedrooms >= 0),
    occupants                INTEGER NOT NULL DEFAULT 0 CHECK (occupants >= 0),
    cfm50_m3_per_s           REAL,
    ach50                    REAL,
    shelter_class            INTEGER NOT NULL DEFAULT 0 CHECK (shelter_class BETWEEN 0 AND 5),
    wind_m_per_s             REAL,
    ventilation_type         TEXT NOT NULL DEFAULT 'none'
                             CHECK (ventilation_type IN ('none', 'exhaust', 'supply', 'balanced', 'erv')),
    ventilation_m3_per_s     REAL NOT NULL DEFAULT 0,
    erv_latent_effectiveness REAL
) STRICT;

CREATE TABLE house_readings (
    visit_id            TEXT PRIMARY KEY REFERENCES visit (id),
    outdoor_db_c        REAL,
    outdoor_db_tol_k    REAL,
    outdoor_hum_kind    TEXT CHECK (outdoor_hum_kind IN ('wet-bulb', 'rh', 'dew-point')),
    outdoor_hum_value   REAL,
    outdoor_hum_tol     REAL,
    grille_db_c         REAL,
    grille_db_tol_k     REAL,
    grille_hum_kind     TEXT CHECK (grille_hum_kind IN ('wet-bulb', 'rh', 'dew-point')),
    grille_hum_value    REAL,
    grille_hum_tol      REAL,
    plenum_db_c         REAL,
    plenum_db_tol_k     REAL,
    plenum_hum_kind     TEXT CHECK (plenum_hum_kind IN ('wet-bulb', 'rh', 'dew-point')),
    plenum_hum_value    REAL,
    plenum_hum_tol      REAL,
    space_db_c          REAL,
    space_db_tol_k      REAL,
    space_hum_kind      TEXT CHECK (space_hum_kind IN ('wet-bulb', 'rh', 'dew-point')),
    space_hum_value     REAL,
    space_hum_tol       REAL,
    runtime_fraction    REAL CHECK (runtime_fraction IS NULL OR runtime_fraction BETWEEN 0 AND 1)
) STRICT;
