# The local fake SMTP server of npm start, npm run dev and npm test. Sourced after common.sh.

# start_fake_smtp MAIL_DIR [LOG]: starts scripts/fake-smtp.ts on a port the system picks (so two
# instances on one machine never share a mailbox; FAKE_SMTP_PORT asks for a fixed one, and a port in
# use fails here, clearly), waits until it listens, and exports SMTP_HOST, SMTP_PORT, MAIL_DIR and
# DEV_MAILBOX for the app. The server's stdin is a pipe whose other end this shell keeps open, and
# `exec` passes on to the app: the server ends when the script and the app it became have ended,
# however they end (FAKE_SMTP_WATCH_PID backs this up for processes that keep the pipe longer).
# Without LOG it writes to this script's output.
start_fake_smtp() {
  local dir="$1" log="${2:-}" portfile pid deadline
  mkdir -p "$ROOT/.tmp" "$dir"
  portfile="$ROOT/.tmp/fake-smtp-port-$$-$RANDOM"
  rm -f "$portfile"
  # Inherited output is left as it is (reopening a file there would write over the script's own lines).
  exec {FAKE_SMTP_FD}> >(
    [ -z "$log" ] || exec >>"$log" 2>&1
    MAIL_DIR="$dir" SMTP_HOST=127.0.0.1 SMTP_PORT="${FAKE_SMTP_PORT:-0}" FAKE_SMTP_PORT_FILE="$portfile" \
      FAKE_SMTP_EXIT_ON_EOF=1 FAKE_SMTP_WATCH_PID=$$ exec "$ROOT/node_modules/.bin/tsx" "$ROOT/scripts/fake-smtp.ts"
  )
  pid=$!
  deadline=$((SECONDS + 60))
  until [ -s "$portfile" ]; do
    if ! kill -0 "$pid" 2>/dev/null || [ "$SECONDS" -ge "$deadline" ]; then
      [ -z "$log" ] || tail -n 5 "$log" >&2
      log "the local fake SMTP server did not start${FAKE_SMTP_PORT:+ on port $FAKE_SMTP_PORT}; see the lines above"
      return 1
    fi
    sleep 0.1
  done
  export SMTP_HOST=127.0.0.1 SMTP_PORT="$(cat "$portfile")" MAIL_DIR="$dir" DEV_MAILBOX=true
  rm -f "$portfile"
}
