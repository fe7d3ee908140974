#!/usr/bin/env bash
# npm start — everything needed to run Steamwisp with its demo data on a fresh Debian machine:
# MariaDB (installed from Debian if missing), Node packages, migrations, demo seed, build, serve.
# Ctrl-C stops the app; `npm run db:stop` stops the database.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"

ensure_node_modules
bash scripts/db.sh up
npx tsx scripts/migrate.ts
npx tsx scripts/seed.ts

# Rebuild only when something the build reads changed since the last build.
stamp="build/.steamwisp-built"
if [ ! -f "$stamp" ] || [ -n "$(find src static pwa drizzle package-lock.json svelte.config.js vite.config.ts \
	tailwind.config.ts -newer "$stamp" -print -quit)" ]; then
	say "building the app…"
	node_modules/.bin/vite build --logLevel warn
	touch "$stamp"
fi

export HOST="$APP_HOST" PORT="$APP_PORT"
export ORIGIN="${ORIGIN:-http://$APP_HOST:$APP_PORT}"
npx tsx scripts/seed.ts --print-sign-ins
say "Steamwisp is at $ORIGIN  (Ctrl-C stops the app; 'npm run db:stop' stops the database)"
exec node build
