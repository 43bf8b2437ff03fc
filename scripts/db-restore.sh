#!/usr/bin/env bash
# npm run db:restore -- FILE: restores a db:backup archive into the database in DATABASE_URL
# (default: the development cluster). Every table the archive holds is dropped and recreated
# (pg_restore --clean --if-exists) in one transaction: on any error nothing changes.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/pg.sh

FILE="${1:-}"
if [ -z "$FILE" ] || [ "$FILE" = -h ] || [ "$FILE" = --help ]; then
  echo "usage: npm run db:restore -- FILE   (a backups/ionfolio-*.dump written by npm run db:backup)" >&2
  exit 2
fi
[ -f "$FILE" ] || { echo "ionfolio: no such backup file: $FILE" >&2; exit 2; }

PG_BIN=$(pg_find_bindir) || { echo "ionfolio: PostgreSQL client binaries not found (pg_restore)" >&2; exit 1; }
DATABASE_URL="${DATABASE_URL:-postgres://ionfolio@127.0.0.1:54320/ionfolio}"
SHOWN=$(printf '%s' "$DATABASE_URL" | sed -E 's#//([^:@/]+):[^@]*@#//\1:***@#')

"$PG_BIN/pg_restore" --list "$FILE" >/dev/null || { echo "ionfolio: $FILE is not a pg_dump custom-format archive" >&2; exit 2; }
echo "ionfolio: restoring $FILE into $SHOWN"
echo "ionfolio: this replaces every table in the backup (users, entries, revisions, editions, audit, mail, sessions …) with the backup's rows; rows written since the backup are lost"
"$PG_BIN/pg_restore" --clean --if-exists --single-transaction --exit-on-error --no-owner --no-privileges \
  --dbname="$DATABASE_URL" "$FILE"
echo "ionfolio: restored $FILE"
