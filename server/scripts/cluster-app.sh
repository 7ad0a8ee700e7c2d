#!/usr/bin/env bash
# cluster-app.sh N: starts Faintline app process N of `npm run cluster` in the background (the drill uses it to
# bring a killed process back). Every process talks to the database through HAProxy's Galera frontend.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/../.."
n=$1
RUN="$PWD/.data/cluster"
mkdir -p "$RUN"
if [ -f .env ]; then set -a; . ./.env; set +a; fi
CLUSTER_PORT="${CLUSTER_PORT:-8080}"
APP_PORT0="${CLUSTER_APP_PORT0:-8180}"
DB_PORT="${CLUSTER_DB_PORT:-3340}"
S3_PORT="${S3_FAKE_PORT:-4569}"
# App 1 hosts the fake SMTP server (the others relay mail to it) and seeds the demo; migrations are safe to race.
fake=0 seed=0
[ "$n" = 1 ] && fake=1 && seed=1
WEB_ORIGIN="http://127.0.0.1:$CLUSTER_PORT" PORT=$((APP_PORT0 + n)) FAKE_SMTP=$fake FAINTLINE_SEED_DEMO=$seed \
  STORAGE_DRIVER=s3 S3_ENDPOINT="http://127.0.0.1:$S3_PORT" S3_BUCKET="${S3_BUCKET:-faintline-uploads}" \
  S3_ACCESS_KEY_ID=S3RVER S3_SECRET_ACCESS_KEY=S3RVER SMTP_HOST=127.0.0.1 SMTP_PORT="${SMTP_PORT:-2525}" \
  DATABASE_URL="mariadb://faintline:${FAINTLINE_DB_PASSWORD:-faintline-local}@127.0.0.1:$DB_PORT/faintline" \
  setsid node --max-old-space-size="${SERVER_HEAP_MB:-512}" --import tsx server/index.ts >>"$RUN/app$n.log" 2>&1 </dev/null &
echo $! >"$RUN/app$n.pid"
