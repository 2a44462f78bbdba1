// End-to-end test of `windscript lsp` with Microsoft's own JSON-RPC/LSP client libraries
// (vscode-jsonrpc + vscode-languageserver-protocol, what VS Code's client is built on).
// Usage: node node-client.cjs <server command...>
// Prints one line per check and "node client: N passed, N failed"; exits 1 on any failure.
"use strict";
const { spawn } = require("node:child_process");
const fs = require("node:fs");
const path = require("node:path");
const rpc = require("vscode-jsonrpc/node");
const lsp = require("vscode-languageserver-protocol");

const server = process.argv.slice(2);
if (server.length === 0) {
  console.error("usage: node node-client.cjs <server command...>");
  process.exit(2);
}
const examplePath = path.resolve(__dirname, "../../examples/mill_fan_lap.wind");
const uri = "file://" + examplePath;
const original = fs.readFileSync(examplePath, "utf8");
const lines = original.split("\n");

let passed = 0, failed = 0;
function check(name, ok, detail) {
  if (ok) { passed++; console.log(`  ok    ${name}`); }
  else { failed++; console.log(`  FAIL  ${name}${detail ? ": " + detail : ""}`); }
}
function where(text) {
  const line = lines.findIndex((l) => l.includes(text));
  if (line < 0) throw new Error(`'${text}' is not in the example`);
  return { line, character: lines[line].indexOf(text) };
}
// What the checks expect is read off the example, so that the example may evolve.
function matchIn(regex, what) {
  const m = original.match(regex);
  if (!m) throw new Error(`the example has no ${what}`);
  return m;
}
const boreText = matchIn(/^[ \t]*(bore [0-9.]+) mm/m, "'bore N mm' line")[1];
const poles = Number(matchIn(/^[ \t]*poles (\d+)/m, "'poles N' line")[1]);
const driveName = matchIn(/^drive (\w+) \{\n[ \t]*balanced sine [^\n]* at ([0-9.]+) Hz/m, "balanced drive in Hz")[1];
const driveHz = Number(matchIn(/^drive (\w+) \{\n[ \t]*balanced sine [^\n]* at ([0-9.]+) Hz/m, "balanced drive in Hz")[2]);
const windingName = matchIn(/^winding (\w+)/m, "winding")[1];
const phaseNames = matchIn(/^[ \t]*phases ([\w ]+)$/m, "phases line")[1].trim().split(/\s+/);
const blockNames = [...original.matchAll(/^(?:machine|winding|drive) (\w+)/gm)].map((m) => m[1]);
function withTimeout(promise, ms, what) {
  return Promise.race([promise, new Promise((_, reject) => setTimeout(() => reject(new Error(`timeout: ${what}`)), ms))]);
}

async function main() {
  const child = spawn(server[0], [...server.slice(1), "lsp"], { stdio: ["pipe", "pipe", "inherit"] });
  const exited = new Promise((resolve) => child.on("exit", (code) => resolve(code)));
  const connection = rpc.createMessageConnection(new rpc.StreamMessageReader(child.stdout), new rpc.StreamMessageWriter(child.stdin));

  // Diagnostics arrive as notifications; keep the latest per version and let checks wait for one.
  const published = [];
  let waiters = [];
  connection.onNotification(lsp.PublishDiagnosticsNotification.type, (params) => {
    published.push(params);
    waiters = waiters.filter((w) => !w(params));
  });
  const diagnosticsFor = (version) => withTimeout(new Promise((resolve) => {
    const found = published.find((p) => p.uri === uri && p.version === version);
    if (found) return resolve(found.diagnostics);
    waiters.push((p) => { if (p.uri === uri && p.version === version) { resolve(p.diagnostics); return true; } return false; });
  }), 15000, `diagnostics for version ${version}`);
  connection.listen();

  const init = await withTimeout(connection.sendRequest(lsp.InitializeRequest.type, {
    processId: process.pid,
    rootUri: null,
    capabilities: {
      textDocument: {
        hover: { contentFormat: ["markdown", "plaintext"] },
        documentSymbol: { hierarchicalDocumentSymbolSupport: true },
        completion: { completionItem: { snippetSupport: false } },
      },
    },
  }), 15000, "initialize");
  check("initialize: server announces hover, definition, formatting, completion, code actions",
    init.capabilities.hoverProvider && init.capabilities.definitionProvider && init.capabilities.documentFormattingProvider
      && init.capabilities.completionProvider && init.capabilities.codeActionProvider);
  await connection.sendNotification(lsp.InitializedNotification.type, {});

  // 1. Open the example: it is clean.
  await connection.sendNotification(lsp.DidOpenTextDocumentNotification.type, {
    textDocument: { uri, languageId: "windscript", version: 1, text: original },
  });
  const clean = await diagnosticsFor(1);
  check("open: the example has no errors", clean.filter((d) => d.severity === 1).length === 0, JSON.stringify(clean));

  // 2. Edit it into an error: delete the unit of "bore N mm".
  const bore = where(boreText + " mm");
  const unitStart = bore.character + boreText.length;
  await connection.sendNotification(lsp.DidChangeTextDocumentNotification.type, {
    textDocument: { uri, version: 2 },
    contentChanges: [{ range: { start: { line: bore.line, character: unitStart }, end: { line: bore.line, character: unitStart + 3 } }, text: "" }],
  });
  const broken = await diagnosticsFor(2);
  const missingUnit = broken.find((d) => d.code === "WS2010");
  check("edit: the missing unit arrives as WS2010", missingUnit !== undefined, JSON.stringify(broken));
  check("edit: the diagnostic's range is exactly the bore's number",
    missingUnit && missingUnit.range.start.line === bore.line && missingUnit.range.start.character === bore.character + 5
      && missingUnit.range.end.line === bore.line && missingUnit.range.end.character === unitStart,
    JSON.stringify(missingUnit && missingUnit.range));

  // 3. The quick fix puts the unit back.
  const actions = await connection.sendRequest(lsp.CodeActionRequest.type, {
    textDocument: { uri },
    range: missingUnit ? missingUnit.range : { start: bore, end: bore },
    context: { diagnostics: missingUnit ? [missingUnit] : [] },
  });
  const fix = (actions || []).find((a) => a.kind === "quickfix");
  const fixEdit = fix && fix.edit && fix.edit.changes && fix.edit.changes[uri] && fix.edit.changes[uri][0];
  check("code action: a quick fix adds ' mm'", fixEdit && fixEdit.newText === " mm" && fixEdit.range.start.character === unitStart,
    JSON.stringify(actions));
  if (fixEdit) {
    await connection.sendNotification(lsp.DidChangeTextDocumentNotification.type, {
      textDocument: { uri, version: 3 }, contentChanges: [{ range: fixEdit.range, text: fixEdit.newText }],
    });
    const fixed = await diagnosticsFor(3);
    check("fix: the error is gone and not left behind", !fixed.some((d) => d.code === "WS2010"), JSON.stringify(fixed));
  }

  // 4. Hover shows physics.
  const winding = where("winding " + windingName);
  const hover = await connection.sendRequest(lsp.HoverRequest.type, { textDocument: { uri }, position: { line: winding.line, character: winding.character + 9 } });
  const hoverText = hover && hover.contents && (hover.contents.value || "");
  check("hover: the winding shows series turns and its fundamental winding factor",
    new RegExp("series turns per phase: " + phaseNames.map((p) => p + " [0-9.]+").join(", ")).test(hoverText) && /kw1 = 0\.\d+/.test(hoverText), hoverText);
  const drive = where("drive " + driveName);
  const rpm = 60 * driveHz / (poles / 2); // synchronous speed n = 60 f / p (common practice)
  const driveHover = await connection.sendRequest(lsp.HoverRequest.type, { textDocument: { uri }, position: { line: drive.line, character: drive.character + 7 } });
  check(`hover: the drive shows the rotating-field speed ${rpm} rpm`, (driveHover && driveHover.contents.value || "").includes(`${rpm} rpm`), JSON.stringify(driveHover));

  // 5. Definition of a phase used in the pattern goes to the phases line.
  const pattern = where("top: " + phaseNames[0]);
  const definition = await connection.sendRequest(lsp.DefinitionRequest.type, { textDocument: { uri }, position: { line: pattern.line, character: pattern.character + 5 } });
  const phases = where("phases " + phaseNames.join(" "));
  const def = Array.isArray(definition) ? definition[0] : definition;
  check(`definition: ${phaseNames[0]} in the pattern is declared in 'phases ${phaseNames.join(" ")}'`,
    def && def.uri === uri && def.range.start.line === phases.line && def.range.start.character === phases.character + 7, JSON.stringify(definition));

  // 6. Completion inside the machine block offers its properties.
  const slots = where("  slots ");
  const completion = await connection.sendRequest(lsp.CompletionRequest.type, { textDocument: { uri }, position: { line: slots.line, character: slots.character + 2 } });
  const labels = (Array.isArray(completion) ? completion : completion.items).map((i) => i.label);
  check("completion: machine properties are offered, winding statements are not",
    labels.includes("slots") && labels.includes("poles") && !labels.includes("coil"), labels.join(" "));

  // 7. Formatting a messed-up copy restores the canonical text.
  const messy = original.replace(/^  slots /m, "      slots     ").replace(/^  poles /m, "\tpoles   ");
  await connection.sendNotification(lsp.DidChangeTextDocumentNotification.type, { textDocument: { uri, version: 4 }, contentChanges: [{ text: messy }] });
  const edits = await connection.sendRequest(lsp.DocumentFormattingRequest.type, { textDocument: { uri }, options: { tabSize: 2, insertSpaces: true } });
  check("formatting: returns edits that restore the canonical text", Array.isArray(edits) && applyEdits(messy, edits) === original, JSON.stringify(edits));

  // 8. Outline.
  const symbols = await connection.sendRequest(lsp.DocumentSymbolRequest.type, { textDocument: { uri } });
  check(`document symbols: ${blockNames.join(", ")}`, blockNames.length >= 3 && blockNames.every((n) => symbols.some((s) => s.name === n)),
    JSON.stringify(symbols.map((s) => s.name)));

  // 9. An unknown method is an error, and the server lives on.
  let unknownCode;
  try { await connection.sendRequest("windscript/noSuchMethod", {}); } catch (e) { unknownCode = e.code; }
  check("unknown method: MethodNotFound (-32601)", unknownCode === -32601, String(unknownCode));

  // 10. Shutdown and exit per protocol: exit code 0.
  await connection.sendRequest(lsp.ShutdownRequest.type);
  await connection.sendNotification(lsp.ExitNotification.type);
  const code = await withTimeout(exited, 10000, "server exit");
  check("shutdown + exit: the server exits with code 0", code === 0, String(code));
  connection.dispose();
}

function applyEdits(text, edits) {
  const offset = (t, p) => {
    let at = 0;
    for (let i = 0; i < p.line; i++) at = t.indexOf("\n", at) + 1;
    return at + p.character; // JavaScript strings count UTF-16 units, as LSP does
  };
  const sorted = [...edits].sort((a, b) => offset(text, b.range.start) - offset(text, a.range.start));
  for (const e of sorted) text = text.slice(0, offset(text, e.range.start)) + e.newText + text.slice(offset(text, e.range.end));
  return text;
}

main()
  .catch((e) => { failed++; console.log(`  FAIL  ${e && e.message ? e.message : e}`); })
  .finally(() => {
    console.log(`node client: ${passed} passed, ${failed} failed`);
    process.exit(failed === 0 ? 0 : 1);
  });
