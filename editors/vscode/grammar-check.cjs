// Checks the TextMate grammar with the engine VS Code itself uses (vscode-textmate +
// vscode-oniguruma): every line of the given .wind files tokenises, and the tokens that
// matter get their scopes. Prints "grammar: N passed, N failed"; exits 1 on failure.
"use strict";
const fs = require("node:fs");
const path = require("node:path");
const textmate = require("vscode-textmate");
const oniguruma = require("vscode-oniguruma");

let passed = 0, failed = 0;
function check(name, ok, detail) {
  if (ok) { passed++; console.log(`  ok    ${name}`); }
  else { failed++; console.log(`  FAIL  ${name}${detail ? ": " + detail : ""}`); }
}

async function main() {
  const wasm = fs.readFileSync(require.resolve("vscode-oniguruma/release/onig.wasm")).buffer;
  await oniguruma.loadWASM(wasm);
  const registry = new textmate.Registry({
    onigLib: Promise.resolve({ createOnigScanner: (p) => new oniguruma.OnigScanner(p), createOnigString: (s) => new oniguruma.OnigString(s) }),
    loadGrammar: async () => textmate.parseRawGrammar(fs.readFileSync(path.join(__dirname, "syntaxes/windscript.tmLanguage.json"), "utf8"), "windscript.tmLanguage.json"),
  });
  const grammar = await registry.loadGrammar("source.windscript");

  /** The scopes of the token at the first occurrence of `needle` in a one-line text. */
  function scopesAt(line, needle) {
    const at = line.indexOf(needle);
    const { tokens } = grammar.tokenizeLine(line, textmate.INITIAL);
    const token = tokens.find((t) => t.startIndex <= at && at < t.endIndex);
    return token ? token.scopes.join(" ") : "";
  }
  const expect = (line, needle, scope) =>
    check(`'${needle}' in '${line.trim()}' is ${scope}`, scopesAt(line, needle).includes(scope), scopesAt(line, needle));

  expect("machine fan {", "machine", "storage.type.block");
  expect("machine fan {", "fan", "entity.name.type");
  expect("  bore 150 mm  # inner diameter", "150", "constant.numeric");
  expect("  bore 150 mm  # inner diameter", "mm", "keyword.other.unit");
  expect("  bore 150 mm  # inner diameter", "# inner", "comment.line.number-sign");
  expect("  balanced sine 12 A rms at 50 Hz sequence U V W", "Hz", "keyword.other.unit");
  expect("  U = sine 70 A peak at 314.2 rad/s", "rad/s", "keyword.other.unit");
  expect("  top: U U -W -W V V repeat 3", "-", "keyword.operator.sign");
  expect("  top: U U -W -W V V repeat 3", "W", "entity.name.tag.phase");
  expect("  top: U U -W -W V V repeat 3", "repeat", "keyword.control");
  expect("  coil -U: 1 -> 10 turns n", "U", "entity.name.tag.phase");
  expect("  coil -U: 1 -> 10 turns n", "turns", "keyword.other.property");
  expect("  slots: U _ -U _", "_", "constant.language.empty-slot");
  expect("let größe = 3", "größe", "variable.other.constant");

  // Every example tokenises, and each '#' starts a comment token (comments are never swallowed by another rule).
  for (const file of process.argv.slice(2)) {
    let state = textmate.INITIAL, comments = 0;
    const wrong = [];
    for (const line of fs.readFileSync(file, "utf8").split("\n")) {
      const { tokens, ruleStack } = grammar.tokenizeLine(line, state);
      state = ruleStack;
      const hash = line.indexOf("#");
      if (hash < 0) continue;
      comments++;
      const token = tokens.find((t) => t.startIndex <= hash && hash < t.endIndex);
      if (!token || token.startIndex !== hash || !token.scopes.some((s) => s.startsWith("comment."))) wrong.push(line.trim());
    }
    check(`${path.basename(file)}: all ${comments} comments are comment tokens`, wrong.length === 0, wrong.join(" | "));
  }
}

main()
  .catch((e) => { failed++; console.log(`  FAIL  ${e}`); })
  .finally(() => { console.log(`grammar: ${passed} passed, ${failed} failed`); process.exit(failed === 0 ? 0 : 1); });
