-- Version 10: syncing with the office server. The tablet's account (which server, which device,
-- whose company; the device token itself is kept beside the ledger in a file only the tech's
-- account may read), where its pull stopped (the server's opaque cursor), how the last sync went,
-- and for each record the hash last agreed with the server and the server's revision of it. These
-- tables hang from no record on purpose: a record's sync row outlives its deletion, so the deletion
-- can be sent.

CREATE TABLE office_account (
    id              INTEGER PRIMARY KEY CHECK (id = 1),
    server_url      TEXT NOT NULL,
    device_id       TEXT NOT NULL,
    device_name     TEXT NOT NULL DEFAULT '',
    company         TEXT NOT NULL DEFAULT '',
    technician      TEXT NOT NULL DEFAULT '',
    role            TEXT NOT NULL DEFAULT 'technician',
    enrolled_at     TEXT NOT NULL,
    pull_cursor     TEXT NOT NULL DEFAULT '0',
    last_sync_at    TEXT,
    last_outcome    TEXT NOT NULL DEFAULT '' CHECK (last_outcome IN ('', 'done', 'refusals', 'failed')),
    last_message    TEXT NOT NULL DEFAULT ''
) STRICT;

-- One row per record the tablet and the server have agreed on (or tried to).
CREATE TABLE sync_record (
    kind             TEXT NOT NULL
                     CHECK (kind IN ('site', 'system', 'visit', 'readings', 'log', 'instrument', 'paperwork', 'house')),
    record_id        TEXT NOT NULL,
    synced_hash      TEXT,
    server_revision  TEXT,
    synced_at        TEXT,
    -- a log's samples are uploaded after its record: 1 once the server has them all
    samples_done     INTEGER NOT NULL DEFAULT 1 CHECK (samples_done IN (0, 1)),
    -- the last refusal of this record (field, value, range, sentence) and the hash refused
    refused_hash     TEXT,
    refused_field    TEXT,
    refused_value    TEXT,
    refused_range    TEXT,
    refused_message  TEXT,
    PRIMARY KEY (kind, record_id)
) STRICT;

-- Revisions of records seen from the server, and this tablet's own that another revision outlived,
-- so both sides of an edit made on two tablets stay visible here. applied = 0: not (yet) put into
-- the ledger (kept local edits, or a log whose samples were not complete on the server).
CREATE TABLE sync_revision (
    kind         TEXT NOT NULL,
    record_id    TEXT NOT NULL,
    revision     TEXT NOT NULL,
    hash         TEXT NOT NULL,
    edited_at    TEXT NOT NULL,
    device       TEXT NOT NULL DEFAULT '',
    author       TEXT NOT NULL DEFAULT '',
    deleted      INTEGER NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1)),
    body         TEXT,
    seen_at      TEXT NOT NULL,
    applied      INTEGER NOT NULL DEFAULT 0 CHECK (applied IN (0, 1)),
    note         TEXT NOT NULL DEFAULT '',
    PRIMARY KEY (kind, record_id, revision)
) STRICT;

CREATE INDEX sync_revision_pending ON sync_revision (applied, kind);
