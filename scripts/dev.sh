#!/usr/bin/env bash
# npm run dev: like npm start, but the Next.js dev server with reloads (PORT overrides 3000).
source "$(dirname "$0")/lib/common.sh"
source "$ROOT/scripts/lib/config.sh"
source "$ROOT/scripts/lib/mail.sh"
cd "$ROOT"
ensure_node_modules
pg_up "$PG_DIR" "$PG_PORT"
create_database "$PG_PORT" farfield
npx tsx db/migrate.ts
[ -f db/demo/load.ts ] && npx tsx db/demo/load.ts
mkdir -p .tmp
export TMPDIR="$ROOT/.tmp"
# Mail goes to the local fake server unless SMTP settings are given (see npm start).
if [ -z "${SMTP_HOST:-}" ]; then
  start_fake_smtp "${MAIL_DIR:-$ROOT/.data/mail}"
else
  unset DEV_MAILBOX
fi
exec npx next dev -H 127.0.0.1 -p "$PORT"
