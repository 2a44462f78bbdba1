#!/usr/bin/env bash
# Whole-process sweep benchmark: publishes the CLI with Native AOT and times
#   windscript sweep --slots 6..120 --poles 2..60
# (every feasible 3-phase double-layer combination, winding factors to electrical order 49,
# exact differential leakage, JSON Lines to /dev/null) against the vectorised NumPy reference
# doing the same work, as whole processes with hyperfine. Needs hyperfine and python3-numpy
# (Debian: apt-get install hyperfine python3-numpy). Not part of CI: timings are machine figures.
set -euo pipefail
cd "$(dirname "$0")/../.."
out=${1:-/tmp/windscript-aot}
dotnet publish src/WindScript.Cli -r linux-x64 -c Release -p:PublishAot=true -o "$out" >/dev/null
python=/usr/bin/python3
"$python" -c 'import numpy' 2>/dev/null || python=python3
# Same layouts, same figures (the reference prints fewer fields, to six decimals).
diff <("$out/windscript" sweep --slots 6..120 --poles 2..60 | wc -l) <("$python" bench/sweep/numpy_sweep.py | wc -l)
hyperfine -N --warmup 5 --runs 40 \
  "$out/windscript sweep --slots 6..120 --poles 2..60" \
  "$out/windscript sweep --slots 6..120 --poles 2..60 --threads 1" \
  "$out/windscript --version" \
  "$python bench/sweep/numpy_sweep.py"
# The whole design space (slow for the reference: minutes; a few runs only on a shared machine).
hyperfine -N --warmup 1 --runs 5 \
  "$out/windscript sweep --slots 6..360 --poles 2..180" \
  "$out/windscript sweep --slots 6..360 --poles 2..180 --pitch all"
hyperfine -N --runs 2 \
  "$python bench/sweep/numpy_sweep.py 6..360 2..180" \
  "$python bench/sweep/numpy_sweep.py 6..360 2..180 all"
