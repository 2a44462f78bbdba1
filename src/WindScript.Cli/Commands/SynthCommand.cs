using System.CommandLine;
using WindScript.Cli.Output;
using WindScript.Emit;
using WindScript.Synthesis;

namespace WindScript.Cli.Commands;

/// <summary>
/// <c>windscript synth --slots Q --poles 2P ...</c>: lay out a balanced winding by the star of
/// slots and print it as a canonical, commented .wind file. An infeasible combination exits 1
/// with a diagnostic naming the failed condition and the nearest feasible counts.
/// </summary>
public static class SynthCommand
{
    public static Command Create(CliIO io)
    {
        var slots = new Option<int>("--slots", "-Q") { Description = "Number of slots Q", Required = true };
        var poles = new Option<int>("--poles", "-P") { Description = "Number of poles 2p (even)", Required = true };
        var phases = new Option<int>("--phases", "-m") { Description = "Number of phases", DefaultValueFactory = _ => 3 };
        var layers = new Option<int>("--layers", "-l") { Description = "1 (single layer) or 2 (double layer)", DefaultValueFactory = _ => 2 };
        var pitch = new Option<int?>("--pitch", "-y") { Description = "Coil pitch in slots (default: the longest not exceeding the pole pitch)" };
        var turns = new Option<int>("--turns", "-n") { Description = "Turns per coil", DefaultValueFactory = _ => 1 };
        var paths = new Option<int>("--paths", "-a") { Description = "Parallel paths per phase", DefaultValueFactory = _ => 1 };
        var name = new Option<string?>("--name") { Description = "Machine name (default slots{Q}_poles{2P})" };
        var output = new Option<string?>("--output", "-o") { Description = "Write the file here (replaced only when complete) instead of standard output" };
        var command = new Command("synth", "Synthesise a balanced winding by the star of slots and print it as a .wind file")
        {
            slots, poles, phases, layers, pitch, turns, paths, name, output,
        };
        command.SetAction(parse => Run(io, new SynthesisRequest
        {
            Slots = parse.GetValue(slots),
            Poles = parse.GetValue(poles),
            Phases = parse.GetValue(phases),
            Layers = parse.GetValue(layers),
            Pitch = parse.GetValue(pitch),
            TurnsPerCoil = parse.GetValue(turns),
            Paths = parse.GetValue(paths),
            MachineName = parse.GetValue(name),
        }, parse.GetValue(output)));
        return command;
    }

    public static int Run(CliIO io, SynthesisRequest request, string? outputPath = null)
    {
        if (request.Problem() is { } problem)
        {
            io.Err.WriteLine($"windscript synth: {problem}");
            return ExitCodes.Usage;
        }
        if (request.MachineName is { } name && !IsName(name))
        {
            io.Err.WriteLine($"windscript synth: '{name}' is not a name the language accepts (letters, digits and '_', not starting with a digit, not a keyword)");
            return ExitCodes.Usage;
        }
        var result = WindingSynthesizer.Synthesize(request);
        if (result.Design is not { } design)
        {
            foreach (var d in result.Diagnostics) io.Err.WriteLine($"synth: {DiagnosticText.SeverityName(d.Severity)} {d.Code}: {d.Message}");
            return ExitCodes.Findings;
        }
        var text = WindEmitter.Emit(design, new EmitOptions { Header = SynthesisHeader.Lines(result) });
        if (outputPath is null) io.Out.Write(text);
        else AtomicFile.WriteAllText(outputPath, text);
        return ExitCodes.Ok;
    }

    private static bool IsName(string name) =>
        name.Length > 0 && Syntax.Lexer.IsWordStart(name[0]) && name.All(Syntax.Lexer.IsWordPart) && !Syntax.Vocabulary.IsReserved(name);
}
