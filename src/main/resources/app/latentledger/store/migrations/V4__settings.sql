-- Version 4: the tech's settings, one row per setting that differs from its default; no row means
-- the default of the build that reads it. Key/value rather than a column per setting: the finding
-- thresholds grow with every analysis, and a new threshold must not need a schema step, so a file
-- written by a newer build (same schema, more keys) still opens in an older one, which keeps the
-- keys it does not know and ignores them. Numbers are SI (REAL, exact), words are lower case.

CREATE TABLE setting (
    key        TEXT PRIMARY KEY,
    number_si  REAL,
    word       TEXT,
    updated_at TEXT NOT NULL,
    -- exactly one of a number or a word
    CHECK ((number_si IS NULL) <> (word IS NULL))
) STRICT;
