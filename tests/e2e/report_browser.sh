#!/usr/bin/env bash
# End-to-end: HTML reports of bundled examples opened in a real headless browser (Debian's
# chromium, driven by playwright-core from npm; no browser is downloaded). Checks that the
# page's script runs without errors and that the time slider and Play move the animation.
# Closing line: "N passed, N failed"; exit non-zero on any failure.
set -uo pipefail
cd "$(dirname "$0")/../.."
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1

passed=0
failed=0
finish() { echo "$passed passed, $failed failed"; [ "$failed" -eq 0 ]; exit $?; }
setup_failed() { echo "report_browser: $1"; failed=$((failed + 1)); finish; }

work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT

if [ ! -x /usr/bin/chromium ]; then
  { apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium; } >"$work/apt.log" 2>&1 \
    || { tail -20 "$work/apt.log"; setup_failed "cannot install Debian's chromium"; }
fi
command -v node >/dev/null || setup_failed "node is not installed"
( cd "$work" && npm init -y >/dev/null && npm install --no-audit --no-fund --silent playwright-core@1.64.1 ) >"$work/npm.log" 2>&1 \
  || { tail -20 "$work/npm.log"; setup_failed "cannot install playwright-core"; }

dotnet build src/WindScript.Cli -v q -nologo >"$work/build.log" 2>&1 || { tail -30 "$work/build.log"; setup_failed "the CLI does not build"; }
cli=(dotnet src/WindScript.Cli/bin/Debug/net10.0/windscript.dll)

# An integral-slot AC machine, a fractional-slot one, and a file with two drives (AC and DC).
for example in mill_fan_lap scooter_hub_12s10p winch_concentric_generated; do
  html="$work/$example.html"
  if ! "${cli[@]}" report "examples/$example.wind" -o "$html" 2>"$work/report.err"; then
    cat "$work/report.err"; echo "FAIL: $example: windscript report failed"; failed=$((failed + 1)); continue
  fi
  shot=()
  [ -n "${REPORT_SCREENSHOTS:-}" ] && shot=("$REPORT_SCREENSHOTS/$example.png")
  NODE_PATH="$work/node_modules" timeout 120 node tests/e2e/report_browser.cjs "$html" "${shot[@]}" | tee "$work/$example.log"
  passed=$((passed + $(grep -c '^ok: ' "$work/$example.log")))
  failed=$((failed + $(grep -c '^FAIL: ' "$work/$example.log")))
  if ! grep -q '^ok: ' "$work/$example.log"; then echo "FAIL: $example: the browser check did not run"; failed=$((failed + 1)); fi
done
finish
