-- Sessions of the office web page. The cookie holds 256 random bits; only their SHA-256 is kept (the
-- token cannot be guessed, so a slow hash would add nothing), so a copy of the database opens no
-- session. Any instance finds the row: a login works behind a load balancer without sticky sessions.
create table office_session (
    token_hash  text primary key,
    company_id  uuid not null references company (id),
    person_id   uuid not null references person (id),
    -- the per-session token every form of the page sends back (CSRF protection)
    csrf        text not null,
    created_at  timestamptz not null default now(),
    expires_at  timestamptz not null
);
create index office_session_person on office_session (person_id);
