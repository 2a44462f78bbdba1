using WindScript.Analysis;
using System.Collections.Immutable;
using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Text;

namespace WindScript.Synthesis;

/// <summary>
/// Synthesises a balanced winding by the star of slots and returns it as a
/// <see cref="WindingDesign"/>, the same model that evaluating a .wind file gives; or, when no
/// balanced winding exists, a diagnostic that names the failed condition and what would work.
/// </summary>
public static class WindingSynthesizer
{
    /// <summary>A balanced winding for the request by the star of slots, or the diagnostics that say why none exists.</summary>
    public static SynthesisResult Synthesize(SynthesisRequest request)
    {
        if (request.Problem() is { } problem) throw new ArgumentException(problem, nameof(request));
        var belts = PhaseBelts.ForPhases(request.Phases)!;
        int q = request.Slots, poles = request.Poles, p = poles / 2, layers = request.Layers;

        var report = Feasibility.Check(q, poles, belts, layers);
        if (!report.IsFeasible) return Failed(report, 0, InfeasibleDiagnostic(report, belts));

        var layout = new StarLayout();
        int pitch = request.Pitch ?? 0;
        var outcome = LayWithRule(q, p, belts, layers, pitch, layout, out pitch);
        if (outcome != LayoutOutcome.Balanced) return Failed(report, pitch, PitchDiagnostic(outcome, q, p, belts, layers, pitch));

        int sections = layout.Sections();
        int coilsPerPhase = layers == 2 ? q / request.Phases : q / 2 / request.Phases;
        if (sections % request.Paths != 0 || coilsPerPhase % request.Paths != 0)
            return Failed(report, pitch, DiagnosticCatalog.PathsUnequalEmf.At(default,
                $"{request.Paths} parallel paths would carry unequal EMFs: this winding has {sections} identical section{(sections == 1 ? "" : "s")}, " +
                $"so the number of paths must divide {sections} ({string.Join(", ", Divisors(sections))})"));

        return new SynthesisResult
        {
            Design = BuildDesign(request, belts, layout),
            Feasibility = report,
            Pitch = pitch,
            Sections = sections,
            PhaseStep = layout.PhaseStep,
            ForwardCoils = layout.ForwardCoils,
        };
    }

    /// <summary>
    /// Lays out one winding. A pitch of 0 applies <see cref="PitchRule.PolePitch"/>: the longest pitch
    /// not exceeding the pole pitch, and for a single layer the nearest one below (then above) that is
    /// balanced. <paramref name="pitchUsed"/> is the pitch laid out (the pole pitch if none works).
    /// </summary>
    internal static LayoutOutcome LayWithRule(int slots, int polePairs, PhaseBelts belts, int layers, int pitch, StarLayout layout, out int pitchUsed)
    {
        if (pitch > 0)
        {
            pitchUsed = pitch;
            return StarOfSlots.Lay(slots, polePairs, belts, layers, pitch, layout);
        }
        int pole = PitchRule.PolePitchSlots(slots, 2 * polePairs);
        pitchUsed = Math.Min(pole, slots - 1);
        var first = StarOfSlots.Lay(slots, polePairs, belts, layers, pitchUsed, layout);
        if (first is LayoutOutcome.Balanced or LayoutOutcome.Infeasible) return first;
        for (int y = pitchUsed - 1; y >= 1; y--)
            if (StarOfSlots.Lay(slots, polePairs, belts, layers, y, layout) == LayoutOutcome.Balanced) { pitchUsed = y; return LayoutOutcome.Balanced; }
        for (int y = pole + 1; y < slots; y++)
            if (StarOfSlots.Lay(slots, polePairs, belts, layers, y, layout) == LayoutOutcome.Balanced) { pitchUsed = y; return LayoutOutcome.Balanced; }
        return StarOfSlots.Lay(slots, polePairs, belts, layers, pitchUsed, layout);
    }

    /// <summary>Every pitch (1..Q−1) that gives a balanced winding with these counts.</summary>
    internal static IReadOnlyList<int> BalancedPitches(int slots, int polePairs, PhaseBelts belts, int layers)
    {
        var layout = new StarLayout();
        var result = new List<int>();
        for (int y = 1; y < slots; y++)
            if (StarOfSlots.Lay(slots, polePairs, belts, layers, y, layout) == LayoutOutcome.Balanced) result.Add(y);
        return result;
    }

