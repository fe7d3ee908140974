# Shared shell helpers for Steamwisp's scripts. Sourced, not run.
# Every setting has a default and can be overridden from the environment (README: Configuration).
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
DATA_DIR="${STEAMWISP_DATA_DIR:-$ROOT/.data}"
DB_DATADIR="$DATA_DIR/mariadb"
DB_PORT="${STEAMWISP_DB_PORT:-3407}"
DB_NAME="${STEAMWISP_DB_NAME:-steamwisp}"
DB_USER="${STEAMWISP_DB_USER:-steamwisp}"
DB_PASSWORD="${STEAMWISP_DB_PASSWORD:-steamwisp-local}"
DB_PID="$DATA_DIR/mariadb.pid"
DB_LOG="$DATA_DIR/mariadb.err"
# A unix socket path must stay under ~100 bytes; fall back to /tmp for deep checkouts.
DB_SOCKET="$DATA_DIR/mariadb.sock"
if [ ${#DB_SOCKET} -gt 100 ]; then
	DB_SOCKET="/tmp/steamwisp-$(printf '%s' "$DATA_DIR" | sha1sum | cut -c1-12).sock"
fi
APP_HOST="${HOST:-127.0.0.1}"
APP_PORT="${PORT:-4180}"
MAIL_PORT="${STEAMWISP_MAIL_PORT:-2525}"

export PATH="$PATH:/usr/sbin:/sbin"

say() { printf '\033[1msteamwisp:\033[0m %s\n' "$*"; }
die() {
	printf '\033[1;31msteamwisp: %s\033[0m\n' "$*" >&2
	exit 1
}

is_root() { [ "$(id -u)" = 0 ]; }

# require_node — Steamwisp needs Node.js 20.19 or newer (package.json "engines"); Debian 12's
# own nodejs package is 18, which fails later with errors that do not say why.
require_node() {
	local version
	if ! version="$(node -p 'process.versions.node' 2>/dev/null)"; then
		die "Node.js is missing. Steamwisp needs Node.js 20.19 or newer (20 LTS or 22 LTS): install it
    from https://nodejs.org or your distribution's packages (Debian 12's own nodejs is 18, too old), then run this again."
	fi
	local major minor
	IFS=. read -r major minor _ <<<"$version"
	if [ "$major" -lt 20 ] || { [ "$major" -eq 20 ] && [ "$minor" -lt 19 ]; }; then
		die "this machine has Node.js $version, but Steamwisp needs 20.19 or newer (20 LTS or 22 LTS).
    Install a newer Node.js from https://nodejs.org or your distribution's packages (Debian 12's own
    nodejs is 18, too old), make sure 'node --version' shows it, then run this again."
	fi
}

# sql_name NAME — NAME as a backtick-quoted SQL identifier; refuses anything outside [A-Za-z0-9_].
sql_name() {
	[[ "$1" =~ ^[A-Za-z0-9_]{1,64}$ ]] ||
		die "'$1' is not a database or user name Steamwisp accepts: use 1 to 64 letters, digits or _"
	printf '`%s`' "$1"
}

# sql_string TEXT — TEXT as a single-quoted SQL string (backslashes and quotes escaped).
sql_string() {
	local s="${1//\\/\\\\}"
	s="${s//\'/\\\'}"
	printf "'%s'" "$s"
}

# apt_install "why" pkg... — installs Debian packages as root, or tells a non-root user the exact command.
apt_install() {
	local why="$1"
	shift
	if ! is_root; then
		die "$why is missing. Install it from Debian's packages, then run this again:
    sudo apt-get update && sudo apt-get install -y $*"
	fi
	say "$why is missing: installing $* from Debian's packages…"
	export DEBIAN_FRONTEND=noninteractive
	# Package lists may be empty or stale on a fresh machine.
	if ! apt-get install -y -q -o DPkg::Lock::Timeout=600 "$@" >"$DATA_DIR/apt.log" 2>&1; then
		apt-get update -q -o DPkg::Lock::Timeout=600 >>"$DATA_DIR/apt.log" 2>&1 || true
		apt-get install -y -q -o DPkg::Lock::Timeout=600 "$@" >>"$DATA_DIR/apt.log" 2>&1 ||
			die "apt-get install $* failed; see $DATA_DIR/apt.log"
	fi
}

# Installs node_modules with `npm ci` when it is missing or older than package-lock.json.
ensure_node_modules() {
	local stamp="$ROOT/node_modules/.steamwisp-lock.sha256"
	local want
	want="$(sha256sum "$ROOT/package-lock.json" | cut -d' ' -f1)"
	if [ -f "$stamp" ] && [ "$(cat "$stamp")" = "$want" ]; then return 0; fi
	say "installing Node packages (npm ci)…"
	(cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error)
	echo "$want" >"$stamp"
}

mkdir -p "$DATA_DIR"
