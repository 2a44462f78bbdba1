using BenchmarkDotNet.Running;

// Run all: dotnet run -c Release --project bench/WindScript.Benchmarks -- --filter '*'
// Quick:   ... -- --filter '*' --job short
// LSP:     ... -- lsp-soak [lines] [keystrokes] [edits]   (latency percentiles and memory over many edits)
if (args is ["lsp-soak", ..]) return WindScript.Benchmarks.LanguageServer.LspSoak.Run(args[1..]);
BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
return 0;
