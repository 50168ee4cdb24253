#!/usr/bin/env bash
# A throwaway PostgreSQL for the office-server tests, sourced by .ci/run (and usable by hand:
# `source .ci/postgres.sh`). Idempotent: installs Debian's `postgresql` when no server binaries are
# found, creates a cluster in a temporary folder owned by `postgres` (PostgreSQL refuses to run as
# root, which CI is), starts it on 127.0.0.1 only, makes the role `latentledger` and the database
# `latentledger_test`, and exports LATENT_LEDGER_TEST_DB_URL. A cluster already answering on the
# port is reused.
LL_PG_PORT="${LATENT_LEDGER_TEST_PG_PORT:-55432}"
LL_PG_DIR="${TMPDIR:-/tmp}/latent-ledger-pg-${LL_PG_PORT}"

ll_pg_bin() {
  ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1
}

ll_pg_start() {
  local bin as
  bin="$(ll_pg_bin)"
  if [ -z "$bin" ] || [ ! -x "$bin/pg_ctl" ]; then
    if [ "$(id -u)" -ne 0 ]; then
      echo "postgres.sh: no PostgreSQL server installed and not root; install Debian's postgresql" >&2
      return 1
    fi
    echo "postgres.sh: installing Debian's postgresql" >&2
    DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
    bin="$(ll_pg_bin)"
  fi
  # as root, run the server as `postgres`; as anyone else, as oneself
  if [ "$(id -u)" -eq 0 ]; then as="runuser -u postgres --"; else as=""; fi
  if "$bin/pg_isready" -q -h 127.0.0.1 -p "$LL_PG_PORT"; then
    echo "postgres.sh: reusing the PostgreSQL on 127.0.0.1:$LL_PG_PORT" >&2
  else
    rm -rf "$LL_PG_DIR"
    mkdir -p "$LL_PG_DIR"
    [ "$(id -u)" -eq 0 ] && chown postgres: "$LL_PG_DIR"
    $as "$bin/initdb" -D "$LL_PG_DIR/data" -U postgres --auth-local=trust --auth-host=scram-sha-256 \
      -E UTF8 --locale=C.UTF-8 >"$LL_PG_DIR/initdb.log" 2>&1 \
      || { cat "$LL_PG_DIR/initdb.log" >&2; return 1; }
    $as "$bin/pg_ctl" -D "$LL_PG_DIR/data" -l "$LL_PG_DIR/server.log" -w -t 60 \
      -o "-c listen_addresses=127.0.0.1 -p $LL_PG_PORT -k $LL_PG_DIR -c max_connections=200 -c fsync=on" start >/dev/null \
      || { cat "$LL_PG_DIR/server.log" >&2; return 1; }
    $as "$bin/psql" -q -h "$LL_PG_DIR" -p "$LL_PG_PORT" -U postgres -d postgres -v ON_ERROR_STOP=1 <<'SQL' >/dev/null
create role latentledger login password 'latentledger';
create database latentledger_test owner latentledger;
SQL
    echo "postgres.sh: PostgreSQL started on 127.0.0.1:$LL_PG_PORT ($LL_PG_DIR)" >&2
  fi
  export LATENT_LEDGER_TEST_DB_URL="jdbc:postgresql://127.0.0.1:${LL_PG_PORT}/latentledger_test?user=latentledger&password=latentledger"
}

ll_pg_start
