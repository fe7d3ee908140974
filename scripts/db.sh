#!/usr/bin/env bash
# Steamwisp's private MariaDB: a data directory inside the project, bound to 127.0.0.1 only.
#   scripts/db.sh up            install (if missing), initialise, start, create user and database
#   scripts/db.sh stop          shut the server down cleanly
#   scripts/db.sh status        say whether it runs
#   scripts/db.sh fresh NAME    drop and re-create database NAME (used for the test database)
source "$(dirname "$0")/lib.sh"

SOCK_USER="$(id -un)"

admin() { mariadb-admin --no-defaults --socket="$DB_SOCKET" -u"$SOCK_USER" "$@"; }
sql() { mariadb --no-defaults --socket="$DB_SOCKET" -u"$SOCK_USER" -e "$1"; }

running() { [ -S "$DB_SOCKET" ] && admin ping >/dev/null 2>&1; }

ensure_installed() {
	command -v mariadbd >/dev/null 2>&1 || apt_install "the MariaDB server (mariadbd)" mariadb-server
	command -v mariadb-install-db >/dev/null 2>&1 || apt_install "the MariaDB set-up tool (mariadb-install-db)" mariadb-server
}

initialise() {
	[ -d "$DB_DATADIR/mysql" ] && return 0
	say "initialising a private MariaDB data directory in ${DB_DATADIR#"$ROOT"/}…"
	mkdir -p "$DB_DATADIR"
	mariadb-install-db --no-defaults --datadir="$DB_DATADIR" --user="$SOCK_USER" \
		--auth-root-authentication-method=socket --auth-root-socket-user="$SOCK_USER" \
		--skip-test-db >"$DATA_DIR/mariadb-install.log" 2>&1 ||
		{ tail -n 20 "$DATA_DIR/mariadb-install.log" >&2; die "mariadb-install-db failed"; }
}

start() {
	if running; then return 0; fi
	if [ -f "$DB_PID" ] && ! kill -0 "$(cat "$DB_PID")" 2>/dev/null; then rm -f "$DB_PID" "$DB_SOCKET"; fi
	say "starting MariaDB on 127.0.0.1:$DB_PORT…"
	local since
	since=0; [ -f "$DB_LOG" ] && since=$(wc -c <"$DB_LOG")
	# setsid + redirected output: the server must not hold the caller's terminal or pipes.
	# Its own temporary directory inside the project: a shared /tmp cleaned by someone else
	# must not take the files of a sort or a window function away mid-query.
	mkdir -p "$DATA_DIR/mariadb-tmp"
	setsid mariadbd --no-defaults --datadir="$DB_DATADIR" --tmpdir="$DATA_DIR/mariadb-tmp" --user="$SOCK_USER" \
		--bind-address=127.0.0.1 --port="$DB_PORT" --socket="$DB_SOCKET" --pid-file="$DB_PID" \
		--log-error="$DB_LOG" --skip-name-resolve --innodb-buffer-pool-size="${STEAMWISP_DB_BUFFER_POOL:-512M}" \
		--default-time-zone=+00:00 --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
		--max-connections=200 </dev/null >/dev/null 2>&1 &
	local deadline=$((SECONDS + ${STEAMWISP_DB_START_TIMEOUT:-60}))
	until running; do
		if [ $SECONDS -ge $deadline ]; then
			echo "---- last lines of $DB_LOG ----" >&2
			tail -c +$((since + 1)) "$DB_LOG" 2>/dev/null | tail -n 25 >&2
			die "MariaDB did not accept connections within ${STEAMWISP_DB_START_TIMEOUT:-60} s (port $DB_PORT busy? see the log above)"
		fi
		sleep 0.25
	done
}

create_database() {
	local name user password
	sql_name "$1" >/dev/null && sql_name "$DB_USER" >/dev/null
	name="$(sql_name "$1")"
	user="$(sql_string "$DB_USER")"
	password="$(sql_string "$DB_PASSWORD")"
	sql "CREATE DATABASE IF NOT EXISTS $name CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
		CREATE USER IF NOT EXISTS $user@'127.0.0.1' IDENTIFIED BY $password;
		CREATE USER IF NOT EXISTS $user@'localhost' IDENTIFIED BY $password;
		ALTER USER $user@'127.0.0.1' IDENTIFIED BY $password;
		ALTER USER $user@'localhost' IDENTIFIED BY $password;
		GRANT ALL PRIVILEGES ON $name.* TO $user@'127.0.0.1';
		GRANT ALL PRIVILEGES ON $name.* TO $user@'localhost';"
}

# refuse_development NAME — `fresh` drops NAME: never the database npm start uses (steamwisp,
# or STEAMWISP_DB_NAME when it names another one than the test database).
refuse_development() {
	local test_db="${STEAMWISP_TEST_DB_NAME:-steamwisp_test}"
	if [ "$1" = steamwisp ]; then
		die "scripts/db.sh fresh will not drop 'steamwisp': it is the development database (npm start's),
    with your demo data and your own changes. Name another database, e.g. scripts/db.sh fresh steamwisp_test"
	fi
	if [ "$1" = "$DB_NAME" ] && [ "$1" != "$test_db" ]; then
		die "scripts/db.sh fresh will not drop '$1': STEAMWISP_DB_NAME names it, so npm start would use it
    as the development database. If it is a scratch database, run: env -u STEAMWISP_DB_NAME bash scripts/db.sh fresh $1"
	fi
}

stop() {
	if ! running; then
		say "MariaDB is not running."
		return 0
	fi
	say "stopping MariaDB…"
	local pid
	pid="$(cat "$DB_PID" 2>/dev/null || true)"
	admin shutdown
	while [ -n "$pid" ] && kill -0 "$pid" 2>/dev/null; do sleep 0.2; done
	say "MariaDB stopped."
}

case "${1:-up}" in
up)
	ensure_installed
	initialise
	start
	create_database "$DB_NAME"
	;;
fresh)
	[ -n "${2:-}" ] || die "usage: scripts/db.sh fresh DATABASE"
	sql_name "$2" >/dev/null
	refuse_development "$2"
	ensure_installed
	initialise
	start
	sql "DROP DATABASE IF EXISTS $(sql_name "$2");"
	create_database "$2"
	;;
stop) stop ;;
status)
	if running; then say "MariaDB runs on 127.0.0.1:$DB_PORT (data in $DB_DATADIR)"; else
		say "MariaDB is not running."
		exit 3
	fi
	;;
*) die "usage: scripts/db.sh up|stop|status|fresh NAME" ;;
esac
