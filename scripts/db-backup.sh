#!/usr/bin/env bash
# npm run db:backup [-- --out FILE]: a pg_dump custom-format archive (-Fc) of the database in
# DATABASE_URL (default: the development cluster), written to backups/ionfolio-<UTC time>.dump.
# The archive holds schema, data, the migrations table and the sessions; db:restore reads it back.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/pg.sh

OUT=""
while [ $# -gt 0 ]; do
  case "$1" in
    --out) OUT="${2:-}"; [ -n "$OUT" ] || { echo "ionfolio: --out needs a file name" >&2; exit 2; }; shift 2 ;;
    --out=*) OUT="${1#--out=}"; shift ;;
    -h|--help) echo "usage: npm run db:backup [-- --out FILE]"; exit 0 ;;
    *) echo "ionfolio: unknown argument $1 (usage: npm run db:backup [-- --out FILE])" >&2; exit 2 ;;
  esac
done

PG_BIN=$(pg_find_bindir) || { echo "ionfolio: PostgreSQL client binaries not found (pg_dump)" >&2; exit 1; }
DATABASE_URL="${DATABASE_URL:-postgres://ionfolio@127.0.0.1:54320/ionfolio}"
if [ -z "$OUT" ]; then
  mkdir -p backups
  OUT="backups/ionfolio-$(date -u +%Y%m%dT%H%M%SZ).dump"
fi
mkdir -p "$(dirname "$OUT")"

# Write to a temporary name first so a failed dump never leaves a file that looks complete.
TMP="$OUT.partial"
trap 'rm -f "$TMP"' EXIT
"$PG_BIN/pg_dump" --format=custom --no-owner --no-privileges --dbname="$DATABASE_URL" --file="$TMP"
mv "$TMP" "$OUT"
trap - EXIT
SIZE=$(wc -c <"$OUT")
echo "ionfolio: backed up $(printf '%s' "$DATABASE_URL" | sed -E 's#//([^:@/]+):[^@]*@#//\1:***@#') to $OUT ($SIZE bytes)"
