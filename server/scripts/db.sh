#!/usr/bin/env bash
# A private MariaDB for this checkout: installed from Debian when missing, data in .data/, loopback only.
#   db.sh start   install if needed, initialise once, start, create the databases and app user
#   db.sh stop    shut it down
#   db.sh status  exit 0 when it answers
set -euo pipefail
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
DATA="${FAINTLINE_DB_DIR:-$ROOT/.data/mariadb}"
PORT="${FAINTLINE_DB_PORT:-3317}"
SOCK="$DATA/mysqld.sock"
DB_USER="faintline"
DB_PASS="${FAINTLINE_DB_PASSWORD:-faintline-local}"
DATABASES="${FAINTLINE_DATABASES:-faintline faintline_test faintline_e2e}"

say() { echo "[db] $*"; }

ensure_installed() {
  command -v mariadbd >/dev/null 2>&1 || [ -x /usr/sbin/mariadbd ] && return 0
  say "installing mariadb-server from Debian's packages (first run only)…"
  export DEBIAN_FRONTEND=noninteractive
  if ! apt-get install -y -q --no-install-recommends -o DPkg::Lock::Timeout=300 mariadb-server mariadb-client >/dev/null; then
    apt-get update -q -o DPkg::Lock::Timeout=300 >/dev/null
    apt-get install -y -q --no-install-recommends -o DPkg::Lock::Timeout=300 mariadb-server mariadb-client >/dev/null
  fi
}

client() { mariadb --no-defaults --socket="$SOCK" -uroot "$@"; }
ping_db() { mariadb-admin --no-defaults --socket="$SOCK" -uroot ping >/dev/null 2>&1; }

our_pid_running() {
  [ -f "$DATA/mysqld.pid" ] || return 1
  local pid; pid="$(cat "$DATA/mysqld.pid" 2>/dev/null || true)"
  [ -n "$pid" ] && [ -r "/proc/$pid/cmdline" ] && tr '\0' ' ' <"/proc/$pid/cmdline" | grep -q -- "--datadir=$DATA"
}

start() {
  ensure_installed
  export PATH="$PATH:/usr/sbin"
  mkdir -p "$(dirname "$DATA")"
  exec 9>"$(dirname "$DATA")/.db.lock"
  flock 9
  if ping_db; then say "already running on 127.0.0.1:$PORT"; else
    if [ ! -d "$DATA/mysql" ]; then
      say "initialising a private data directory in $DATA"
      mkdir -p "$DATA"
      mariadb-install-db --no-defaults --datadir="$DATA" --auth-root-authentication-method=normal \
        --skip-test-db --skip-name-resolve >"$DATA/install.log" 2>&1
      chmod 700 "$DATA"
    fi
    our_pid_running || rm -f "$DATA/mysqld.pid" "$SOCK"
    setsid mariadbd --no-defaults --user=root --datadir="$DATA" --socket="$SOCK" \
      --pid-file="$DATA/mysqld.pid" --log-error="$DATA/error.log" --bind-address=127.0.0.1 \
      --port="$PORT" --skip-name-resolve --character-set-server=utf8mb4 \
      --collation-server=utf8mb4_unicode_ci --innodb-buffer-pool-size=256M \
      --innodb-flush-log-at-trx-commit=2 </dev/null >/dev/null 2>&1 9>&- &
    for _ in $(seq 1 150); do ping_db && break; sleep 0.2; done
    ping_db || { say "MariaDB did not start; see $DATA/error.log"; tail -20 "$DATA/error.log" >&2; exit 1; }
    say "started on 127.0.0.1:$PORT"
  fi
  local sql="DELETE FROM mysql.global_priv WHERE User='root' AND Host<>'localhost'; DELETE FROM mysql.global_priv WHERE User='';"
  sql+="CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASS';"
  for db in $DATABASES; do
    sql+="CREATE DATABASE IF NOT EXISTS \`$db\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
    sql+="GRANT ALL PRIVILEGES ON \`$db\`.* TO '$DB_USER'@'127.0.0.1';"
  done
  client -e "$sql FLUSH PRIVILEGES;"
}

stop() {
  if ping_db; then
    client -e SHUTDOWN || true
    for _ in $(seq 1 100); do our_pid_running || break; sleep 0.2; done
    say "stopped"
  else
    say "not running"
  fi
}

case "${1:-start}" in
  start) start ;;
  stop) stop ;;
  status) ping_db ;;
  reset) # drop and recreate one database: db.sh reset NAME
    start; client -e "DROP DATABASE IF EXISTS \`$2\`; CREATE DATABASE \`$2\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci; GRANT ALL PRIVILEGES ON \`$2\`.* TO '$DB_USER'@'127.0.0.1';" ;;
  *) echo "usage: db.sh start|stop|status|reset NAME" >&2; exit 2 ;;
esac
