#!/usr/bin/env bash
# A three-node MariaDB Galera cluster on loopback for `npm run cluster` and the cluster drill.
#   galera.sh start        install if needed, initialise once, bootstrap node 1, join nodes 2 and 3 (state transfer by mariadb-backup)
#   galera.sh stop         shut the nodes down, node 1 last (so it may bootstrap the next start)
#   galera.sh kill N       SIGKILL node N (for the drill)
#   galera.sh restart N    start node N again; it rejoins and catches up (IST, or a full state transfer)
#   galera.sh status       one line per node: state and cluster size
set -euo pipefail
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
BASE="${GALERA_DIR:-$ROOT/.data/galera}"
PORT0="${GALERA_PORT0:-3340}"   # node N answers SQL on PORT0+N, replication on 4440+N, IST 4450+N, state transfer 4460+N
REPL0="${GALERA_REPL0:-4440}"
DB_USER="faintline"
DB_PASS="${FAINTLINE_DB_PASSWORD:-faintline-local}"
SST_PASS="faintline-sst-local"
NODES=(1 2 3)

say() { echo "[galera] $*"; }
dir() { echo "$BASE/n$1"; }
sock() { echo "$(dir "$1")/mysqld.sock"; }
client() { local n=$1; shift; mariadb --no-defaults --socket="$(sock "$n")" -uroot "$@"; }
ping_node() { mariadb-admin --no-defaults --socket="$(sock "$1")" -uroot ping >/dev/null 2>&1; }
state() { client "$1" -N -e "SHOW STATUS LIKE 'wsrep_local_state_comment'" 2>/dev/null | awk '{print $2}'; }

