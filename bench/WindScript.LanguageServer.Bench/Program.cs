using System.Diagnostics;
using System.IO.Pipes;
using System.Text;
using System.Text.Json.Nodes;
using WindScript.LanguageServer.Bench;
using WindScript.LanguageServer.Rpc;

// Keystroke-to-diagnostics latency and memory of the WindScript language server, driven
// in-process over OS pipes exactly as an editor drives `windscript lsp` over stdio.
// Usage: dotnet run -c Release --project bench/WindScript.LanguageServer.Bench [lines] [measured edits] [memory edits]
int lines = args.Length > 0 ? int.Parse(args[0]) : 2000;
int measured = args.Length > 1 ? int.Parse(args[1]) : 500;
int memoryEdits = args.Length > 2 ? int.Parse(args[2]) : 10_000;
const int WarmUp = 200;

var text = LargeWinding.Generate(lines);
int lineCount = text.Count(c => c == '\n');
Console.WriteLine($"document: {lineCount} lines, {text.Length / 1024} KiB (fictional generator, explicit coils)");

using var toServer = new AnonymousPipeServerStream(PipeDirection.Out);
using var fromServer = new AnonymousPipeServerStream(PipeDirection.Out);
using var serverIn = new AnonymousPipeClientStream(PipeDirection.In, toServer.ClientSafePipeHandle);
using var clientIn = new AnonymousPipeClientStream(PipeDirection.In, fromServer.ClientSafePipeHandle);
var server = Task.Run(() => WindScript.LanguageServer.LanguageServer.RunAsync(serverIn, fromServer));
var reader = new MessageReader(clientIn);
const string Uri = "file:///bench/big_generator.wind";

void Send(JsonObject message)
{
    var body = Encoding.UTF8.GetBytes(message.ToJsonString());
    toServer.Write(Encoding.ASCII.GetBytes($"Content-Length: {body.Length}\r\n\r\n"));
    toServer.Write(body);
    toServer.Flush();
}

async Task<JsonObject> Next(Func<JsonObject, bool> match)
{
    while (await reader.ReadAsync() is { } frame)
    {
        if (frame.Body is null) throw new InvalidOperationException(frame.Error);
        var m = JsonNode.Parse(frame.Body)!.AsObject();
        if (match(m)) return m;
    }
    throw new EndOfStreamException("the server closed its output");
}

Send(new JsonObject { ["jsonrpc"] = "2.0", ["id"] = 1, ["method"] = "initialize", ["params"] = new JsonObject { ["capabilities"] = new JsonObject() } });
await Next(m => m["id"] is not null);
Send(new JsonObject { ["jsonrpc"] = "2.0", ["method"] = "initialized", ["params"] = new JsonObject() });
Send(new JsonObject
{
    ["jsonrpc"] = "2.0", ["method"] = "textDocument/didOpen",
    ["params"] = new JsonObject { ["textDocument"] = new JsonObject { ["uri"] = Uri, ["languageId"] = "windscript", ["version"] = 1, ["text"] = text } },
});
var first = await Next(IsDiagnostics(1));
Console.WriteLine($"diagnostics on open: {first["params"]!["diagnostics"]!.AsArray().Count}");

// A keystroke: type or delete one digit of the turns value on line 1 ("let n = 4" <-> "let n = 45"),
// which changes every coil's turns, so each edit is re-checked for real.
int version = 1;
double Keystroke()
{
    version++;
    bool typing = version % 2 == 0;
    var change = new JsonObject
    {
        ["range"] = new JsonObject
        {
            ["start"] = new JsonObject { ["line"] = 1, ["character"] = 9 },
            ["end"] = new JsonObject { ["line"] = 1, ["character"] = typing ? 9 : 10 },
        },
        ["text"] = typing ? "5" : "",
    };
    var started = Stopwatch.GetTimestamp();
    Send(new JsonObject
    {
        ["jsonrpc"] = "2.0", ["method"] = "textDocument/didChange",
        ["params"] = new JsonObject { ["textDocument"] = new JsonObject { ["uri"] = Uri, ["version"] = version }, ["contentChanges"] = new JsonArray(change) },
    });
    Next(IsDiagnostics(version)).GetAwaiter().GetResult();
    return Stopwatch.GetElapsedTime(started).TotalMilliseconds;
}

for (int i = 0; i < WarmUp; i++) Keystroke();
var times = new double[measured];
for (int i = 0; i < measured; i++) times[i] = Keystroke();
Array.Sort(times);
double P(double q) => times[Math.Min(times.Length - 1, (int)(q * times.Length))];
Console.WriteLine($"didChange -> publishDiagnostics over {measured} keystrokes after {WarmUp} warm-up: " +
                  $"median {P(0.5):0.00} ms, p90 {P(0.9):0.00} ms, p99 {P(0.99):0.00} ms, max {times[^1]:0.00} ms");

// Memory over many successive edits: the managed heap after a full collection, and the working set.
Console.WriteLine($"memory over {memoryEdits} further edits (managed heap after full GC / working set):");
long MiB(long bytes) => bytes / (1024 * 1024);
var samples = new List<(int Edits, long Heap, long WorkingSet)>();
for (int i = 0; i <= memoryEdits; i++)
{
    if (i % (memoryEdits / 10) == 0)
    {
        GC.Collect();
        GC.WaitForPendingFinalizers();
        GC.Collect();
        var heap = GC.GetTotalMemory(true);
        var ws = Process.GetCurrentProcess().WorkingSet64;
        samples.Add((i, heap, ws));
        Console.WriteLine($"  after {i,6} edits: heap {MiB(heap),4} MiB, working set {MiB(ws),4} MiB");
    }
    if (i < memoryEdits) Keystroke();
}
double growth = (samples[^1].Heap - samples[1].Heap) / (1024.0 * 1024.0);
Console.WriteLine($"heap change from {samples[1].Edits} to {samples[^1].Edits} edits: {growth:+0.0;-0.0;0.0} MiB");

Send(new JsonObject { ["jsonrpc"] = "2.0", ["id"] = 2, ["method"] = "shutdown" });
await Next(m => (int?)m["id"] == 2);
Send(new JsonObject { ["jsonrpc"] = "2.0", ["method"] = "exit" });
Console.WriteLine($"server exit code: {await server}");

static Func<JsonObject, bool> IsDiagnostics(int version) =>
    m => (string?)m["method"] == "textDocument/publishDiagnostics" && (int?)m["params"]!["version"] == version;
