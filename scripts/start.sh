#!/usr/bin/env bash
# npm start: install what is missing, build the client, then run MariaDB, the SMTP fake and
# the server together until Ctrl-C stops them all.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure-deps.sh
export PATH="$PATH:/usr/sbin:/sbin"
echo "[frostfold] building the client"
npx vite build --logLevel warn
exec npx tsx server/local/start.ts
