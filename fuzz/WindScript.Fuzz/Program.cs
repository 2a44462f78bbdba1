using System.Text;
using SharpFuzz;
using WindScript.Fuzz;

// windscript fuzz target: one of syntax, semantics, format, lsp. Under afl-fuzz the input comes
// on standard input, one run per input (SharpFuzz's forkserver); given a file it runs that input
// once, which is how a crash found by a campaign is replayed and kept as a regression case.
if (args.Length is < 1 or > 2 || !Targets.All.TryGetValue(args[0], out var target))
{
    Console.Error.WriteLine($"usage: WindScript.Fuzz {string.Join("|", Targets.All.Keys)} [INPUT]");
    return 2;
}
if (args.Length == 2)
{
    target(File.ReadAllBytes(args[1]));
    return 0;
}
Fuzzer.OutOfProcess.Run(stream =>
{
    using var buffer = new MemoryStream();
    stream.CopyTo(buffer);
    target(buffer.ToArray());
});
return 0;
