#!/usr/bin/env bash
# npm test: type check, lint, unit and API tests (vitest), then browser tests (Playwright).
# Every runner runs even if an earlier one failed; the exit code is non-zero if any failed.
# The tests start their own MariaDB data folders, databases and SMTP fakes, never the dev data.
set -uo pipefail
source "$(dirname "$0")/runner.sh"

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
