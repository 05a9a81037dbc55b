#!/usr/bin/env bash
# `npm test`: every test. Installs Debian's chromium when /usr/bin/chromium is missing, then runs
# the unit and integration tests (vitest), builds the app, and runs the reliability tests (the
# built server under bad, oversized and racing requests) and the browser tests against it.
# Runs every stage even when an earlier one fails, prints a summary, and exits non-zero on any failure.
set -uo pipefail
cd "$(dirname "$0")/.."

ensure_chromium() {
  if [ -x /usr/bin/chromium ]; then
    return 0
  fi
  echo "==> /usr/bin/chromium is missing: installing Debian's chromium with apt-get"
  local sudo=""
  if [ "$(id -u)" -ne 0 ]; then
    if command -v sudo >/dev/null 2>&1; then
      sudo="sudo"
    else
      echo "Not root and no sudo: install chromium yourself (apt-get install -y chromium)." >&2
      return 1
    fi
  fi
  $sudo apt-get update -q &&
    DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -q --no-install-recommends chromium
}

declare -a names=() results=() seconds=()
stage() {
  local name="$1"
  shift
  echo
  echo "==> $name"
  local started=$SECONDS
  "$@"
  local code=$?
  names+=("$name")
  results+=("$code")
  seconds+=("$((SECONDS - started))")
  return "$code"
}

stage "chromium" ensure_chromium
# Each runner's output is also kept, to add up its test counts for the closing line.
runner_log=$(mktemp)
trap 'rm -f "$runner_log"' EXIT
counted() {
  "$@" 2>&1 | tee -a "$runner_log"
}

stage "unit and integration tests" counted ./node_modules/.bin/vitest run
if stage "build" npm run --silent build; then
  stage "reliability tests" counted ./node_modules/.bin/vitest run --config vitest.reliability.config.ts
  stage "browser tests" counted ./node_modules/.bin/vitest run --config vitest.e2e.config.ts
else
  for skipped in "reliability tests" "browser tests"; do
    names+=("$skipped")
    results+=("skipped")
    seconds+=("0")
  done
fi

echo
echo "==> Summary"
failed=0
for i in "${!names[@]}"; do
  case "${results[$i]}" in
    0) status="passed" ;;
    skipped) status="skipped (the build failed)"; failed=1 ;;
    *) status="FAILED (exit ${results[$i]})"; failed=1 ;;
  esac
  printf '  %-28s %-28s %4ss\n' "${names[$i]}" "$status" "${seconds[$i]}"
done
# One plain line with every test counted: "Tests: N passed, N failed".
sed -e 's/\x1b\[[0-9;]*m//g' "$runner_log" | awk '
  /^ *Tests +[0-9]/ {
    if (match($0, /[0-9]+ passed/)) passed += substr($0, RSTART, RLENGTH) + 0
    if (match($0, /[0-9]+ failed/)) failedn += substr($0, RSTART, RLENGTH) + 0
  }
  END { printf "Tests: %d passed, %d failed\n", passed, failedn }'
exit "$failed"
