using System.Globalization;
using WindScript;
using WindScript.Analysis;
using WindScript.Emit;
using WindScript.Model;
using WindScript.Synthesis;

namespace WindScript.Examples.Pipeline;

/// <summary>
/// Generates a family of three-phase double-layer windings by the star of slots (plus one built
/// in code), evaluates each, keeps those with a fundamental winding factor of at least 0.9 and
/// no sub-harmonics, and writes the few with the least harmonic leakage as canonical .wind files
/// into the folder given on the command line, after checking that each reads back unchanged.
///
///   dotnet run --project examples/pipeline -- OUT_DIR [--slots 12..48] [--poles 8..20] [--best 5]
/// </summary>
public static class PipelineProgram
{
    public static int Main(string[] args)
    {
        if (args.Length == 0 || args[0].StartsWith('-'))
        {
            Console.Error.WriteLine("usage: pipeline OUT_DIR [--slots A..B] [--poles C..D] [--best N]");
            return 2;
        }
        var (slotsFrom, slotsTo) = Range(Option(args, "--slots") ?? "12..48");
        var (polesFrom, polesTo) = Range(Option(args, "--poles") ?? "8..20");
        int best = int.Parse(Option(args, "--best") ?? "5", CultureInfo.InvariantCulture);
        var written = Run(args[0], slotsFrom, slotsTo, polesFrom, polesTo, best, Console.Out);
        return written.Count > 0 ? 0 : 1;
    }

    /// <summary>The pipeline itself; returns the paths written.</summary>
    public static IReadOnlyList<string> Run(string folder, int slotsFrom, int slotsTo, int polesFrom, int polesTo, int best, TextWriter log)
    {
        // 1. Generate: one synthesis per slot/pole pair; infeasible pairs come back without a design.
        var candidates = new List<(SynthesisResult Synthesis, AnalysisResult Analysis)>();
        for (int slots = slotsFrom; slots <= slotsTo; slots++)
            for (int poles = polesFrom + polesFrom % 2; poles <= polesTo; poles += 2)
            {
                var synthesis = WindingSynthesizer.Synthesize(new SynthesisRequest { Slots = slots, Poles = poles, TurnsPerCoil = 20 });
                if (synthesis.Design is not { } design) continue;
                // 2. Evaluate: every figure 'windscript eval' shows is in the analysis result.
                candidates.Add((synthesis, MachineAnalysis.Evaluate(design)));
            }
        // A winding built in code joins the family: the classic tooth-coil layout of a
        // fictional 12-slot, 10-pole hub motor, one coil round every tooth.
        var handMade = FromTopPattern("hub_12s10p", 12, 10, "U -U -V V W -W -U U V -V -W W", turns: 20);
        if (handMade.Slots >= slotsFrom && handMade.Slots <= slotsTo && handMade.Poles >= polesFrom && handMade.Poles <= polesTo)
            candidates.Add((new SynthesisResult { Design = handMade, Feasibility = Feasibility.Check(12, 10, 3, 2), Pitch = 1, Sections = 2 },
                MachineAnalysis.Evaluate(handMade)));

        // 3. Filter by figures and rank: least harmonic (differential) leakage first, then the
        //    highest winding factor.
        var chosen = candidates
            .Where(c => Fundamental(c.Analysis) >= 0.9 && c.Analysis.Balanced.SubHarmonics.IsEmpty)
            .OrderBy(c => Math.Round(c.Analysis.DifferentialLeakage ?? double.MaxValue, 9))
            .ThenByDescending(c => Fundamental(c.Analysis))
            .Take(best)
            .ToList();
        log.WriteLine($"{candidates.Count} feasible layouts, {chosen.Count} kept (k_w1 >= 0.9, no sub-harmonics)");

        // 4. Write canonical text, and 5. parse it back before trusting it.
        Directory.CreateDirectory(folder);
        var paths = new List<string>();
        foreach (var (synthesis, analysis) in chosen)
        {
            var design = synthesis.Design!;
            var text = WindEmitter.Emit(design, new EmitOptions { Header = SynthesisHeader.Lines(synthesis) });
            var back = Compilation.Compile(text);
            if (back.HasErrors || back.Design is null || !SameConductors(design, back.Design))
                throw new InvalidOperationException($"{design.Name}: the written text does not read back to the same winding");
            var path = Path.Combine(folder, design.Name + ".wind");
            File.WriteAllText(path, text);
            paths.Add(path);
            log.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"{path}: k_w1 = {Fundamental(analysis):0.0000}, leakage = {analysis.DifferentialLeakage:0.0000}, cogging order {analysis.Machine.CoggingOrder}"));
        }
        return paths;
    }

    /// <summary>
    /// A double-layer winding built in code from its top-layer pattern: slot s carries the go side
    /// of a coil of the named phase ('-' reverses it) that returns one slot on in the bottom layer.
    /// </summary>
    public static WindingDesign FromTopPattern(string name, int slots, int poles, string pattern, int turns)
    {
        string[] phases = ["U", "V", "W"];
        var coils = pattern.Split(' ', StringSplitOptions.RemoveEmptyEntries).Select((entry, s) =>
            new Coil { Phase = Array.IndexOf(phases, entry.TrimStart('-')), GoSlot = s + 1, ReturnSlot = (s + 1) % slots + 1, GoLayer = 0, ReturnLayer = 1, Turns = turns, Polarity = entry.StartsWith('-') ? -1 : 1 });
        return new WindingDesign
        {
            Name = name,
            Slots = slots,
            Poles = poles,
            Phases = [.. phases.Select((n, k) => new Phase(n, k))],
            PhaseShiftDegrees = 120,
            Winding = new Winding { Name = "teeth", Layers = 2, Coils = [.. coils], DeclaredPitch = 1 },
        };
    }

    /// <summary>The fundamental winding factor of the first phase (electrical order 1, mechanical order p).</summary>
    public static double Fundamental(AnalysisResult a) =>
        a.Phases[0].Harmonics.FirstOrDefault(h => h.Order == a.Machine.PolePairs)?.WindingFactor ?? 0;

    private static bool SameConductors(WindingDesign a, WindingDesign b)
    {
        var x = a.Conductors;
        var y = b.Conductors;
        if ((x.Phases, x.Slots, x.Layers) != (y.Phases, y.Slots, y.Layers)) return false;
        for (int k = 0; k < x.Phases; k++)
            for (int s = 0; s < x.Slots; s++)
                for (int l = 0; l < x.Layers; l++)
                    if (x[k, s, l] != y[k, s, l]) return false;
        return true;
    }

    private static string? Option(string[] args, string name)
    {
        int i = Array.IndexOf(args, name);
        return i >= 0 && i + 1 < args.Length ? args[i + 1] : null;
    }

    private static (int From, int To) Range(string text)
    {
        var parts = text.Split("..");
        return (int.Parse(parts[0], CultureInfo.InvariantCulture), int.Parse(parts[^1], CultureInfo.InvariantCulture));
    }
}
