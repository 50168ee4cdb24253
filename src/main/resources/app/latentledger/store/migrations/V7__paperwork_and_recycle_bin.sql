-- Version 7: the visit's paperwork and the one recycle bin.
--
-- System details a tech writes on the work order besides staging, refrigerant and blower.
ALTER TABLE hvac_system ADD COLUMN metering_device TEXT NOT NULL DEFAULT '';
ALTER TABLE hvac_system ADD COLUMN filter TEXT NOT NULL DEFAULT '';

-- Instruments used on a visit, and which of them took each reading set. Stated accuracies are
-- SI half-widths (K, %-points of RH, fraction of the airflow reading); NULL = not stated.
CREATE TABLE instrument (
    id                      TEXT PRIMARY KEY,
    visit_id                TEXT NOT NULL REFERENCES visit (id),
    name                    TEXT NOT NULL,
    serial                  TEXT NOT NULL DEFAULT '',
    calibrated_on           TEXT,
    dry_bulb_tol_k          REAL,
    rh_tol_pct              REAL,
    wet_bulb_tol_k          REAL,
    dew_point_tol_k         REAL,
    coil_tol_k              REAL,
    airflow_tol_fraction    REAL
) STRICT;

CREATE INDEX instrument_by_visit ON instrument (visit_id);

CREATE TABLE reading_set_instrument (
    reading_set_id TEXT NOT NULL REFERENCES reading_set (id),
    instrument_id  TEXT NOT NULL REFERENCES instrument (id),
    PRIMARY KEY (reading_set_id, instrument_id)
) STRICT;

CREATE INDEX reading_set_instrument_by_instrument ON reading_set_instrument (instrument_id);

-- The customer's words, the work done and the two sign-offs: one row per visit once any is written.
CREATE TABLE visit_paperwork (
    visit_id              TEXT PRIMARY KEY REFERENCES visit (id),
    customer_words        TEXT NOT NULL DEFAULT '',
    work_done             TEXT NOT NULL DEFAULT '',
    technician_name       TEXT,
    technician_signed_at  TEXT,
    technician_remark     TEXT,
    customer_name         TEXT,
    customer_signed_at    TEXT,
    customer_remark       TEXT,
    -- a sign-off is a name and a time together, or neither
    CHECK ((technician_name IS NULL) = (technician_signed_at IS NULL)),
    CHECK ((customer_name IS NULL) = (customer_signed_at IS NULL))
) STRICT;

-- The recycle bin. A deletion moves the record and every row that hangs from it (found through
-- the foreign keys) out of the live tables into recycle_bin_row, each row kept column by column,
-- so the live tables never point at something missing and a restore puts back exactly what was
-- there. Entries go when restored, when the bin is emptied, or after the keeping time.
CREATE TABLE recycle_bin (
    id              TEXT PRIMARY KEY,
    kind            TEXT NOT NULL CHECK (kind IN ('site', 'system', 'visit', 'readings', 'log')),
    record_id       TEXT NOT NULL,
    summary         TEXT NOT NULL DEFAULT '',
    deleted_at      TEXT NOT NULL,
    deleted_epoch_s INTEGER NOT NULL,
    site_id         TEXT NOT NULL,
    visit_id        TEXT NOT NULL DEFAULT ''
) STRICT;

CREATE INDEX recycle_bin_by_record ON recycle_bin (kind, record_id);
CREATE INDEX recycle_bin_by_site ON recycle_bin (site_id);

CREATE TABLE recycle_bin_row (
    entry_id   TEXT NOT NULL REFERENCES recycle_bin (id) ON DELETE CASCADE,
    seq        INTEGER NOT NULL,
    table_name TEXT NOT NULL,
    row_data   BLOB NOT NULL,
    PRIMARY KEY (entry_id, seq)
) STRICT;
