-- Version 2: data-logger runs. A week at 1 Hz is 604 800 samples; one row per sample would cost
-- seconds to write and read, so samples are kept in chunks: each chunk row holds up to 8192
-- sample times (8-byte little-endian milliseconds) and, for each channel in order, as many
-- 8-byte little-endian IEEE-754 doubles (NaN = missing).

CREATE TABLE imported_log (
    id                TEXT PRIMARY KEY,
    visit_id          TEXT NOT NULL REFERENCES visit (id),
    source_file_name  TEXT NOT NULL,
    column_mapping    TEXT NOT NULL DEFAULT '',
    imported_at       TEXT NOT NULL,
    imported_epoch_s  INTEGER NOT NULL,
    time_base         TEXT NOT NULL CHECK (time_base IN ('epoch', 'elapsed')),
    sample_count      INTEGER NOT NULL CHECK (sample_count >= 0)
) STRICT;

CREATE INDEX imported_log_by_visit ON imported_log (visit_id);

CREATE TABLE log_channel (
    log_id   TEXT NOT NULL REFERENCES imported_log (id),
    position INTEGER NOT NULL,
    name     TEXT NOT NULL,
    unit     TEXT NOT NULL DEFAULT '',
    PRIMARY KEY (log_id, position),
    UNIQUE (log_id, name)
) STRICT;

CREATE TABLE log_chunk (
    log_id       TEXT NOT NULL REFERENCES imported_log (id),
    chunk_no     INTEGER NOT NULL,
    first_sample INTEGER NOT NULL,
    sample_count INTEGER NOT NULL CHECK (sample_count > 0),
    times        BLOB NOT NULL,
    samples      BLOB NOT NULL,
    PRIMARY KEY (log_id, chunk_no)
) STRICT;
