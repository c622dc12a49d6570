#!/usr/bin/env bash
# npm run db:start | db:stop — the app's own PostgreSQL cluster, data under .data/pg.
source "$(dirname "$0")/lib/common.sh"
source "$ROOT/scripts/lib/config.sh"
case "${1:-}" in
  start) pg_up "$PG_DIR" "$PG_PORT"; create_database "$PG_PORT" farfield; log "PostgreSQL is up on 127.0.0.1:$PG_PORT" ;;
  stop) pg_down "$PG_DIR"; log "PostgreSQL stopped; the data stays in .data/pg" ;;
  *) echo "usage: db.sh start|stop" >&2; exit 2 ;;
esac
