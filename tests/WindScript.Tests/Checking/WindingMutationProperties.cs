using WindScript.Analysis;
using System.Globalization;
using System.Numerics;
using System.Text;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using WindScript.Diagnostics;
using WindScript.Synthesis;

namespace WindScript.Tests.Checking;

/// <summary>One coil as the test writes it: phase index, go and return slot, go layer, turns, polarity.</summary>
public sealed record WrittenCoil(int Phase, int Go, int Return, int GoLayer, int Turns, int Polarity);

/// <summary>A balanced synthesised winding written coil by coil, with one winding mistake made in it.</summary>
public sealed record MutatedWinding(int Slots, int Poles, string[] Phases, int Layers, double ShiftDegrees, WrittenCoil[] Coils, string Mistake)
{
    public override string ToString() => $"Q={Slots} 2p={Poles} m={Phases.Length} layers={Layers}: {Mistake}\n{Text()}";

    public string Text()
    {
        var sb = new StringBuilder();
        sb.AppendLine("machine m {");
        sb.AppendLine($"  slots {Slots}");
        sb.AppendLine($"  poles {Poles}");
        sb.AppendLine($"  phases {string.Join(" ", Phases)}");
        sb.AppendLine("}");
        sb.AppendLine();
        sb.AppendLine("winding w {");
        sb.AppendLine($"  layers {Layers}");
        foreach (var c in Coils)
            sb.AppendLine(string.Create(CultureInfo.InvariantCulture,
                $"  coil {(c.Polarity < 0 ? "-" : "")}{Phases[c.Phase]}: {c.Go} -> {c.Return} turns {c.Turns}{(c.GoLayer == 1 ? " layer bottom" : "")}"));
        sb.AppendLine("}");
        return sb.ToString();
    }
}

public static class MutationGenerators
{
    // Balanced windings of several slot, pole and phase counts, single and double layer, from
    // the star-of-slots synthesiser; small enough that 2,000 checks stay quick.
    private static readonly MutatedWinding[] Balanced =
        (from phases in new[] { 2, 3, 5 }
         from layers in new[] { 1, 2 }
         from pairs in Enumerable.Range(1, 7)
         from slots in Enumerable.Range(6, 31)
         where Feasibility.IsFeasible(slots, pairs, PhaseBelts.ForPhases(phases)!, layers)
         let result = WindingSynthesizer.Synthesize(new SynthesisRequest { Slots = slots, Poles = 2 * pairs, Phases = phases, Layers = layers, TurnsPerCoil = 10 })
         where result.Succeeded
         let d = result.Design!
         select new MutatedWinding(slots, 2 * pairs, d.Phases.Select(x => x.Name).ToArray(), layers, d.PhaseShiftDegrees,
             d.Winding.Coils.Select(c => new WrittenCoil(c.Phase, c.GoSlot, c.ReturnSlot, c.GoLayer, c.Turns, c.Polarity)).ToArray(), "as synthesised"))
        .ToArray();

    public static int Count => Balanced.Length;

    public static Arbitrary<MutatedWinding> Mutants() =>
        (from w in Gen.Elements(Balanced)
         from kind in Gen.Choose(0, 7)
         from a in Gen.Choose(0, w.Coils.Length - 1)
         from b in Gen.Choose(0, w.Coils.Length - 1)
         from phase in Gen.Choose(1, w.Phases.Length - 1)
         from delta in Gen.Elements(-3, -1, 1, 2)
         select Mutate(w, kind, a, b, phase, delta)).ToArbitrary();

