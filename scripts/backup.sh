#!/usr/bin/env bash
# Whole-database backup and restore with PostgreSQL's own tools.
#
#   scripts/backup.sh dump [FILE]      write a custom-format dump (default .data/backups/barwright-YYYYmmdd-HHMMSS.dump)
#   scripts/backup.sh restore FILE     restore FILE into the database, replacing what is there (asks unless --yes)
#
# Uses DATABASE_URL when set, else the private cluster of scripts/db.sh.
set -euo pipefail
cd "$(dirname "$0")/.."

fail() { echo "backup: $*" >&2; exit 1; }
BINDIR=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1)
[ -n "$BINDIR" ] && [ -x "$BINDIR/pg_dump" ] || fail "pg_dump is missing. Install PostgreSQL's client tools (apt-get install -y postgresql-client)."
URL=${DATABASE_URL:-$(bash scripts/db.sh url)}

case "${1:-}" in
  dump)
    FILE=${2:-.data/backups/barwright-$(date -u +%Y%m%d-%H%M%S).dump}
    mkdir -p "$(dirname "$FILE")"
    "$BINDIR/pg_dump" --format=custom --no-owner --no-privileges --file="$FILE" "$URL" \
      || fail "pg_dump failed (is the database running? npm run db:start)."
    echo "backup: wrote $FILE ($(du -h "$FILE" | cut -f1))"
    ;;
  restore)
    FILE=${2:-}
    [ -n "$FILE" ] && [ -f "$FILE" ] || fail "give the dump file to restore: scripts/backup.sh restore FILE"
    if [ "${3:-}" != "--yes" ]; then
      read -r -p "Replace everything in the database with $FILE? Type yes: " answer
      [ "$answer" = "yes" ] || fail "not restored."
    fi
    "$BINDIR/pg_restore" --clean --if-exists --no-owner --no-privileges --single-transaction --dbname="$URL" "$FILE" \
      || fail "pg_restore failed; the database is unchanged (single transaction)."
    echo "backup: restored $FILE"
    ;;
  *) echo "usage: scripts/backup.sh dump [FILE] | restore FILE [--yes]" >&2; exit 2 ;;
esac
