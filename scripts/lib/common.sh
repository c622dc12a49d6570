# Shared set-up for start, test and bench: installs what is missing and manages the
# project's own PostgreSQL clusters on loopback. Sourced, not run.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
export NEXT_TELEMETRY_DISABLED=1
export NO_COLOR=1

log() { printf '\033[0;36m[farfield]\033[0m %s\n' "$*" >&2; }

as_root() { if [ "$(id -u)" -eq 0 ]; then "$@"; else sudo "$@"; fi; }

# apt-get that waits (up to APT_LOCK_WAIT_SECONDS, 600) while another package manager holds Debian's
# lock instead of failing at once with exit 100: apt waits for dpkg's lock itself (DPkg::Lock::Timeout);
# the package lists' lock of `apt-get update` it does not wait for, so a locked answer is retried.
apt_get() {
  local wait="${APT_LOCK_WAIT_SECONDS:-600}" pause="${APT_LOCK_RETRY_SECONDS:-5}" status err
  local until=$((SECONDS + wait)) told=""
  while :; do
    status=0
    err="$(as_root env DEBIAN_FRONTEND=noninteractive apt-get -o DPkg::Lock::Timeout="$wait" "$@" 2>&1 >/dev/null)" || status=$?
    [ "$status" -eq 0 ] && return 0
    if [ "$status" -eq 100 ] && grep -qiE "could not get lock|unable to lock|unable to acquire the dpkg" <<<"$err" && [ "$SECONDS" -lt "$until" ]; then
      [ -n "$told" ] || log "another package manager holds Debian's lock; waiting for it (up to $wait s)"
      told=1
      sleep "$pause"
      continue
    fi
    printf '%s\n' "$err" >&2
    return "$status"
  done
}

apt_install() {
  log "installing Debian packages: $*"
  apt_get update -qq
  apt_get install -y -qq "$@"
}

pg_bindir() { ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1; }

ensure_postgres() {
  if [ -z "$(pg_bindir)" ] || [ ! -x "$(pg_bindir)/initdb" ]; then apt_install postgresql-15; fi
  PG_BIN="$(pg_bindir)"
}

ensure_chromium() {
  if [ ! -x /usr/bin/chromium ]; then apt_install chromium; fi
}

# npm ci when node_modules is missing or older than the lock file's content.
ensure_node_modules() {
  local stamp="$ROOT/node_modules/.farfield-lock" want
  # The lockfile and the patches applied after install (patch-package, on postinstall).
  want="$(cat "$ROOT/package-lock.json" "$ROOT"/patches/*.patch 2>/dev/null | sha256sum | cut -d' ' -f1)"
  if [ ! -f "$stamp" ] || [ "$(cat "$stamp")" != "$want" ]; then
    log "installing npm packages (npm ci)"
    (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error)
    echo "$want" >"$stamp"
  fi
}

# Build when no build exists or any source is newer than it.
ensure_build() {
  local id="$ROOT/.next/BUILD_ID"
  if [ -f "$id" ] && [ -z "$(cd "$ROOT" && find app components lib db public next.config.ts instrumentation.ts proxy.ts tailwind.config.ts package-lock.json -newer "$id" -print -quit 2>/dev/null)" ]; then
    return
  fi
  log "building the app (next build)"
  (cd "$ROOT" && mkdir -p .tmp && TMPDIR="$ROOT/.tmp" npx next build >"$ROOT/.tmp/build.log" 2>&1) || {
    tail -n 60 "$ROOT/.tmp/build.log" >&2
    log "the build failed; full log in .tmp/build.log"
    return 1
  }
}

# Run a PostgreSQL tool as the postgres user when we are root (initdb and postgres refuse root).
pg_run() {
  if [ "$(id -u)" -eq 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi
}

# The postgres user must traverse every parent of the data folder.
make_traversable() {
  local dir="$1"
  [ "$(id -u)" -eq 0 ] || return 0
  while [ "$dir" != "/" ]; do
    runuser -u postgres -- test -x "$dir" 2>/dev/null || chmod o+x "$dir"
    dir="$(dirname "$dir")"
  done
}

# pg_up DIR PORT [extra server options]: create the cluster when missing, then start it.
pg_up() {
  local dir="$1" port="$2" extra="${3:-}"
  ensure_postgres
  mkdir -p "$dir"
  make_traversable "$dir"
  if [ "$(id -u)" -eq 0 ]; then chown postgres:postgres "$dir"; fi
  chmod 700 "$dir"
  if [ ! -f "$dir/data/PG_VERSION" ]; then
    log "creating a PostgreSQL cluster in ${dir#"$ROOT"/}"
    pg_run "$PG_BIN/initdb" -D "$dir/data" -U postgres --auth=trust --encoding=UTF8 --locale=C.UTF-8 >/dev/null
  fi
  if pg_run "$PG_BIN/pg_ctl" -D "$dir/data" status >/dev/null 2>&1; then return 0; fi
  pg_run "$PG_BIN/pg_ctl" -D "$dir/data" -l "$dir/server.log" -w -t 30 \
    -o "-c listen_addresses=127.0.0.1 -p $port -k $dir $extra" start >/dev/null
}

pg_down() {
  local dir="$1"
  ensure_postgres
  [ -f "$dir/data/PG_VERSION" ] || return 0
  pg_run "$PG_BIN/pg_ctl" -D "$dir/data" -m fast -w stop >/dev/null 2>&1 || true
}

# create_database PORT NAME: create it unless it exists.
create_database() {
  local port="$1" name="$2"
  if ! pg_run "$PG_BIN/psql" -h 127.0.0.1 -p "$port" -U postgres -tAc "select 1 from pg_database where datname='$name'" postgres | grep -q 1; then
    pg_run "$PG_BIN/createdb" -h 127.0.0.1 -p "$port" -U postgres "$name"
  fi
}

free_port() {
  node -e 'const s=require("net").createServer();s.listen(0,"127.0.0.1",()=>{console.log(s.address().port);s.close()})'
}
