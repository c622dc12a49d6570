#!/usr/bin/env bash
# npm start: install what is missing, start PostgreSQL, migrate, load the demo, build, serve.
source "$(dirname "$0")/lib/common.sh"
source "$ROOT/scripts/lib/config.sh"
cd "$ROOT"

ensure_node_modules
pg_up "$PG_DIR" "$PG_PORT"
create_database "$PG_PORT" farfield
npx tsx db/migrate.ts
npx tsx db/demo/load.ts
ensure_build

cat <<MSG

  Farfield is starting on $APP_BASE_URL
  Demo sign-ins (password: $DEMO_PASSWORD)
    director  director@harbor-ridge.example
    designer  designer@harbor-ridge.example
    staff     staff@harbor-ridge.example
    director of a second program  director@westbrook.example
  PostgreSQL keeps its data in .data/pg (npm run db:stop stops it).

MSG
# Without SMTP settings of its own, mail goes to the local fake server, which keeps every message in
# .data/mail (readable by the demo's directors at /dev/mail) and stops when the app does.
if [ -z "${SMTP_HOST:-}" ]; then
  export DEV_MAILBOX=true MAIL_DIR="${MAIL_DIR:-$ROOT/.data/mail}"
  FAKE_SMTP_WATCH_PID=$$ npx tsx scripts/fake-smtp.ts &
fi
exec npx next start -H 127.0.0.1 -p "$PORT"
