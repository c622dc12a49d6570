#!/usr/bin/env bash
# npm start: install what is missing, start PostgreSQL, migrate, load the demo, build, serve.
source "$(dirname "$0")/lib/common.sh"
source "$ROOT/scripts/lib/config.sh"
source "$ROOT/scripts/lib/mail.sh"
cd "$ROOT"

ensure_node_modules
pg_up "$PG_DIR" "$PG_PORT"
create_database "$PG_PORT" farfield
npx tsx db/migrate.ts
npx tsx db/demo/load.ts
ensure_build

# Without SMTP settings of its own, mail goes to a local fake server on a free port, which keeps every
# message in .data/mail (each signed-in person reads their own at /dev/mail) and ends with the app.
if [ -z "${SMTP_HOST:-}" ]; then
  start_fake_smtp "${MAIL_DIR:-$ROOT/.data/mail}"
  mail_words="Mail stays on this machine: .data/mail, and each person's own at $APP_BASE_URL/dev/mail (local use only)."
else
  unset DEV_MAILBOX # real SMTP settings: no local mailbox
  mail_words="Mail goes out through $SMTP_HOST."
fi

cat <<MSG

  Farfield is starting on $APP_BASE_URL
  Demo sign-ins (password: $DEMO_PASSWORD)
    director  director@harbor-ridge.example
    designer  designer@harbor-ridge.example
    staff     staff@harbor-ridge.example
    director of a second program  director@westbrook.example
  PostgreSQL keeps its data in .data/pg (npm run db:stop stops it).
  $mail_words

MSG
exec npx tsx server.ts -H 127.0.0.1 -p "$PORT"
