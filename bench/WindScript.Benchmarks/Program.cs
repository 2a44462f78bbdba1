using BenchmarkDotNet.Running;

// Run all: dotnet run -c Release --project bench/WindScript.Benchmarks -- --filter '*'
// Quick:   ... -- --filter '*' --job short
BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
