#!/usr/bin/env bash
# End-to-end tests of `windscript lsp` with two independent, real LSP clients, plus packaging
# of the VS Code extension. Installs what it needs (Neovim, Node.js from Debian if missing; npm
# packages from the lock files), builds the CLI, runs:
#   1. node-client.cjs  — Microsoft's vscode-jsonrpc / vscode-languageserver-protocol client
#   2. nvim-client.lua  — Neovim's built-in LSP client (vim.lsp.start_client), headless
#   3. editors/vscode   — type-check, bundle and package the .vsix with @vscode/vsce 3
# and prints a last line "N passed, N failed". Exits non-zero on any failure.
set -uo pipefail
root=$(cd "$(dirname "$0")/../.." && pwd)
cd "$root"
export DOTNET_CLI_TELEMETRY_OPTOUT=1 DOTNET_NOLOGO=1 npm_config_fund=false npm_config_audit=false npm_config_update_notifier=false
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
passed=0
failed=0

started=$SECONDS
section() { echo "== $1 (at $((SECONDS - started)) s)"; }
pass() { passed=$((passed + 1)); echo "  ok    $1"; }
fail() { failed=$((failed + 1)); echo "  FAIL  $1"; }
# Adds a client's own "name: N passed, N failed" line to the totals.
add_counts() {
  local line
  line=$(grep -E '[0-9]+ passed, [0-9]+ failed' "$1" | tail -1)
  if [ -z "$line" ]; then fail "$2 printed no result line"; return; fi
  passed=$((passed + $(echo "$line" | sed -E 's/.* ([0-9]+) passed.*/\1/')))
  failed=$((failed + $(echo "$line" | sed -E 's/.* ([0-9]+) failed.*/\1/')))
}

section "tools"
missing=()
command -v nvim >/dev/null || missing+=(neovim)
command -v node >/dev/null || missing+=(nodejs)
command -v npm >/dev/null || missing+=(npm)
if [ ${#missing[@]} -gt 0 ]; then
  echo "installing ${missing[*]}"
  (apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${missing[@]}") >"$work/apt.log" 2>&1 \
    || { cat "$work/apt.log"; fail "apt-get install ${missing[*]}"; }
fi
echo "node $(node --version 2>/dev/null), $(nvim --version 2>/dev/null | head -1)"

# npm installs run in the background while the CLI builds.
(cd tests/e2e && timeout 240 npm ci --no-audit --no-fund >"$work/npm-e2e.log" 2>&1) & npm_e2e=$!
(cd editors/vscode && timeout 240 npm ci --no-audit --no-fund >"$work/npm-vscode.log" 2>&1) & npm_vscode=$!

section "build windscript"
# The default (Debug) configuration: after 'dotnet test WindScript.sln' in .ci/run this is an up-to-date check.
if timeout 300 dotnet build src/WindScript.Cli >"$work/build.log" 2>&1; then
  pass "windscript builds"
else
  tail -30 "$work/build.log"; fail "windscript builds"
fi
server="$root/src/WindScript.Cli/bin/Debug/net10.0/windscript"
[ -x "$server" ] || server="dotnet $root/src/WindScript.Cli/bin/Debug/net10.0/windscript.dll"

section "client 1: vscode-jsonrpc / vscode-languageserver-protocol (Node)"
if wait $npm_e2e; then
  timeout 120 node tests/e2e/node-client.cjs $server 2>&1 | tee "$work/node.out"
  add_counts "$work/node.out" "the Node client"
else
  tail -20 "$work/npm-e2e.log"; fail "npm ci in tests/e2e"
fi

section "client 2: Neovim built-in LSP client (headless)"
sed -E 's/^([[:space:]]*bore [0-9.]+) mm/\1/' examples/mill_fan_lap.wind >"$work/mill_fan_lap.wind"
if command -v nvim >/dev/null; then
  (cd tests/e2e && WINDSCRIPT_CMD="$server" E2E_FILE="$work/mill_fan_lap.wind" E2E_RESULT="$work/nvim.out" \
    timeout 120 nvim --headless --clean -u NONE -c "luafile nvim-client.lua" </dev/null >"$work/nvim.log" 2>&1)
  cat "$work/nvim.out" 2>/dev/null || cat "$work/nvim.log"
  add_counts "$work/nvim.out" "the Neovim client"
else
  fail "nvim is not installed"
fi

section "VS Code extension"
if wait $npm_vscode; then
  if (cd editors/vscode && npm run --silent compile >"$work/compile.log" 2>&1); then pass "extension type-checks and bundles"
  else cat "$work/compile.log"; fail "extension type-checks and bundles"; fi
  if (cd editors/vscode && timeout 120 npx --no-install vsce package --allow-missing-repository --no-dependencies -o "$work/windscript.vsix" >"$work/vsce.log" 2>&1) \
     && [ -s "$work/windscript.vsix" ]; then
    pass "the .vsix packages ($(du -k "$work/windscript.vsix" | cut -f1) KiB)"
  else
    cat "$work/vsce.log"; fail "the .vsix packages"
  fi
  if (cd editors/vscode && timeout 60 node grammar-check.cjs ../../examples/*.wind) >"$work/grammar.out" 2>&1; then cat "$work/grammar.out"; add_counts "$work/grammar.out" "the grammar check"
  else cat "$work/grammar.out"; add_counts "$work/grammar.out" "the grammar check"; fi
else
  tail -20 "$work/npm-vscode.log"; fail "npm ci in editors/vscode"
fi

echo "e2e finished in $((SECONDS - started)) s"
echo "$passed passed, $failed failed"
[ "$failed" -eq 0 ]
