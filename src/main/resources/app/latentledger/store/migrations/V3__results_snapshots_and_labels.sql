-- Version 3: results kept as shown on the day, and a short label on reading sets ("before",
-- "after") so a before/after pair reads as one in lists. Existing reading sets get an empty label.

ALTER TABLE reading_set ADD COLUMN label TEXT NOT NULL DEFAULT '';

CREATE TABLE results_snapshot (
    id             TEXT PRIMARY KEY,
    reading_set_id TEXT REFERENCES reading_set (id),
    log_id         TEXT REFERENCES imported_log (id),
    app_version    TEXT NOT NULL,
    computed_at    TEXT NOT NULL,
    json           TEXT NOT NULL,
    -- exactly one subject
    CHECK ((reading_set_id IS NULL) <> (log_id IS NULL))
) STRICT;

CREATE INDEX results_snapshot_by_reading_set ON results_snapshot (reading_set_id);
CREATE INDEX results_snapshot_by_log ON results_snapshot (log_id);