    /// <summary>Builds the design of a balanced layout: one coil per go side, in slot order.</summary>
    internal static WindingDesign BuildDesign(SynthesisRequest request, PhaseBelts belts, StarLayout layout)
    {
        int q = layout.Slots, y = layout.Pitch;
        var coils = ImmutableArray.CreateBuilder<Coil>(layout.Layers == 2 ? q : q / 2);
        for (int s = 0; s < q; s++)
        {
            int polarity = layout.CoilAt(s);
            if (polarity == 0) continue;
            int phase = layout.PhaseAt(s, 0);
            coils.Add(new Coil { Phase = phase, GoSlot = s + 1, ReturnSlot = (s + y) % q + 1, GoLayer = 0, ReturnLayer = layout.Layers == 2 ? 1 : 0, Turns = request.TurnsPerCoil, Polarity = polarity });
        }
        var names = request.ResolvedPhaseNames;
        return new WindingDesign
        {
            Name = request.ResolvedMachineName,
            Slots = q,
            Poles = request.Poles,
            Phases = [.. names.Select((n, k) => new Phase(n, k))],
            PhaseShiftDegrees = belts.PhaseShiftDegrees,
            Winding = new Winding
            {
                Name = request.WindingName,
                Layers = layout.Layers,
                Paths = request.Paths,
                Coils = coils.ToImmutable(),
                DeclaredPitch = y,
            },
        };
    }

    private static SynthesisResult Failed(FeasibilityReport report, int pitch, Diagnostic diagnostic) =>
        new() { Feasibility = report, Pitch = pitch, Diagnostics = [diagnostic] };

    private static Diagnostic InfeasibleDiagnostic(FeasibilityReport report, PhaseBelts belts)
    {
        string counts = $"{report.Slots} slots, {report.Poles} poles and {report.Phases} phase{(report.Phases == 1 ? "" : "s")}";
        if (report.Layers == 1)
        {
            string alsoDouble = Feasibility.IsFeasible(report.Slots, report.Poles / 2, belts, 2) ? " (a double-layer winding is feasible)" : "";
            return DiagnosticCatalog.NoBalancedSingleLayer.At(default,
                $"no balanced single-layer winding for {counts}: {report.Condition}; {report.NearestText()}{alsoDouble}");
        }
        return DiagnosticCatalog.NoBalancedWinding.At(default, $"no balanced winding for {counts}: {report.Condition}; {report.NearestText()}");
    }

    private static Diagnostic PitchDiagnostic(LayoutOutcome outcome, int slots, int polePairs, PhaseBelts belts, int layers, int pitch)
    {
        if (outcome == LayoutOutcome.NoFundamental)
            return DiagnosticCatalog.PitchLinksNoFlux.At(default,
                $"a coil pitch of {pitch} slots spans {(long)pitch * polePairs / slots} whole pole pair{(pitch * polePairs / slots == 1 ? "" : "s")} " +
                $"(y·p = {pitch * polePairs} is a multiple of Q = {slots}), so the EMFs of its sides cancel; the pole pitch is {FractionText.Of(slots, 2 * polePairs)} slots");
        var works = BalancedPitches(slots, polePairs, belts, layers);
        string reason = outcome == LayoutOutcome.OddCycle
            ? $"stepping by {pitch} slots visits {slots / WindScript.Numerics.IntegerMath.Gcd(slots, pitch)} slots before it returns, an odd number, so go and return sides cannot alternate"
            : $"the go sides that pitch selects do not form a balanced star";
        string list = works.Count == 0 ? "no pitch works" : "pitches that work: " + string.Join(", ", works.Take(12)) + (works.Count > 12 ? ", ..." : "");
        string what = layers == 1 ? "single-layer winding" : "winding";
        return DiagnosticCatalog.PitchNotBalanced.At(default, $"no balanced {what} with a coil pitch of {pitch} slots: {reason}; {list}");
    }

    private static IEnumerable<int> Divisors(int n) => Enumerable.Range(1, n).Where(d => n % d == 0);
}
