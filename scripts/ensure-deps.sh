#!/usr/bin/env bash
# Installs what a fresh Debian machine with Node.js 20 lacks: Debian's MariaDB (and Chromium
# for the browser tests) through apt-get, and node_modules through `npm ci` when it is missing
# or older than the lockfile. Safe to run every time: it does nothing when all is present.
set -euo pipefail
want_browser="${1:-}"

missing=()
command -v mariadbd >/dev/null 2>&1 || [ -x /usr/sbin/mariadbd ] || missing+=(mariadb-server)
if [ "$want_browser" = "--with-browser" ] && [ ! -x /usr/bin/chromium ]; then missing+=(chromium); fi
if [ ${#missing[@]} -gt 0 ]; then
  echo "[frostfold] installing Debian packages: ${missing[*]}"
  sudo_cmd=""
  if [ "$(id -u)" -ne 0 ]; then sudo_cmd="sudo"; fi
  $sudo_cmd apt-get update -qq
  DEBIAN_FRONTEND=noninteractive $sudo_cmd apt-get install -y -qq "${missing[@]}" >/dev/null
fi
export PATH="$PATH:/usr/sbin:/sbin"

if [ ! -d node_modules ] || [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "[frostfold] installing npm packages (npm ci)"
  npm ci --no-audit --no-fund
fi
