# A throwaway stack for tests and benchmarks: its own PostgreSQL cluster under .tmp, migrated,
# with the demo loaded, and the production build served on a free port. Sourced after common.sh.

stack_up() {
  mkdir -p "$ROOT/.tmp"
  export TMPDIR="$ROOT/.tmp"
  export PG_TEST_DIR="$ROOT/.tmp/pg-$1-$$"
  export PG_TEST_PORT="$(free_port)"
  export PG_BIN
  export DATABASE_URL="postgres://postgres@127.0.0.1:$PG_TEST_PORT/farfield_test"
  export DEMO_PASSWORD="farfield-demo"
  export APP_LOG="$ROOT/.tmp/app-$1.log"
  STACK_APP_PID=""
  trap stack_down EXIT

  pg_up "$PG_TEST_DIR" "$PG_TEST_PORT" "-c fsync=off -c full_page_writes=off -c max_connections=300"
  create_database "$PG_TEST_PORT" farfield_test
  npx tsx db/migrate.ts
  npx tsx db/demo/load.ts >/dev/null
  ensure_build

  export APP_PORT="$(free_port)"
  export APP_URL="http://127.0.0.1:$APP_PORT"
  export APP_BASE_URL="$APP_URL"
  # A process group of its own, so stopping it also stops the server process npx spawns.
  setsid npx tsx server.ts -H 127.0.0.1 -p "$APP_PORT" >"$APP_LOG" 2>&1 &
  STACK_APP_PID=$!
  node scripts/lib/wait-http.mjs "$APP_URL/api/health" 60 || { tail -n 40 "$APP_LOG" >&2; exit 1; }
}

stack_down() {
  if [ -n "${STACK_APP_PID:-}" ]; then
    kill -- "-$STACK_APP_PID" 2>/dev/null || kill "$STACK_APP_PID" 2>/dev/null || true
  fi
  pg_down "$PG_TEST_DIR"
  rm -rf "$PG_TEST_DIR"
}
