#!/usr/bin/env bash
# npm test: the same set-up as npm start against a throwaway cluster, then every suite.
# Extra arguments go to vitest (e.g. npm test -- --project unit).
source "$(dirname "$0")/lib/common.sh"
source "$ROOT/scripts/lib/stack.sh"
cd "$ROOT"

ensure_node_modules
ensure_postgres
ensure_chromium
stack_up test

status=0
rm -f "$ROOT/.tmp/vitest.json"
npx vitest run --reporter=default --reporter=json --outputFile.json="$ROOT/.tmp/vitest.json" "$@" || status=$?
node scripts/lib/summary.mjs "$ROOT/.tmp/vitest.json" || status=1
exit "$status"
