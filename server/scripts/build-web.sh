#!/usr/bin/env bash
# Exports the web app to dist/ when any client source is newer than the last export.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/../.."
stamp=dist/.built
if [ -f "$stamp" ] && [ -z "$(find app components shared assets app.json babel.config.js package-lock.json -newer "$stamp" -print -quit 2>/dev/null)" ]; then
  exit 0
fi
echo "[web] building the web app (first time about 90 s)…"
export TMPDIR="${TMPDIR:-$PWD/.cache/tmp}"; mkdir -p "$TMPDIR"
CI=1 EXPO_OFFLINE=1 EXPO_NO_TELEMETRY=1 npx expo export --platform web --output-dir dist >.cache/web-build.log 2>&1 || {
  tail -40 .cache/web-build.log >&2; echo "[web] build failed; full log in .cache/web-build.log" >&2; exit 1; }
touch "$stamp"
