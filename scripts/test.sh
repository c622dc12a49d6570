#!/usr/bin/env bash
# npm test: the same set-up as npm start against a throwaway cluster, then every suite.
# Extra arguments go to vitest (e.g. npm test -- --project unit).
source "$(dirname "$0")/lib/common.sh"
cd "$ROOT"

ensure_node_modules
ensure_postgres
ensure_chromium

mkdir -p "$ROOT/.tmp"
export TMPDIR="$ROOT/.tmp"
export PG_TEST_DIR="$ROOT/.tmp/pg-test-$$"
export PG_TEST_PORT="$(free_port)"
export PG_BIN
export DATABASE_URL="postgres://postgres@127.0.0.1:$PG_TEST_PORT/farfield_test"
export DEMO_PASSWORD="farfield-demo"
APP_LOG="$ROOT/.tmp/app-test.log"
app_pid=""

cleanup() {
  [ -n "$app_pid" ] && kill "$app_pid" 2>/dev/null || true
  pg_down "$PG_TEST_DIR"
  rm -rf "$PG_TEST_DIR"
}
trap cleanup EXIT

pg_up "$PG_TEST_DIR" "$PG_TEST_PORT" "-c fsync=off -c full_page_writes=off -c max_connections=200"
create_database "$PG_TEST_PORT" farfield_test
npx tsx db/migrate.ts
npx tsx db/demo/load.ts >/dev/null
ensure_build

export APP_PORT="$(free_port)"
export APP_URL="http://127.0.0.1:$APP_PORT"
export APP_BASE_URL="$APP_URL"
npx next start -H 127.0.0.1 -p "$APP_PORT" >"$APP_LOG" 2>&1 &
app_pid=$!
node scripts/lib/wait-http.mjs "$APP_URL/api/health" 60 || { tail -n 40 "$APP_LOG" >&2; exit 1; }
export APP_LOG

status=0
npx vitest run --reporter=default --reporter=json --outputFile.json="$ROOT/.tmp/vitest.json" "$@" || status=$?
node scripts/lib/summary.mjs "$ROOT/.tmp/vitest.json" || status=1
exit "$status"
