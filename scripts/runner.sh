# Sourced by test.sh and bench.sh: installs what is missing, sets the environment, and gives
# `step NAME COMMAND…`, which runs every step even after a failure and records it in $failed.
# RUNNER_PASSED_WORD and RUNNER_FAILED_WORD say how a step is reported ("passed", "FAILED" by
# default; an empty RUNNER_PASSED_WORD prints nothing for a passed step).
cd "$(dirname "${BASH_SOURCE[0]}")/.."
bash scripts/ensure-deps.sh --with-browser || exit 1
export PATH="$PATH:/usr/sbin:/sbin"
# The pinned S3 SDK runs on Node.js 20; its notice about future releases needing 22 is noise here.
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true

failed=()
step() {
  local name="$1"; shift
  echo ""
  echo "=== $name ==="
  if "$@"; then
    [ -n "${RUNNER_PASSED_WORD-passed}" ] && echo "=== $name: ${RUNNER_PASSED_WORD-passed} ==="
  else
    echo "=== $name: ${RUNNER_FAILED_WORD:-FAILED} ==="
    failed+=("$name")
  fi
  return 0
}
