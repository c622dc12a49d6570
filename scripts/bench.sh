#!/usr/bin/env bash
# npm run bench: speed figures of the engine, the server and the editor on a throwaway stack.
# Each bench prints human lines and a last JSON line; this script ends with one JSON line merging them.
source "$(dirname "$0")/lib/common.sh"
source "$ROOT/scripts/lib/stack.sh"
cd "$ROOT"

ensure_node_modules
ensure_postgres
ensure_chromium
stack_up bench

# `npm run bench -- pages load` runs only bench/pages.ts and bench/load.ts.
benches=(bench/*.ts)
if [ $# -gt 0 ]; then benches=(); for name in "$@"; do benches+=("bench/$name.ts"); done; fi

merged="{}"
for bench in "${benches[@]}"; do
  log "running $bench"
  out="$(npx tsx "$bench" | tee /dev/stderr | tail -n 1)" || { log "$bench failed"; continue; }
  merged="$(node -e 'const a=JSON.parse(process.argv[1]);let b={};try{b=JSON.parse(process.argv[2])}catch{};console.log(JSON.stringify({...a,...b}))' "$merged" "$out")"
done
echo "$merged"
