#!/usr/bin/env bash
# npm start: install what is missing, build the client, then run MariaDB, the SMTP fake and
# the server together until Ctrl-C stops them all.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure-deps.sh
export PATH="$PATH:/usr/sbin:/sbin"
# The pinned S3 SDK runs on Node.js 20; its notice about future releases needing 22 is noise here.
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true
echo "[frostfold] building the client"
npx vite build --logLevel warn
exec npx tsx server/local/start.ts
