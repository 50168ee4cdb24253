-- The office server's PostgreSQL schema (Flyway, folder app/latentledger/server/db; the tablet's SQLite
-- migrations live elsewhere and never run here). Released files are never edited: add V2, V3, ...

create table company (
    id          uuid primary key,
    name        text not null unique,
    created_at  timestamptz not null default now(),
    -- the company's change counter: every record that becomes current takes the next value, under a
    -- row lock on this company, so the changes feed never skips a write still being committed
    change_seq  bigint not null default 0
);

create table person (
    id            uuid primary key,
    company_id    uuid not null references company (id),
    name          text not null,
    email         text,
    role          text not null check (role in ('technician', 'office')),
    -- Argon2id (office staff log in to the office page with it); null for a technician
    password_hash text,
    created_at    timestamptz not null default now(),
    disabled_at   timestamptz
);
create unique index person_email on person (lower(email)) where email is not null;
create index person_company on person (company_id);

create table device (
    id          uuid primary key,
    company_id  uuid not null references company (id),
    person_id   uuid not null references person (id),
    name        text not null,
    -- Argon2id of the token's secret part; the token itself is shown once, at enrolment
    token_hash  text not null,
    created_at  timestamptz not null default now(),
    expires_at  timestamptz not null,
    revoked_at  timestamptz,
    last_seen   timestamptz
);
create index device_company on device (company_id);

create table enrol_code (
    -- the code's first group, not secret: finds the row; the whole code is checked against code_hash
    selector    text primary key,
    company_id  uuid not null references company (id),
    person_id   uuid not null references person (id),
    code_hash   text not null,
    created_at  timestamptz not null default now(),
    expires_at  timestamptz not null,
    used_at     timestamptz,
    device_id   uuid references device (id)
);

create table record_revision (
    seq         bigserial primary key,
    company_id  uuid not null references company (id),
    kind        text not null check (kind in ('site', 'system', 'visit', 'readings', 'log', 'instrument',
                                              'paperwork', 'house')),
    id          text not null,
    revision    integer not null,
    hash        text not null,
    base_hash   text,
    edited_at   timestamptz not null,
    deleted     boolean not null,
    body        jsonb,
    device_id   uuid references device (id),
    person_id   uuid references person (id),
    received_at timestamptz not null default now(),
    current     boolean not null default false,
    -- the company's change_seq when this revision became current (the changes feed's cursor)
    change_seq  bigint,
    unique (company_id, kind, id, revision),
    -- a retried push finds its revision here and never adds a second one; a deletion always has the
    -- same hash, so the edit time and the deleted flag belong to the key
    unique (company_id, kind, id, hash, deleted, edited_at)
);
create unique index record_one_current on record_revision (company_id, kind, id) where current;
create index record_changes on record_revision (company_id, change_seq) where current;
-- a visit's readings, logs and instruments for its bundle: found by the parent id in the body
create index record_by_visit on record_revision (company_id, kind, (coalesce(body ->> 'visitId', body ->> 'visit_id')))
    where current;

create table log_samples (
    company_id      uuid not null references company (id),
    log_id          text not null,
    -- the log record's samplesSha256/samplesBytes this upload is for: a new edit of the log starts anew
    samples_sha256  text not null,
    samples_bytes   bigint not null,
    received_bytes  bigint not null default 0,
    complete        boolean not null default false,
    completed_at    timestamptz,
    primary key (company_id, log_id, samples_sha256)
);

create table log_sample_chunk (
    company_id      uuid not null,
    log_id          text not null,
    samples_sha256  text not null,
    byte_offset     bigint not null,
    bytes           bytea not null,
    primary key (company_id, log_id, samples_sha256, byte_offset),
    foreign key (company_id, log_id, samples_sha256) references log_samples on delete cascade
);

create table audit (
    id          bigserial primary key,
    at          timestamptz not null default now(),
    company_id  uuid references company (id),
    person_id   uuid references person (id),
    device_id   uuid references device (id),
    action      text not null,
    kind        text,
    record_id   text,
    revision    integer,
    detail      text
);
create index audit_company on audit (company_id, at);
