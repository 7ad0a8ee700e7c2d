#!/usr/bin/env bash
# npm run check: the house rules, executable. Typecheck (client, server, tests, CLI), ESLint, Prettier.
set -uo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
failed=0
echo "[check] typecheck"
npx tsc --noEmit -p tsconfig.json || failed=1
echo "[check] eslint"
npx eslint --max-warnings=0 . || failed=1
echo "[check] prettier"
npx prettier --check --log-level=warn . || failed=1
[ "$failed" = 0 ] && echo "[check] all clean"
exit $failed
