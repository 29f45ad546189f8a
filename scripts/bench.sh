#!/usr/bin/env bash
# npm run bench: every benchmark, each printing its figures. None of them fails on a figure;
# a benchmark fails only when it cannot run (a refused request, a missing demo design).
# Each uses its own ports and data folders, so it can run beside `npm start` and `npm test`.
set -uo pipefail
# A benchmark prints its own figures; only one that could not run is reported.
RUNNER_PASSED_WORD="" RUNNER_FAILED_WORD="could not run"
source "$(dirname "$0")/runner.sh"

step "engine (vitest bench)" npx vitest bench --run --project shared
step "1,000,000-row log upload" npx tsx tests/bench/boil-off-upload.ts
step "POST /api/estimate load (autocannon)" npx tsx tests/bench/estimate-load.ts
step "client build" npx vite build --logLevel warn
step "browser: edit-to-repaint and sign-in JavaScript" npx playwright test -c playwright.bench.config.ts

echo ""
if [ ${#failed[@]} -gt 0 ]; then
  echo "npm run bench: could not run: ${failed[*]}"
  exit 1
fi
echo "npm run bench: done"
