#!/usr/bin/env bash
# npm run cluster: Faintline on several processes, on loopback: a three-node MariaDB Galera cluster, CLUSTER_APPS
# app processes (default 2), a local S3-compatible store for photos and HAProxy in front. Ctrl-C stops all it started.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/../.."
ROOT="$PWD"
APPS="${CLUSTER_APPS:-2}"
CLUSTER_PORT="${CLUSTER_PORT:-8080}"
APP_PORT0="${CLUSTER_APP_PORT0:-8180}"   # app N listens on APP_PORT0+N
S3_PORT="${S3_FAKE_PORT:-4569}"
GALERA_PORT0="${GALERA_PORT0:-3340}"
RUN="$ROOT/.data/cluster"
mkdir -p "$RUN" .cache
say() { echo "[cluster] $*"; }
pids=()

stop() {
  trap - INT TERM EXIT
  say "stopping…"
  for pid in "${pids[@]}"; do kill -TERM "$pid" 2>/dev/null || true; done
  for pid in "${pids[@]}"; do wait "$pid" 2>/dev/null || true; done
  bash server/scripts/galera.sh stop
  exit 0
}
trap stop INT TERM EXIT

bash server/scripts/ensure-deps.sh
bash server/scripts/galera.sh start
if [ -f .env ]; then set -a; . ./.env; set +a; fi
export EXPO_PUBLIC_SHOW_DEV_INBOX="${EXPO_PUBLIC_SHOW_DEV_INBOX:-1}"
bash server/scripts/build-web.sh

S3_FAKE_PORT="$S3_PORT" S3_FAKE_DIR="$RUN/s3" node --import tsx server/cluster/s3-fake.ts &
pids+=($!)

# Everything the app processes share: the database cluster, object storage, one mail relay, one public origin.
export WEB_ORIGIN="http://127.0.0.1:$CLUSTER_PORT"
export STORAGE_DRIVER=s3 S3_ENDPOINT="http://127.0.0.1:$S3_PORT" S3_BUCKET="${S3_BUCKET:-faintline-uploads}"
export S3_ACCESS_KEY_ID=S3RVER S3_SECRET_ACCESS_KEY=S3RVER
export SMTP_HOST=127.0.0.1 SMTP_PORT="${SMTP_PORT:-2525}"

start_app() { # start_app N: app N talks to Galera node ((N-1) mod 3)+1
  local n=$1 node=$(( (($1 - 1) % 3) + 1 ))
  # App 1 runs the migrations, seeds the demo and hosts the fake SMTP server (the others relay mail to it).
  local fake=0 seed=0
  [ "$n" = 1 ] && fake=1 && seed=1
  PORT=$((APP_PORT0 + n)) FAKE_SMTP=$fake FAINTLINE_SEED_DEMO=$seed FAINTLINE_INSTANCE="app$n" \
    DATABASE_URL="mariadb://faintline:${FAINTLINE_DB_PASSWORD:-faintline-local}@127.0.0.1:$((GALERA_PORT0 + node))/faintline" \
    node --max-old-space-size="${SERVER_HEAP_MB:-512}" --import tsx server/index.ts >"$RUN/app$n.log" 2>&1 &
  pids+=($!)
  echo $! >"$RUN/app$n.pid"
}

wait_healthy() {
  local port=$1
  for _ in $(seq 1 240); do
    curl -fsS "http://127.0.0.1:$port/api/health" >/dev/null 2>&1 && return 0
    sleep 0.5
  done
  say "app on port $port did not become healthy; see $RUN/app*.log"
  return 1
}

start_app 1
wait_healthy $((APP_PORT0 + 1))
for n in $(seq 2 "$APPS"); do start_app "$n"; done
for n in $(seq 2 "$APPS"); do wait_healthy $((APP_PORT0 + n)); done

{
  cat <<CFG
global
  maxconn 4096
defaults
  mode http
  timeout connect 2s
  timeout client 60s
  timeout server 60s
  retries 2
  option redispatch
frontend faintline
  bind 127.0.0.1:$CLUSTER_PORT
  # The local test inbox lives on app 1, beside the fake SMTP server.
  acl inbox path_beg /dev/inbox
  use_backend inbox if inbox
  default_backend apps
backend apps
  balance roundrobin
  option httpchk GET /api/health
  http-check expect status 200
  default-server inter 1s fall 2 rise 1
CFG
  for n in $(seq 1 "$APPS"); do echo "  server app$n 127.0.0.1:$((APP_PORT0 + n)) check"; done
  echo "backend inbox"
  echo "  server app1 127.0.0.1:$((APP_PORT0 + 1))"
} >"$RUN/haproxy.cfg"
haproxy -db -f "$RUN/haproxy.cfg" >"$RUN/haproxy.log" 2>&1 &
pids+=($!)
echo $! >"$RUN/haproxy.pid"
wait_healthy "$CLUSTER_PORT"

echo
say "Faintline runs on $APPS processes behind HAProxy: http://127.0.0.1:$CLUSTER_PORT"
say "database: Galera nodes 127.0.0.1:$((GALERA_PORT0 + 1))–$((GALERA_PORT0 + 3)); photos: S3 fake on 127.0.0.1:$S3_PORT; logs in $RUN/"
say "demo sign-ins as for npm start (password faintline-demo). Ctrl-C stops everything."
wait -n "${pids[@]}" || true
say "a process ended; stopping the rest"
