#!/usr/bin/env bash
# npm test: type check, lint, unit and API tests (vitest), then browser tests (Playwright).
# Every runner runs even if an earlier one failed; the exit code is non-zero if any failed.
# The tests start their own MariaDB data folders, databases and SMTP fakes, never the dev data.
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
  if "$@"; then echo "=== $name: passed ==="; else echo "=== $name: FAILED ==="; failed+=("$name"); fi
}

step "type check" npx tsc --noEmit -p .
step "lint" npx eslint . --max-warnings=0
step "unit and API tests" npx vitest run
step "client build" npx vite build --logLevel warn
step "browser tests" npx playwright test

echo ""
if [ ${#failed[@]} -gt 0 ]; then
  echo "npm test: failed: ${failed[*]}"
  exit 1
fi
echo "npm test: all runners passed"
