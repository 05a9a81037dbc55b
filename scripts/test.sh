#!/usr/bin/env bash
# `npm test`: every test. Installs Debian's chromium and poppler-utils when missing, then runs
# the typecheck and the lint (a reach past the engine's front door fails here), the unit, component
# and integration tests (vitest), builds the app and runs the reliability tests (the built
# server under bad, oversized and racing requests, the analysis budget, saves surviving kill -9) and
# the browser tests against it.
# Runs every stage even when an earlier one fails, prints a summary, and exits non-zero on any failure.
set -uo pipefail
cd "$(dirname "$0")/.."

# Debian packages the tests use: chromium (browser tests) and poppler-utils (pdftotext and pdftoppm
# read the PDFs the app makes). Installed with apt-get when missing.
ensure_test_packages() {
  local missing=()
  [ -x /usr/bin/chromium ] || missing+=(chromium)
  command -v pdftotext >/dev/null 2>&1 || missing+=(poppler-utils)
  if [ ${#missing[@]} -eq 0 ]; then
    return 0
  fi
  echo "==> missing: ${missing[*]}: installing Debian's packages with apt-get"
  local sudo=""
  if [ "$(id -u)" -ne 0 ]; then
    if command -v sudo >/dev/null 2>&1; then
      sudo="sudo"
    else
      echo "Not root and no sudo: install them yourself (apt-get install -y ${missing[*]})." >&2
      return 1
    fi
  fi
  $sudo apt-get update -q &&
    DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -q --no-install-recommends "${missing[@]}"
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

stage "test packages" ensure_test_packages
# Each runner's output is also kept, to add up its test counts for the closing line.
runner_log=$(mktemp)
trap 'rm -f "$runner_log"' EXIT
counted() {
  "$@" 2>&1 | tee -a "$runner_log"
}

stage "typecheck" npm run --silent typecheck
stage "lint" ./node_modules/.bin/eslint .
stage "unit, component and integration tests" counted ./node_modules/.bin/vitest run
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
