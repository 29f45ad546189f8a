#!/usr/bin/env bash
# npm run bench: every benchmark, each printing its figures. None of them fails on a figure;
# a benchmark fails only when it cannot run (a refused request, a missing demo design).
# Each uses its own ports and data folders, so it can run beside `npm start` and `npm test`.
set -uo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure-deps.sh --with-browser || exit 1
export PATH="$PATH:/usr/sbin:/sbin"
# The pinned S3 SDK runs on Node.js 20; its notice about future releases needing 22 is noise here.
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true

failed=()
step() {
  local name="$1"; shift
  echo ""
  echo "=== $name ==="
  if "$@"; then :; else echo "=== $name: could not run ==="; failed+=("$name"); fi
}

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
