#!/usr/bin/env bash
# PostgreSQL on loopback for Ionfolio: Debian's server binaries, one cluster per purpose in a
# git-ignored folder under .data/, listening on 127.0.0.1 and a unix socket inside that folder.
# Sourced by scripts/start.sh and scripts/test.sh.

pg_find_bindir() {
  local d
  for d in $(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V -r); do
    if [ -x "$d/initdb" ] && [ -x "$d/pg_ctl" ]; then echo "$d"; return 0; fi
  done
  if command -v initdb >/dev/null 2>&1 && command -v pg_ctl >/dev/null 2>&1; then
    dirname "$(command -v pg_ctl)"; return 0
  fi
  return 1
}

pg_ensure_binaries() {
  if ! PG_BIN=$(pg_find_bindir); then
    echo "ionfolio: PostgreSQL server binaries not found; installing Debian's postgresql package"
    if [ "$(id -u)" != 0 ]; then
      echo "ionfolio: need root (or an installed postgresql) to install PostgreSQL" >&2; return 1
    fi
    DEBIAN_FRONTEND=noninteractive apt-get update -qq && \
      DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null || return 1
    # Debian's package creates and starts a default cluster on 5432; Ionfolio does not use it.
    command -v pg_ctlcluster >/dev/null 2>&1 && pg_ctlcluster --skip-systemctl-redirect "$(ls /etc/postgresql | sort -V | tail -1)" main stop >/dev/null 2>&1 || true
    PG_BIN=$(pg_find_bindir) || { echo "ionfolio: PostgreSQL install did not provide initdb" >&2; return 1; }
  fi
  export PG_BIN
}

# Runs a PostgreSQL binary as the postgres user when we are root (initdb refuses root).
pg_as_owner() {
  if [ "$(id -u)" = 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi
}

# pg_ensure_running DIR PORT: create the cluster in DIR when missing, start it when stopped.
pg_ensure_running() {
  local dir="$1" port="$2"
  mkdir -p "$dir"
  if [ "$(id -u)" = 0 ]; then
    id postgres >/dev/null 2>&1 || useradd --system --home-dir /var/lib/postgresql --shell /bin/bash postgres
    chown postgres "$dir"
  fi
  if [ ! -f "$dir/data/PG_VERSION" ]; then
    echo "ionfolio: creating PostgreSQL cluster in $dir"
    pg_as_owner "$PG_BIN/initdb" -D "$dir/data" -A trust -U ionfolio -E UTF8 --locale=C.UTF-8 >"$dir/initdb.log" 2>&1 \
      || pg_as_owner "$PG_BIN/initdb" -D "$dir/data" -A trust -U ionfolio -E UTF8 --locale=C >"$dir/initdb.log" 2>&1 \
      || { cat "$dir/initdb.log" >&2; return 1; }
  fi
  if pg_as_owner "$PG_BIN/pg_ctl" -D "$dir/data" status >/dev/null 2>&1; then
    return 0
  fi
  # A stale pid file from a killed run would block the start.
  rm -f "$dir/data/postmaster.pid"
  pg_as_owner "$PG_BIN/pg_ctl" -D "$dir/data" -l "$dir/server.log" -w -t 60 \
    -o "-p $port -k $dir -c listen_addresses=127.0.0.1 -c fsync=${PG_FSYNC:-on}" start >/dev/null \
    || { tail -20 "$dir/server.log" >&2; return 1; }
}

pg_stop() {
  local dir="$1"
  [ -f "$dir/data/PG_VERSION" ] || return 0
  pg_as_owner "$PG_BIN/pg_ctl" -D "$dir/data" -m fast -w stop >/dev/null 2>&1 || true
}

# pg_ensure_database PORT NAME [fresh]: create the database; with "fresh", drop it first.
pg_ensure_database() {
  local port="$1" name="$2" fresh="${3:-}"
  local psql=(psql -h 127.0.0.1 -p "$port" -U ionfolio -d postgres -v ON_ERROR_STOP=1 -qtA)
  [ -x "$PG_BIN/psql" ] && psql[0]="$PG_BIN/psql"
  if [ "$fresh" = fresh ]; then
    "${psql[@]}" -c "DROP DATABASE IF EXISTS \"$name\" WITH (FORCE)" >/dev/null
  fi
  if [ "$("${psql[@]}" -c "SELECT 1 FROM pg_database WHERE datname = '$name'")" != 1 ]; then
    "${psql[@]}" -c "CREATE DATABASE \"$name\"" >/dev/null
  fi
}