ensure_installed() {
  local missing=()
  command -v mariadbd >/dev/null 2>&1 || missing+=(mariadb-server mariadb-client)
  [ -f /usr/lib/galera/libgalera_smm.so ] || missing+=(galera-4)
  command -v mariadb-backup >/dev/null 2>&1 || missing+=(mariadb-backup)
  command -v socat >/dev/null 2>&1 || missing+=(socat)
  command -v haproxy >/dev/null 2>&1 || missing+=(haproxy)
  [ ${#missing[@]} = 0 ] && return 0
  say "installing ${missing[*]} from Debian's packages (first run only)…"
  export DEBIAN_FRONTEND=noninteractive
  apt-get install -y -q --no-install-recommends -o DPkg::Lock::Timeout=300 "${missing[@]}" >/dev/null 2>&1 ||
    { apt-get update -q -o DPkg::Lock::Timeout=300 >/dev/null && apt-get install -y -q --no-install-recommends -o DPkg::Lock::Timeout=300 "${missing[@]}" >/dev/null; }
}

# After a crash grastate.dat says seqno -1: recover the last committed position from InnoDB so the node can catch
# up by incremental transfer (IST) instead of copying everything again.
recovered_position() {
  local d
  d="$(dir "$1")"
  grep -q '^seqno: *-1' "$d/grastate.dat" 2>/dev/null || return 0
  mariadbd --no-defaults --user=root --datadir="$d" --socket="$d/recover.sock" --skip-networking --wsrep-on=ON \
    --wsrep-provider=/usr/lib/galera/libgalera_smm.so --binlog-format=ROW --wsrep-sst-method=mariabackup --wsrep-cluster-address=gcomm:// --wsrep-recover --log-error="$d/recover.log" >/dev/null 2>&1 || true
  sed -n 's/.*WSREP: Recovered position: *\([0-9a-f-]*:[0-9-]*\).*/\1/p' "$d/recover.log" 2>/dev/null | tail -1 || true
}

start_node() { # start_node N CLUSTER_ADDRESS
  local n=$1 address=$2 d position extra=()
  d="$(dir "$n")"
  position="$(recovered_position "$n")"
  [ -n "$position" ] && extra+=(--wsrep-start-position="$position")
  setsid mariadbd --no-defaults --user=root --datadir="$d" --socket="$(sock "$n")" --pid-file="$d/mysqld.pid" \
    --log-error="$d/error.log" --bind-address=127.0.0.1 --port=$((PORT0 + n)) --skip-name-resolve \
    --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci --max-connections=300 \
    --binlog-format=ROW --innodb-autoinc-lock-mode=2 --innodb-flush-log-at-trx-commit=2 \
    --wsrep-on=ON --wsrep-provider=/usr/lib/galera/libgalera_smm.so --wsrep-cluster-name=faintline-local \
    --wsrep-node-name="n$n" --wsrep-node-address="127.0.0.1:$((REPL0 + n))" --wsrep-cluster-address="$address" \
    --wsrep-provider-options="gmcast.listen_addr=tcp://127.0.0.1:$((REPL0 + n));ist.recv_addr=127.0.0.1:$((REPL0 + 10 + n));gcache.size=256M" \
    --wsrep-sst-receive-address="127.0.0.1:$((REPL0 + 20 + n))" --wsrep-sst-method=mariabackup --wsrep-sst-auth="sst:$SST_PASS" \
    --wsrep-slave-threads=2 "${extra[@]}" </dev/null >/dev/null 2>&1 9>&- &
  echo $! >"$d/started.pid"
}

wait_synced() { # wait_synced N SECONDS
  local n=$1 limit=$2 i
  for ((i = 0; i < limit * 2; i++)); do
    [ "$(state "$n")" = Synced ] && return 0
    kill -0 "$(cat "$(dir "$n")/started.pid" 2>/dev/null)" 2>/dev/null || { say "node $n stopped while starting; see $(dir "$n")/error.log"; return 1; }
    sleep 0.5
  done
  say "node $n did not reach Synced in ${limit}s; see $(dir "$n")/error.log"
  return 1
}

init_dir() {
  local d
  d="$(dir "$1")"
  [ -d "$d/mysql" ] && return 0
  mkdir -p "$d"
  mariadb-install-db --no-defaults --datadir="$d" --auth-root-authentication-method=normal --skip-test-db --skip-name-resolve >"$BASE/install-n$1.log" 2>&1
  chmod 700 "$d"
}

# The first time: node 1 is initialised and prepared alone, then copied to nodes 2 and 3, so all three start from
# the same state and join without a full state transfer.
first_creation() {
  rm -rf "$(dir 1)" "$(dir 2)" "$(dir 3)"
  init_dir 1
  start_node 1 "gcomm://"
  wait_synced 1 120
  prepare_node1
  stop_node 1
  for n in 2 3; do
    cp -a "$(dir 1)" "$(dir "$n")"
    sed -i 's/^safe_to_bootstrap: 1/safe_to_bootstrap: 0/' "$(dir "$n")/grastate.dat"
    rm -f "$(dir "$n")"/*.pid "$(dir "$n")"/error.log
  done
}

prepare_node1() {
  client 1 -e "CREATE USER IF NOT EXISTS 'sst'@'localhost' IDENTIFIED BY '$SST_PASS';
    GRANT RELOAD, PROCESS, LOCK TABLES, BINLOG MONITOR, REPLICA MONITOR ON *.* TO 'sst'@'localhost';
    CREATE DATABASE IF NOT EXISTS faintline CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
    CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASS';
    GRANT ALL PRIVILEGES ON faintline.* TO '$DB_USER'@'127.0.0.1';
    GRANT ALL PRIVILEGES ON \`faintline\\_%\`.* TO '$DB_USER'@'127.0.0.1';
    DROP USER IF EXISTS 'root'@'127.0.0.1', 'root'@'::1';"
}

# When a joiner dies half way, the nodes left may have lost their majority (two of two became one of two):
# tell a surviving node to form the primary component again.
restore_primary() {
  for m in "${NODES[@]}"; do
    [ "$m" = "$1" ] && continue
    ping_node "$m" || continue
    [ "$(client "$m" -N -e "SHOW STATUS LIKE 'wsrep_cluster_status'" | awk '{print $2}')" = Primary ] && return 0
    client "$m" -e "SET GLOBAL wsrep_provider_options='pc.bootstrap=YES'" && return 0
  done
}

# A node joins and catches up; if its state transfer fails (say, one cut off half way), it starts over from an
# empty data directory, which this development cluster can always afford.
join() {
  local n=$1
  say "node $n joining on 127.0.0.1:$((PORT0 + n)) (state transfer from the cluster)…"
  rm -rf "$(dir "$n")/.sst"
  start_node "$n" "$(cluster_address)"
  wait_synced "$n" 240 && return 0
  say "node $n: state transfer failed; starting it over from an empty data directory"
  stop_node "$n"
  pkill -9 -f "datadir=$(dir "$n") " 2>/dev/null || true
  restore_primary "$n"
  rm -rf "$(dir "$n")"
  init_dir "$n"
  start_node "$n" "$(cluster_address)"
  wait_synced "$n" 240
}

cluster_address() { echo "gcomm://127.0.0.1:$((REPL0 + 1)),127.0.0.1:$((REPL0 + 2)),127.0.0.1:$((REPL0 + 3))"; }

start() {
  ensure_installed
  mkdir -p "$BASE"
  exec 9>"$BASE/.lock"
  flock 9
  if [ ! -d "$(dir 1)/mysql" ]; then first_creation; fi
  if ! ping_node 1; then
    # Node 1 bootstraps the cluster. After a clean stop it was the last to go; after a crash, this dev cluster trusts it anyway.
    sed -i 's/^safe_to_bootstrap: 0/safe_to_bootstrap: 1/' "$(dir 1)/grastate.dat" 2>/dev/null || true
    say "bootstrapping node 1 on 127.0.0.1:$((PORT0 + 1))"
    start_node 1 "gcomm://"
    wait_synced 1 60
  fi
  # One joiner at a time: each state transfer reads the donor whole.
  for n in 2 3; do ping_node "$n" || join "$n"; done
  say "3 nodes synced: 127.0.0.1:$((PORT0 + 1)), :$((PORT0 + 2)), :$((PORT0 + 3))"
}

stop_node() {
  local n=$1 pid
  ping_node "$n" || return 0
  pid="$(cat "$(dir "$n")/mysqld.pid" 2>/dev/null || true)"
  client "$n" -e SHUTDOWN >/dev/null 2>&1 || true
  for _ in $(seq 1 120); do [ -n "$pid" ] && kill -0 "$pid" 2>/dev/null || break; sleep 0.5; done
}

stop() {
  for n in 3 2 1; do stop_node "$n"; done
  say "stopped"
}

kill_node() {
  local pid
  pid="$(cat "$(dir "$1")/mysqld.pid")"
  kill -9 "$pid"
  say "node $1 killed (pid $pid)"
}

restart_node() {
  join "$1"
  say "node $1 back and synced"
}

status() {
  for n in "${NODES[@]}"; do
    if ping_node "$n"; then
      echo "n$n 127.0.0.1:$((PORT0 + n)) $(state "$n") size=$(client "$n" -N -e "SHOW STATUS LIKE 'wsrep_cluster_size'" | awk '{print $2}')"
    else
      echo "n$n 127.0.0.1:$((PORT0 + n)) down"
    fi
  done
}

case "${1:-start}" in
  start) start ;;
  stop) stop ;;
  kill) kill_node "$2" ;;
  restart) restart_node "$2" ;;
  status) status ;;
  *) echo "usage: galera.sh start|stop|kill N|restart N|status" >&2; exit 2 ;;
esac
