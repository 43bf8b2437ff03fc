#!/usr/bin/env bash
# npm start: install what is missing, start PostgreSQL, migrate, load the demo, build the web app,
# start the local fakes (OAuth provider, SMTP server) and serve web + API on one port.
set -euo pipefail
cd "$(dirname "$0")/.."
ROOT=$PWD
source scripts/lib/deps.sh
source scripts/lib/pg.sh

deps_ensure_node_modules
pg_ensure_binaries

PG_DIR="$ROOT/.data/pg"
PG_PORT="${IONFOLIO_PG_PORT:-54320}"
pg_ensure_running "$PG_DIR" "$PG_PORT"
pg_ensure_database "$PG_PORT" ionfolio

set -a
# shellcheck disable=SC1091
[ -f .env ] && source .env
source scripts/dev.env
set +a
export DATABASE_URL="${DATABASE_URL:-postgres://ionfolio@127.0.0.1:$PG_PORT/ionfolio}"

PIDS=()
cleanup() {
  trap - INT TERM EXIT
  for p in "${PIDS[@]}"; do kill "$p" 2>/dev/null || true; done
  wait 2>/dev/null || true
  pg_stop "$PG_DIR"
  echo "ionfolio: stopped the server, the fakes and PostgreSQL"
}
trap cleanup INT TERM EXIT

node_modules/.bin/tsx apps/api/src/db/migrate.ts
node_modules/.bin/tsx apps/api/src/db/seed.ts
echo "ionfolio: building the web app"
node_modules/.bin/vite build --logLevel warn

node_modules/.bin/tsx apps/fakes/src/main.ts &
PIDS+=($!)
node_modules/.bin/tsx apps/api/src/main.ts &
PIDS+=($!)

for _ in $(seq 1 120); do
  curl -fsS "http://$HOST:$PORT/api/health" >/dev/null 2>&1 && break
  sleep 0.5
done
cat <<TXT

  Ionfolio is running at  $PUBLIC_URL
  Sign in: press "Sign in with GitHub"; it goes to the local stand-in provider at
  $FAKE_OAUTH_URL, where you pick a demo identity:
    ines.varga (admin) · dana.okafor (curator) · tomas.reyes (contributor) · mira.lindqvist (reader)
  Mail sent by the app lands in the fake SMTP inbox: $FAKE_OAUTH_URL/_mail
  Ctrl-C stops the server, the fakes and the database.

TXT
wait -n "${PIDS[@]}"
