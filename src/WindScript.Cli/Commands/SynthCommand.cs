using WindScript.Cli.Files;
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
        UsageMessages.InRange(slots, 2, InputLimits.MaxSlots);
        UsageMessages.InRange(poles, 2, InputLimits.MaxPoles);
        poles.Validators.Add(r =>
        {
            if (r.Tokens.Count == 1 && int.TryParse(r.Tokens[0].Value, out int p) && p % 2 != 0) r.AddError($"--poles must be even, not {p}");
        });
        UsageMessages.InRange(phases, 2, InputLimits.MaxPhases);
        UsageMessages.InRange(layers, 1, 2);
        UsageMessages.InRange(pitch, 1, InputLimits.MaxSlots - 1);
        UsageMessages.InRange(turns, 1, InputLimits.MaxTurns);
        UsageMessages.InRange(paths, 1, InputLimits.MaxPaths);
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
        if (request.Pitch is { } pitch && pitch >= request.Slots)
        {
            io.Err.WriteLine($"windscript synth: --pitch must be below the slot count {request.Slots}, not {pitch}");
            return ExitCodes.Usage;
        }
        if (request.Problem() is { } problem)
        {
            io.Err.WriteLine($"windscript synth: {problem}");
            return ExitCodes.Usage;
        }
        if (request.MachineName is { } name && !IsName(name))
        {
            io.Err.WriteLine($"windscript synth: --name: '{name}' is not a name the language accepts (letters, digits and '_', not starting with a digit, not a keyword)");
            return ExitCodes.Usage;
        }
        var result = WindingSynthesizer.Synthesize(request);
        if (result.Design is not { } design)
        {
            foreach (var d in result.Diagnostics) io.Err.WriteLine($"synth: {DiagnosticText.SeverityName(d.Severity)} {d.Code}: {d.Message}");
            return ExitCodes.Findings;
        }
        var text = WindEmitter.Emit(design, new EmitOptions { Header = SynthesisHeader.Lines(result) });
        if (outputPath is null)
        {
            io.Out.Write(text);
            return ExitCodes.Ok;
        }
        return OutputWriting.Write(io, "synth --output", outputPath, () => OutputFile.WriteAllText(outputPath, text));
    }

    private static bool IsName(string name) =>
        name.Length > 0 && Syntax.Lexer.IsWordStart(name[0]) && name.All(Syntax.Lexer.IsWordPart) && !Syntax.Vocabulary.IsReserved(name);
}
