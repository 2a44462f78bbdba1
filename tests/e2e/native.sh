#!/usr/bin/env bash
# The Native AOT binary and the .NET tool package, end to end, as a user gets them:
#   1. build/native.sh builds the single native binary (with libSkiaSharp.so beside it);
#   2. that binary runs --version, check, eval, report, plot (SVG and PNG), a scripted lsp session,
#      and a sweep written as Parquet that must equal the framework-dependent build's byte for byte;
#      a sweep killed half-way leaves no part file;
#   3. build/tool-package.sh packs the tool into artifacts/, `dotnet tool install --global windscript
#      --add-source artifacts` installs it, and the installed `windscript` runs (then it is uninstalled).
# Installs what it needs (a C toolchain for the AOT linker). Prints a last line "N passed, N failed".
set -uo pipefail
root=$(cd "$(dirname "$0")/../.." && pwd)
cd "$root"
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1
work=$(mktemp -d)
passed=0
failed=0
started=$SECONDS
pass() { passed=$((passed + 1)); echo "  ok    $1"; }
fail() { failed=$((failed + 1)); echo "  FAIL  $1"; }
check() { local name=$1; shift; if "$@" >"$work/last.log" 2>&1; then pass "$name"; else fail "$name"; tail -20 "$work/last.log"; fi; }
finish() {
  dotnet tool uninstall --global windscript >/dev/null 2>&1 || true
  rm -rf "$work"
  echo "native: finished in $((SECONDS - started)) s"
  echo "$passed passed, $failed failed"
  [ "$failed" -eq 0 ]
  exit
}

echo "== tools"
if ! command -v clang >/dev/null && ! command -v gcc >/dev/null || [ ! -e /usr/include/zlib.h ]; then
  (apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq clang zlib1g-dev) >"$work/apt.log" 2>&1 \
    || { tail -20 "$work/apt.log"; fail "apt-get install clang zlib1g-dev"; finish; }
fi

echo "== native binary (build/native.sh) at $((SECONDS - started)) s"
build/native.sh "$work/native" >"$work/native.out" 2>"$work/native.err"; exe=$(tail -1 "$work/native.out")
if [ ! -x "$exe" ]; then tail -n 30 "$work/native.out" "$work/native.err"; fail "build/native.sh"; finish; fi
pass "build/native.sh built $(basename "$exe") ($(du -h "$exe" | cut -f1)) with $(ls "$work/native" | tr '\n' ' ')"
commit=$(git rev-parse --short=12 HEAD 2>/dev/null || echo unknown)
version=$("$exe" --version)
check "--version prints version and commit ($version)" grep -q "+$commit" <<<"$version"
example=examples/mill_fan_lap.wind
check "check $example" "$exe" check "$example"
check "check of a broken file exits 1 with a located diagnostic" bash -c "printf 'machine m {\n  slots 0\n}\n' | { '$exe' check -; test \$? -eq 1; }"
check "eval --format json" bash -c "'$exe' eval '$example' --format json | grep -q '\"windingFactors\\|\"harmonics'"
check "report writes a self-contained HTML page" bash -c "'$exe' report '$example' -o '$work/r.html' && grep -q '<svg' '$work/r.html'"
check "plot spectrum as SVG" bash -c "'$exe' plot '$example' -k spectrum -o '$work/s.svg' && grep -q '<svg' '$work/s.svg'"
check "plot layout as PNG (SkiaSharp's native library)" bash -c "'$exe' plot '$example' -k layout -o '$work/l.png' && head -c 8 '$work/l.png' | od -An -c | grep -q 'P   N   G'"

