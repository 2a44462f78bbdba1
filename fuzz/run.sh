#!/usr/bin/env bash
# A coverage-guided fuzz campaign with SharpFuzz + AFL++ over one target or all of them:
#   bash fuzz/run.sh TARGET SECONDS      TARGET: syntax | semantics | format | lsp | all
# Installs what it needs (afl++ from Debian, the sharpfuzz tool from NuGet), builds the harness
# in Release, instruments the core and the language server, seeds AFL with the examples and
# tests/cases (fuzz/corpus/lsp for the message reader) and runs afl-fuzz for SECONDS per target.
# Prints executions, coverage and findings per target and a closing "N passed, N failed" line
# (one check per target: no crash). Findings stay in fuzz/findings/TARGET (git-ignored);
# replay one with: dotnet fuzz/.out/WindScript.Fuzz.dll TARGET FILE
set -uo pipefail
root=$(cd "$(dirname "$0")/.." && pwd)
cd "$root"
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1
target=${1:-all}
seconds=${2:-60}
targets=(syntax semantics format lsp)
[ "$target" = all ] || targets=("$target")

if ! command -v afl-fuzz >/dev/null; then
  (apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq afl++) >/tmp/windscript-afl-apt.log 2>&1 \
    || { cat /tmp/windscript-afl-apt.log; echo "0 passed, 1 failed"; exit 1; }
fi
tools="$root/fuzz/.tools"
if [ ! -x "$tools/sharpfuzz" ]; then
  dotnet tool install SharpFuzz.CommandLine --version 2.3.0 --tool-path "$tools" >/dev/null \
    || { echo "cannot install the sharpfuzz tool"; echo "0 passed, 1 failed"; exit 1; }
fi
out="$root/fuzz/.out"
rm -rf "$out"
dotnet build fuzz/WindScript.Fuzz -c Release -o "$out" >/tmp/windscript-fuzz-build.log 2>&1 \
  || { cat /tmp/windscript-fuzz-build.log; echo "0 passed, 1 failed"; exit 1; }
for dll in WindScript.Core.dll WindScript.LanguageServer.dll; do
  "$tools/sharpfuzz" "$out/$dll" >/dev/null || { echo "cannot instrument $dll"; echo "0 passed, 1 failed"; exit 1; }
done

export AFL_SKIP_BIN_CHECK=1 AFL_SKIP_CPUFREQ=1 AFL_I_DONT_CARE_ABOUT_MISSING_CRASHES=1 AFL_NO_UI=1 AFL_NO_AFFINITY=1 \
  AFL_FORKSRV_INIT_TMOUT=60000 AFL_QUIET=1
passed=0
failed=0
for t in "${targets[@]}"; do
  seeds=$(mktemp -d)
  if [ "$t" = lsp ]; then
    cp fuzz/corpus/lsp/* "$seeds/"
  else
    # Small seeds fuzz best: the examples and cases under 16 KB.
    find examples tests/cases -name '*.wind' -size -16k -exec cp {} "$seeds/" \;
  fi
  findings="$root/fuzz/findings/$t"
  rm -rf "$findings"
  mkdir -p "$findings"
  echo "== fuzz $t for ${seconds}s ($(ls "$seeds" | wc -l) seeds)"
  timeout $((seconds + 120)) afl-fuzz -i "$seeds" -o "$findings" -V "$seconds" -t 10000 -m none -- dotnet "$out/WindScript.Fuzz.dll" "$t" \
    >"$findings/afl.log" 2>&1
  status=$?
  stats="$findings/default/fuzzer_stats"
  if [ ! -f "$stats" ]; then
    tail -20 "$findings/afl.log"
    echo "  FAIL  $t: afl-fuzz did not run (status $status)"; failed=$((failed + 1)); rm -rf "$seeds"; continue
  fi
  get() { sed -nE "s/^$1 +: (.*)$/\1/p" "$stats"; }
  crashes=$(ls "$findings/default/crashes" 2>/dev/null | grep -c '^id:' || true)
  hangs=$(ls "$findings/default/hangs" 2>/dev/null | grep -c '^id:' || true)
  echo "  executions $(get execs_done), $(get execs_per_sec) per second; coverage $(get bitmap_cvg) of the map, $(get corpus_count) paths; crashes $crashes, hangs $hangs"
  if [ "$crashes" -gt 0 ]; then
    failed=$((failed + 1)); echo "  FAIL  $t: $crashes crashing input(s) in $findings/default/crashes"
    for f in "$findings"/default/crashes/id:*; do
      dotnet "$out/WindScript.Fuzz.dll" "$t" "$f" 2>&1 | head -5
    done
  else
    passed=$((passed + 1)); echo "  ok    $t: no crash"
  fi
  rm -rf "$seeds"
done
echo "$passed passed, $failed failed"
[ "$failed" -eq 0 ]
