#!/usr/bin/env bash
# The Walk's and sync's benchmarks (part of `npm run bench`): a fresh bench database with the
# demo scenario, the built app on 127.0.0.1, Debian's Chromium driven by scripts/bench-walk.ts,
# then the device's sync client against the same build (scripts/bench-sync.ts).
# Prints figures beside their targets; asserts nothing.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
BENCH_DB="${STEAMWISP_BENCH_DB_NAME:-steamwisp_bench}"
ensure_node_modules
command -v chromium >/dev/null 2>&1 || apt_install "the browser the Walk benchmark drives (chromium)" chromium
db_was_running=0
bash scripts/db.sh status >/dev/null 2>&1 && db_was_running=1
bash scripts/db.sh fresh "$BENCH_DB" >/dev/null
[ "$db_was_running" = 1 ] || trap 'bash scripts/db.sh stop >/dev/null' EXIT
export STEAMWISP_DB_NAME="$BENCH_DB"
npx tsx scripts/migrate.ts >/dev/null
npx tsx scripts/seed.ts >/dev/null
say "building the app for the Walk benchmark…"
node_modules/.bin/vite build --logLevel error >/dev/null
npx tsx scripts/bench-walk.ts
npx tsx scripts/bench-sync.ts