# A short LSP session: initialize, open a document with a mistake, read its diagnostics, hover, shut down.
frame() { printf 'Content-Length: %d\r\n\r\n%s' "${#1}" "$1"; }
uri="file://$root/$example"
broken='machine m {\n  slots 12\n  poles 4\n  phases U V W\n  bore 10 kg\n}\n'
{
  frame '{"jsonrpc":"2.0","id":1,"method":"initialize","params":{"processId":null,"rootUri":null,"capabilities":{}}}'
  frame '{"jsonrpc":"2.0","method":"initialized","params":{}}'
  frame '{"jsonrpc":"2.0","method":"textDocument/didOpen","params":{"textDocument":{"uri":"'"$uri"'","languageId":"windscript","version":1,"text":"'"$broken"'"}}}'
  frame '{"jsonrpc":"2.0","id":2,"method":"textDocument/hover","params":{"textDocument":{"uri":"'"$uri"'"},"position":{"line":1,"character":3}}}'
  sleep 2
  frame '{"jsonrpc":"2.0","id":3,"method":"shutdown","params":null}'
  frame '{"jsonrpc":"2.0","method":"exit","params":null}'
} | timeout 20 "$exe" lsp >"$work/lsp.out" 2>"$work/lsp.err"
lsp_status=$?
check "lsp: exits 0 after shutdown and exit" test "$lsp_status" -eq 0
check "lsp: initialize answers with capabilities" grep -q '"id":1,"result":{"capabilities"' "$work/lsp.out"
check "lsp: publishes a diagnostic for the wrong unit" bash -c "grep -o '\"method\":\"textDocument/publishDiagnostics\"[^}]*' '$work/lsp.out' | head -1 | grep -q publishDiagnostics && grep -q '\"code\":\"WS2' '$work/lsp.out'"
check "lsp: answers hover and shutdown" bash -c "grep -q '\"id\":2' '$work/lsp.out' && grep -q '\"id\":3,\"result\":null' '$work/lsp.out'"

# Parquet under Native AOT: the same bytes as the framework-dependent build.
dotnet build src/WindScript.Cli -v q -nologo >"$work/build.log" 2>&1 || { tail -20 "$work/build.log"; fail "framework-dependent build"; }
jit=(dotnet src/WindScript.Cli/bin/Debug/net10.0/windscript.dll)
sweep=(sweep --slots 6..120 --poles 2..60 --pitch all --format parquet)
"$exe" "${sweep[@]}" -o "$work/native.parquet" && "${jit[@]}" "${sweep[@]}" -o "$work/jit.parquet"
check "sweep --format parquet: native and framework-dependent files are identical" cmp "$work/native.parquet" "$work/jit.parquet"
WINDSCRIPT_SHARD=2/3 "$exe" sweep --slots 6..120 --poles 2..60 --shard auto -o "$work/part-{K}.jsonl"
check "--shard auto from WINDSCRIPT_SHARD equals --shard 2/3" bash -c "cmp '$work/part-2.jsonl' <('$exe' sweep --slots 6..120 --poles 2..60 --shard 2/3)"
# A task killed half-way leaves no part under the part's name.
"$exe" sweep --slots 6..1000 --poles 2..400 --pitch all --threads 1 -o "$work/killed.jsonl" & pid=$!
sleep 1
if kill -9 "$pid" 2>/dev/null; then wait "$pid" 2>/dev/null
  check "a sweep killed half-way leaves no part file" test ! -e "$work/killed.jsonl"
else fail "the sweep to be killed had already ended"; fi

echo "== tool package (build/tool-package.sh) at $((SECONDS - started)) s"
if build/tool-package.sh >"$work/pack.log" 2>&1; then pass "build/tool-package.sh: $(ls artifacts/*.nupkg | xargs -n1 basename | tr '\n' ' ')"
else tail -30 "$work/pack.log"; fail "build/tool-package.sh"; finish; fi
dotnet tool uninstall --global windscript >/dev/null 2>&1 || true
check "dotnet tool install --global windscript --add-source artifacts" dotnet tool install --global windscript --add-source artifacts
tool="$HOME/.dotnet/tools/windscript"
check "the installed windscript is the native binary" bash -c "file -L '$tool' 2>/dev/null | grep -q ELF || head -c 4 '$tool' | grep -q ELF"
check "the installed windscript --version ($("$tool" --version 2>&1))" bash -c "'$tool' --version | grep -q '+$commit'"
check "the installed windscript check" "$tool" check "$example"
echo "== done at $((SECONDS - started)) s"
finish
