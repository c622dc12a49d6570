#!/usr/bin/env bash
# npm test: the same set-up as npm start against a throwaway cluster, then every suite.
# Extra arguments go to vitest (e.g. npm test -- --project unit).
source "$(dirname "$0")/lib/common.sh"
source "$ROOT/scripts/lib/stack.sh"
source "$ROOT/scripts/lib/mail.sh"
cd "$ROOT"

ensure_node_modules
ensure_postgres
ensure_chromium
command -v pdftoppm >/dev/null || apt_install poppler-utils # renders the PDF sheets in the tests

mkdir -p "$ROOT/.tmp"
# The fake SMTP server keeps what the app sends in a folder of this run (tests read it); it exits with this script.
: >"$ROOT/.tmp/fake-smtp.log"
start_fake_smtp "$ROOT/.tmp/mail-test-$$" "$ROOT/.tmp/fake-smtp.log"
stack_up test

status=0
# A whole run starts with the linter (warnings count); a run of chosen files or projects skips it.
if [ $# -eq 0 ]; then
  npm run --silent lint || { status=1; log "lint found problems (above); npm run lint shows them again"; }
fi
rm -f "$ROOT/.tmp/vitest.json"
npx vitest run --reporter=default --reporter=json --outputFile.json="$ROOT/.tmp/vitest.json" "$@" || status=$?
node scripts/lib/summary.mjs "$ROOT/.tmp/vitest.json" || status=1
rm -rf "$MAIL_DIR"
exit "$status"
