#!/usr/bin/env bash
# Exports the web app to dist/ when any client source, or an EXPO_PUBLIC_* value, changed since the last export.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/../.."
stamp=dist/.built
public_env="$(env | grep '^EXPO_PUBLIC_' | sort || true)"
if [ -f "$stamp" ] && [ "$(cat "$stamp")" = "$public_env" ] &&
  [ -z "$(find app components shared assets app.json babel.config.js package-lock.json -newer "$stamp" -print -quit 2>/dev/null)" ]; then
  exit 0
fi
clear=()
# Metro caches inlined EXPO_PUBLIC_* values: start clean when they changed.
if [ -f "$stamp" ] && [ "$(cat "$stamp")" != "$public_env" ]; then clear=(--clear); fi
echo "[web] building the web app (first time about 90 s)…"
mkdir -p .cache
export TMPDIR="${TMPDIR:-$PWD/.cache/tmp}"; mkdir -p "$TMPDIR"
CI=1 EXPO_OFFLINE=1 EXPO_NO_TELEMETRY=1 npx expo export --platform web --output-dir dist "${clear[@]}" >.cache/web-build.log 2>&1 || {
  tail -40 .cache/web-build.log >&2; echo "[web] build failed; full log in .cache/web-build.log" >&2; exit 1; }
printf '%s' "$public_env" > "$stamp"
