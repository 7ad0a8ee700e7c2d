#!/usr/bin/env bash
# npm start: everything a fresh machine needs, then the server in the foreground. Ctrl-C stops it.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/../.."
mkdir -p .cache .data
bash server/scripts/ensure-deps.sh
db_was_running=0
bash server/scripts/db.sh status && db_was_running=1
bash server/scripts/db.sh start
if [ -f .env ]; then set -a; . ./.env; set +a; fi
# Read at build time: the sign-in screens link to the local test inbox.
export EXPO_PUBLIC_SHOW_DEV_INBOX="${EXPO_PUBLIC_SHOW_DEV_INBOX:-1}"
bash server/scripts/build-web.sh

# A set heap limit also makes V8 grow the heap less eagerly: under device load the server stays
# near 180 MB resident instead of 300 (npm run bench prints it). The bench starts it the same way.
node --max-old-space-size="${SERVER_HEAP_MB:-512}" --import tsx server/index.ts &
server_pid=$!
stop() {
  kill -TERM "$server_pid" 2>/dev/null || true
  wait "$server_pid" 2>/dev/null || true
  # Stop the database only if this command started it.
  [ "$db_was_running" = 1 ] || bash server/scripts/db.sh stop
  exit 0
}
trap stop INT TERM
wait "$server_pid"
status=$?
[ "$db_was_running" = 1 ] || bash server/scripts/db.sh stop
exit $status
