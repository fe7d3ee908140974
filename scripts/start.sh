#!/usr/bin/env bash
# npm start — everything needed to run Steamwisp with its demo data on a fresh Debian machine:
# MariaDB (installed from Debian if missing), Node packages, migrations, demo seed, build, serve.
# Ctrl-C stops the app; `npm run db:stop` stops the database.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
require_node

# A second `npm start` (or anything else) on the port: say so instead of a stack trace.
if (exec 3<>"/dev/tcp/$APP_HOST/$APP_PORT") 2>/dev/null; then
	die "port $APP_PORT on $APP_HOST is already in use (is Steamwisp already running?). Stop it, or run: PORT=4280 npm start"
fi

ensure_node_modules
bash scripts/db.sh up
npx tsx scripts/migrate.ts
npx tsx scripts/seed.ts

# Rebuild only when something the build reads changed since the last build.
stamp="build/.steamwisp-built"
if [ ! -f "$stamp" ] || [ -n "$(find src static pwa server drizzle package-lock.json svelte.config.js vite.config.ts \
	tailwind.config.ts -newer "$stamp" -print -quit)" ]; then
	say "building the app…"
	node_modules/.bin/vite build --logLevel warn
	touch "$stamp"
fi

export HOST="$APP_HOST" PORT="$APP_PORT"
export ORIGIN="${ORIGIN:-http://$APP_HOST:$APP_PORT}"
# adapter-node refuses bodies over 512 KiB by default; a photo may have 8 MiB (MAX_PHOTO_BYTES),
# and the photo route counts that limit itself, so the adapter's stays just above it.
export BODY_SIZE_LIMIT="${BODY_SIZE_LIMIT:-9M}"
npx tsx scripts/seed.ts --print-sign-ins

# E-mail goes to the local SMTP fake (scripts/mail-fake.ts) unless STEAMWISP_SMTP_URL names a real
# server. The demo turns the development mailbox on (off by default: `node server` alone never
# shows it); it shows every reset link sent for a firm to that firm's admins.
if [ -z "${STEAMWISP_SMTP_URL:-}" ]; then
	export STEAMWISP_MAIL_PORT="$MAIL_PORT" STEAMWISP_DEV_MAILBOX=1
	node --import tsx scripts/mail-fake.ts &
	mail_pid=$!
	trap 'kill "$mail_pid" 2>/dev/null || true' EXIT
	say "development mailbox on (STEAMWISP_DEV_MAILBOX=1): e-mail stays on this machine (fake SMTP on 127.0.0.1:$MAIL_PORT) and admins read it, reset links included, in Desk → Mailbox; not for production"
fi
say "Steamwisp is at $ORIGIN  (Ctrl-C stops the app; 'npm run db:stop' stops the database)"
node server
