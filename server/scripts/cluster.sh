#!/usr/bin/env bash
# npm run cluster: Faintline on several processes, on loopback: a three-node MariaDB Galera cluster, CLUSTER_APPS
# app processes (default 2), a local S3-compatible store for photos and HAProxy in front of both the apps and the
# database nodes. Prints the one URL to use; Ctrl-C stops everything it started.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/../.."
ROOT="$PWD"
if [ -f .env ]; then set -a; . ./.env; set +a; fi
APPS="${CLUSTER_APPS:-2}"
CLUSTER_PORT="${CLUSTER_PORT:-8080}"
APP_PORT0="${CLUSTER_APP_PORT0:-8180}"
DB_PORT="${CLUSTER_DB_PORT:-3340}"
S3_PORT="${S3_FAKE_PORT:-4569}"
GALERA_PORT0="${GALERA_PORT0:-3340}"
RUN="$ROOT/.data/cluster"
mkdir -p "$RUN" .cache
say() { echo "[cluster] $*"; }
pids=()

stop() {
  trap - INT TERM EXIT
  say "stopping…"
  for n in $(seq 1 "$APPS"); do kill -TERM "$(cat "$RUN/app$n.pid" 2>/dev/null)" 2>/dev/null || true; done
  for pid in "${pids[@]}"; do kill -TERM "$pid" 2>/dev/null || true; done
  for n in $(seq 1 "$APPS"); do
    pid="$(cat "$RUN/app$n.pid" 2>/dev/null || true)"
    for _ in $(seq 1 50); do [ -n "$pid" ] && kill -0 "$pid" 2>/dev/null || break; sleep 0.2; done
  done
  bash server/scripts/galera.sh stop
  exit 0
}
trap stop INT TERM EXIT

bash server/scripts/ensure-deps.sh
bash server/scripts/galera.sh start
export EXPO_PUBLIC_SHOW_DEV_INBOX="${EXPO_PUBLIC_SHOW_DEV_INBOX:-1}"
bash server/scripts/build-web.sh

S3_FAKE_PORT="$S3_PORT" S3_FAKE_DIR="$RUN/s3" node --import tsx server/cluster/s3-fake.ts &
pids+=($!)

{
  cat <<CFG
global
  maxconn 4096
  stats socket $RUN/haproxy.sock mode 600 level admin
defaults
  timeout connect 2s
  timeout client 60s
  timeout server 60s
  retries 2
  option redispatch
# The database: every app process writes through one Galera node at a time (no certification conflicts between
# processes in normal running); when it fails its checks, the next node takes over.
listen galera
  mode tcp
  bind 127.0.0.1:$DB_PORT
  balance first
  option tcp-check
  default-server inter 1s fall 2 rise 2 on-marked-down shutdown-sessions
  server n1 127.0.0.1:$((GALERA_PORT0 + 1)) check
  server n2 127.0.0.1:$((GALERA_PORT0 + 2)) check backup
  server n3 127.0.0.1:$((GALERA_PORT0 + 3)) check backup
frontend faintline
  mode http
  bind 127.0.0.1:$CLUSTER_PORT
  # The local test inbox lives on app 1, beside the fake SMTP server.
  acl inbox path_beg /dev/inbox
  use_backend inbox if inbox
  default_backend apps
backend apps
  mode http
  balance roundrobin
  option httpchk GET /api/health
  http-check expect status 200
  default-server inter 1s fall 2 rise 1
CFG
  for n in $(seq 1 "$APPS"); do echo "  server app$n 127.0.0.1:$((APP_PORT0 + n)) check"; done
  echo "backend inbox"
  echo "  mode http"
  echo "  server app1 127.0.0.1:$((APP_PORT0 + 1))"
} >"$RUN/haproxy.cfg"
haproxy -db -f "$RUN/haproxy.cfg" >"$RUN/haproxy.log" 2>&1 &
pids+=($!)

wait_healthy() {
  for _ in $(seq 1 600); do
    curl -fsS "http://127.0.0.1:$1/api/health" >/dev/null 2>&1 && return 0
    sleep 0.5
  done
  say "nothing healthy on port $1; see $RUN/app*.log"
  return 1
}

: >"$RUN/app1.log"
bash server/scripts/cluster-app.sh 1
wait_healthy $((APP_PORT0 + 1))
for n in $(seq 2 "$APPS"); do : >"$RUN/app$n.log"; bash server/scripts/cluster-app.sh "$n"; done
for n in $(seq 2 "$APPS"); do wait_healthy $((APP_PORT0 + n)); done
wait_healthy "$CLUSTER_PORT"

echo
say "Faintline runs on $APPS processes behind HAProxy: http://127.0.0.1:$CLUSTER_PORT"
say "database: Galera nodes 127.0.0.1:$((GALERA_PORT0 + 1))–$((GALERA_PORT0 + 3)) behind 127.0.0.1:$DB_PORT; photos: S3 fake on 127.0.0.1:$S3_PORT"
say "logs in $RUN/; demo sign-ins as for npm start (password faintline-demo). Ctrl-C stops everything."
echo "ready" >"$RUN/state"
wait -n "${pids[@]}" || true
say "HAProxy or the object store ended; stopping the rest"
