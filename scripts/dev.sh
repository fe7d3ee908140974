#!/usr/bin/env bash
# npm run dev — Vite's dev server with hot reload on the dev database (started if needed).
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
ensure_node_modules
bash scripts/db.sh up
npx tsx scripts/migrate.ts
# As npm start: the development mailbox (Desk → Mailbox) unless a real mail server is set.
if [ -z "${STEAMWISP_SMTP_URL:-}" ]; then
	export STEAMWISP_MAIL_PORT="$MAIL_PORT" STEAMWISP_DEV_MAILBOX=1
	node --import tsx scripts/mail-fake.ts &
	mail_pid=$!
	trap 'kill "$mail_pid" 2>/dev/null || true' EXIT
fi
# Started directly (not through npx) so Ctrl-C stops the server itself: through npx, vite's
# node child keeps running when its parent is killed.
node_modules/.bin/vite dev --host "$APP_HOST" --port "${PORT:-5173}"
