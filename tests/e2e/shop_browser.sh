#!/usr/bin/env bash
# End-to-end: the winding shop's sheet of every bundled example, rendered in a real headless
# browser (Debian's chromium, driven by playwright-core from npm; no browser is downloaded) with
# scripts disabled. Checks (shop_browser.cjs) that the script-free page has every table with the
# rows of its CSV file, and that the developed diagram draws every coil (against the model's coil
# count from `windscript eval --format json`), every link, jumper, lead and terminal (against the
# CSV tables). Two sheets are also printed to PDF by `windscript shop --pdf`.
# Closing line: "N passed, N failed"; exit non-zero on any failure.
# SHOP_SCREENSHOTS=DIR keeps a PNG of every sheet (screen and print layout) for a look.
set -uo pipefail
cd "$(dirname "$0")/../.."
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1

passed=0
failed=0
finish() { echo "$passed passed, $failed failed"; [ "$failed" -eq 0 ]; exit $?; }
setup_failed() { echo "shop_browser: $1"; failed=$((failed + 1)); finish; }
ok() { echo "ok: $1"; passed=$((passed + 1)); }
fail() { echo "FAIL: $1"; failed=$((failed + 1)); }

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

for file in examples/*.wind; do
  example=$(basename "$file" .wind)
  out="$work/$example"
  mkdir -p "$out/csv"
  if ! "${cli[@]}" shop "$file" --html "$out/sheet.html" --csv "$out/csv" 2>"$out/shop.err"; then
    cat "$out/shop.err"; fail "$example: windscript shop failed"; continue
  fi
  if ! "${cli[@]}" eval "$file" --format json >"$out/eval.json" 2>"$out/eval.err"; then
    cat "$out/eval.err"; fail "$example: windscript eval failed"; continue
  fi
  coils=$(node -e 'console.log(JSON.parse(require("fs").readFileSync(process.argv[1], "utf8")).winding.coils)' "$out/eval.json")
  shots=()
  [ -n "${SHOP_SCREENSHOTS:-}" ] && shots=("$SHOP_SCREENSHOTS/$example")
  NODE_PATH="$work/node_modules" timeout 120 node tests/e2e/shop_browser.cjs "$out/sheet.html" "$out/csv" "$coils" "${shots[@]}" | tee "$out/browser.log"
  passed=$((passed + $(grep -c '^ok: ' "$out/browser.log")))
  failed=$((failed + $(grep -c '^FAIL: ' "$out/browser.log")))
  grep -q '^ok: ' "$out/browser.log" || fail "$example: the browser check did not run"
done

# The PDF path: the command prints through the same headless chromium (A4 and Letter).
for case in "mill_fan_lap a4" "scooter_hub_12s10p letter"; do
  set -- $case
  pdf="$work/$1.pdf"
  if ! "${cli[@]}" shop "examples/$1.wind" --pdf "$pdf" --paper "$2" --browser /usr/bin/chromium 2>"$work/pdf.err"; then
    cat "$work/pdf.err"; fail "$1: windscript shop --pdf failed"; continue
  fi
  pages=$(grep -ac '/Type /Page\b' "$pdf" || true)
  if head -c 5 "$pdf" | grep -q '%PDF-' && [ "$pages" -ge 2 ]; then ok "$1: the sheet prints to a PDF on $2 paper ($pages pages)"; else fail "$1: not a PDF of 2 or more pages ($pages)"; fi
  [ -n "${SHOP_SCREENSHOTS:-}" ] && cp "$pdf" "$SHOP_SCREENSHOTS/$1.pdf"
done
finish
