#!/usr/bin/env bash
# npm test: the same bootstrap as npm start, on a separate test cluster and database, then lint,
# type-check, the web build, and every vitest project (chem, api, web, browser journeys).
set -euo pipefail
cd "$(dirname "$0")/.."
ROOT=$PWD
source scripts/lib/deps.sh
source scripts/lib/pg.sh

deps_ensure_node_modules
pg_ensure_binaries
deps_ensure_chromium

PG_DIR="$ROOT/.data/pg-test"
PG_PORT="${IONFOLIO_TEST_PG_PORT:-54330}"
# Durability is not what the tests measure: skip fsync on the throw-away test cluster.
PG_FSYNC=off pg_ensure_running "$PG_DIR" "$PG_PORT"
trap 'pg_stop "$PG_DIR"' EXIT
pg_ensure_database "$PG_PORT" ionfolio_test fresh
pg_ensure_database "$PG_PORT" ionfolio_e2e fresh
TEST_DB="postgres://ionfolio@127.0.0.1:$PG_PORT/ionfolio_test"
E2E_DB="postgres://ionfolio@127.0.0.1:$PG_PORT/ionfolio_e2e"

echo "ionfolio: lint"
node_modules/.bin/eslint . --max-warnings=0
echo "ionfolio: type-check"
node_modules/.bin/tsc -p tsconfig.json
for p in packages/chem packages/contracts apps/fakes apps/api apps/web tests; do node_modules/.bin/tsc -p "$p"; done
echo "ionfolio: web build"
node_modules/.bin/vite build --logLevel warn
echo "ionfolio: unit and API tests"
REPORTS="$ROOT/.data/test-reports"
mkdir -p "$REPORTS"
rm -f "$REPORTS"/*.json
TEST_DATABASE_URL="$TEST_DB" node_modules/.bin/vitest run --project chem --project contracts --project api --project web \
  --reporter=default --reporter=json --outputFile.json="$REPORTS/unit.json" "$@"
# The browser journeys get a database of their own with the demo library loaded, so the API
# tests' changes to roles and rows can never race them.
echo "ionfolio: browser journeys"
TEST_DATABASE_URL="$E2E_DB" node_modules/.bin/vitest run --project e2e \
  --reporter=default --reporter=json --outputFile.json="$REPORTS/e2e.json" "$@"
# One plain closing line over both runs.
node -e '
  let passed = 0, failed = 0, skipped = 0;
  for (const f of process.argv.slice(1)) {
    const r = JSON.parse(require("fs").readFileSync(f, "utf8"));
    passed += r.numPassedTests; failed += r.numFailedTests; skipped += r.numPendingTests + (r.numTodoTests || 0);
  }
  console.log(`${passed} passed, ${failed} failed` + (skipped ? `, ${skipped} skipped` : ""));
' "$REPORTS/unit.json" "$REPORTS/e2e.json"