    private static MutatedWinding Mutate(MutatedWinding w, int kind, int a, int b, int phaseStep, int delta)
    {
        var coils = w.Coils.ToList();
        int m = w.Phases.Length;
        var x = coils[a];
        string mistake;
        switch (kind)
        {
            case 1:
                coils[a] = x with { Polarity = -x.Polarity };
                mistake = $"coil {a} reversed";
                break;
            case 2:
                coils[a] = x with { Phase = (x.Phase + phaseStep) % m };
                mistake = $"coil {a} moved to phase {w.Phases[(x.Phase + phaseStep) % m]}";
                break;
            case 3:
                coils.RemoveAt(a);
                mistake = $"coil {a} dropped";
                break;
            case 4:
                coils[a] = x with { Turns = Math.Max(1, x.Turns + delta) };
                mistake = $"coil {a} given {Math.Max(1, x.Turns + delta)} turns";
                break;
            case 5:
                var y = coils[b];
                coils[a] = x with { Phase = y.Phase };
                coils[b] = y with { Phase = x.Phase };
                mistake = $"phases of coils {a} and {b} swapped";
                break;
            case 6:
                for (int i = 0; i < coils.Count; i++) coils[i] = coils[i] with { Polarity = 1 };
                mistake = "every sign forgotten";
                break;
            case 7:
                coils.RemoveAll(c => c.Phase == phaseStep);
                mistake = $"phase {w.Phases[phaseStep]} left out";
                break;
            default:
                mistake = "none";
                break;
        }
        return w with { Coils = [.. coils], Mistake = mistake };
    }
}

/// <summary>
/// The checker's promise, tested by mutation: every winding mistake that unbalances a winding
/// gets an error from 'check', and a winding still balanced after the "mistake" gets none.
/// Balance is judged here independently of the checker, from the conductor sums of the coils
/// as written: per phase the total turns N_k and the phasor S_k = Σ_slots n_k(s)·e^(−j·p·2πs/Q);
/// balanced means every phase wound, equal N_k, equal winding factors |S_k|/(2N_k), a non-zero
/// fundamental, and arg S_k stepping by the phase shift (Pyrhonen, Jokinen, Hrabovcova, Design
/// of Rotating Electrical Machines, 2nd ed., ch. 2: a symmetric m-phase winding).
/// Every fix offered on a mutant is applied and must leave a file without errors.
/// </summary>
[Properties(Arbitrary = [typeof(MutationGenerators)])]
public class WindingMutationProperties
{
    [Property(MaxTest = 2000)]
    public bool Check_reports_an_error_exactly_when_a_mistake_unbalances_the_winding(MutatedWinding w)
    {
        var text = w.Text();
        var c = Compilation.Compile(text);
        bool error = c.HasErrors;
        bool unbalanced = Unbalanced(w);
        if (error != unbalanced)
            throw new InvalidOperationException($"independent judgement: {(unbalanced ? "unbalanced" : "balanced")}; check says:\n"
                + string.Join("\n", c.Diagnostics.Select(d => d.ToString())));
        foreach (var d in c.Diagnostics.Where(d => d.Fix is not null))
        {
            var fixedText = QuickFixTests.Apply(text, d.Fix!.Edits);
            var after = Compilation.Compile(fixedText);
            if (after.HasErrors) throw new InvalidOperationException($"fix '{d.Fix.Title}' for {d.Code} leaves errors:\n{string.Join("\n", after.Diagnostics)}");
        }
        return true;
    }

    [Fact]
    public void The_generator_draws_from_many_balanced_windings() => Assert.True(MutationGenerators.Count >= 100, $"{MutationGenerators.Count} windings");

    private static bool Unbalanced(MutatedWinding w)
    {
        int m = w.Phases.Length, q = w.Slots, p = w.Poles / 2;
        var conductors = new long[m, q];
        var turns = new long[m];
        foreach (var coil in w.Coils)
        {
            conductors[coil.Phase, coil.Go - 1] += coil.Polarity * coil.Turns;
            conductors[coil.Phase, coil.Return - 1] -= coil.Polarity * coil.Turns;
            turns[coil.Phase] += coil.Turns;
        }
        var s = new Complex[m];
        for (int k = 0; k < m; k++)
            for (int slot = 0; slot < q; slot++)
                s[k] += conductors[k, slot] * Complex.Exp(new Complex(0, -2 * Math.PI * p * slot / q));
        if (turns.Any(t => t == 0) || turns.Distinct().Count() > 1) return true;
        var factors = s.Select((x, k) => x.Magnitude / (2.0 * turns[k])).ToArray();
        if (factors.Any(f => Math.Abs(f - factors[0]) > 1e-6) || factors[0] < 1e-6) return true;
        bool Spaced(int direction) => Enumerable.Range(1, m - 1).All(k =>
        {
            double step = (s[k] / s[0]).Phase * 180 / Math.PI + direction * k * w.ShiftDegrees;
            return Math.Abs(Math.IEEERemainder(step, 360)) < 0.01;
        });
        return !(Spaced(1) || Spaced(-1));
    }
}
