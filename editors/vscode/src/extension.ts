// Starts `windscript lsp` and connects it to VS Code. Everything the editor shows for .wind
// files (diagnostics, hover, completion, formatting, quick fixes, outline) comes from that server.
import * as vscode from "vscode";
import { LanguageClient, LanguageClientOptions, ServerOptions, TransportKind } from "vscode-languageclient/node";

let client: LanguageClient | undefined;

function serverOptions(): ServerOptions {
  const config = vscode.workspace.getConfiguration("windscript");
  const command = config.get<string>("server.path", "windscript") || "windscript";
  const args = [...config.get<string[]>("server.args", []), "lsp"];
  return { command, args, transport: TransportKind.stdio };
}

async function start(context: vscode.ExtensionContext): Promise<void> {
  const clientOptions: LanguageClientOptions = {
    documentSelector: [{ language: "windscript" }],
    outputChannelName: "WindScript",
  };
  client = new LanguageClient("windscript", "WindScript", serverOptions(), clientOptions);
  try {
    await client.start();
  } catch (error) {
    const path = vscode.workspace.getConfiguration("windscript").get<string>("server.path", "windscript");
    void vscode.window.showErrorMessage(
      `WindScript: could not start '${path} lsp' (${String(error)}). Install the windscript command or set "windscript.server.path".`,
    );
  }
}

export async function activate(context: vscode.ExtensionContext): Promise<void> {
  context.subscriptions.push(
    vscode.commands.registerCommand("windscript.restartServer", async () => {
      await client?.stop();
      await start(context);
    }),
    vscode.workspace.onDidChangeConfiguration(async (event) => {
      if (event.affectsConfiguration("windscript.server")) {
        await client?.stop();
        await start(context);
      }
    }),
  );
  await start(context);
}

export async function deactivate(): Promise<void> {
  await client?.stop();
}
