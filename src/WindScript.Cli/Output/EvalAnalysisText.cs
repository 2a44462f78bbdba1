using System.Globalization;
using WindScript.Analysis;

namespace WindScript.Cli.Output;

/// <summary>The MMF/field analysis as aligned tables for people (the second half of <c>eval</c>).</summary>
public static class EvalAnalysisText
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static void Write(TextWriter o, AnalysisResult r)
    {
        WriteSummary(o, r);
        WriteFactors(o, r);
        WritePhases(o, r);
        WriteInductances(o, r);
        WriteBackEmf(o, r);
        if (r.Conductors is { } conductors) EvalConductorText.Write(o, conductors);
        foreach (var d in r.Drives) WriteDrive(o, r, d);
        o.WriteLine();
        o.WriteLine("assumptions");
        foreach (var a in r.Assumptions) o.WriteLine($"  - {a}");
        if (r.Notes.Length > 0)
        {
            o.WriteLine("notes");
            foreach (var n in r.Notes) o.WriteLine($"  - {n}");
        }
    }

    private static void WriteSummary(TextWriter o, AnalysisResult r)
    {
        var m = r.Machine;
        o.WriteLine();
        o.WriteLine("analysis (mechanical order v = cycles per revolution; electrical order n = v/p)");
        Row(o, "periodicity gcd(Q,p)", N(m.Periodicity));
        Row(o, "winding periodicity", N(m.WindingPeriodicity) + (m.HalfPeriodReversal ? " (reverses over half a period: odd multiples only)" : ""));
        Row(o, "cogging order lcm(Q,2p)", N(m.CoggingOrder));
        Row(o, "unbalanced pull", m.AdjacentOrders ? "possible: adjacent orders v and v+1 coexist" : "none (no adjacent orders)");
        Row(o, "regular winding", r.Winding.Regular is { } reg
            ? $"q = {reg.SlotsPerPolePerPhase}, coil pitch {reg.CoilPitch} slots: closed-form k_d, k_p shown"
            : "no (factors from the coil sides only)");
        Row(o, "differential leakage", r.DifferentialLeakage is { } s ? $"{F(s, 5)} (coefficient, exact, all orders)" : "undefined (no working wave)");
        Row(o, "sub-harmonics", Orders(r.Balanced.SubHarmonics));
        Row(o, "even harmonics", Orders(r.Balanced.EvenHarmonics));
        Row(o, "inter-harmonics", Orders(r.Balanced.InterHarmonics));
        if (r.Gap.CarterCoefficient is { } kc)
        {
            Row(o, "Carter coefficient", F(kc, 4));
            Row(o, "effective gap", $"{F(r.Gap.EffectiveGap!.Value * 1000, 4)} mm");
        }
        if (r.Gap.RotorRadius is { } rr) Row(o, "rotor radius", $"{F(rr * 1000, 4)} mm");
    }

    private static void WriteFactors(TextWriter o, AnalysisResult r)
    {
        if (r.Phases.Length == 0) return;
        bool same = r.Phases.All(p => p.Harmonics.Length == r.Phases[0].Harmonics.Length &&
            p.Harmonics.Zip(r.Phases[0].Harmonics).All(x => x.First.Order == x.Second.Order && Math.Abs(x.First.WindingFactor - x.Second.WindingFactor) < 1e-9));
        foreach (var phase in same ? [r.Phases[0]] : r.Phases.AsEnumerable())
        {
            o.WriteLine();
            o.WriteLine(same ? "winding factors (every phase); MMF/phase: one phase's wave amplitude per ampere of its current (A/A, peak)" : $"winding factors (phase {phase.Name}); MMF/phase: the phase's wave amplitude per ampere (A/A, peak)");
            o.WriteLine($"  {"v",5} {"n",8} {"k_w",8} {"k_d",8} {"k_p",8} {"k_skew",8} {"MMF/phase",10}");
            foreach (var h in phase.Harmonics)
                o.WriteLine($"  {N(h.Order),5} {F(h.ElectricalOrder, 3),8} {F(h.WindingFactor, 4),8} {Opt(h.DistributionFactor),8} {Opt(h.PitchFactor),8} {F(h.SkewFactor, 4),8} {G(h.MmfPerAmpere),10}");
        }
    }

    private static void WritePhases(TextWriter o, AnalysisResult r)
    {
        o.WriteLine();
        o.WriteLine($"  {"phase",-6} {"series turns",12} {"axis deg el.",12}");
        foreach (var p in r.Phases) o.WriteLine($"  {p.Name,-6} {G(p.SeriesTurns),12} {F(p.AxisElectricalDegrees, 2),12}");
    }

    private static void WriteInductances(TextWriter o, AnalysisResult r)
    {
        if (r.Inductances is not { } l) return;
        o.WriteLine();
        string permeance = l.ThickGap ? "thick gap: 2-D permeance for v <= Q/2" : "thin gap";
        o.WriteLine($"air-gap inductances, mH (winding functions, {permeance}, effective gap {F(l.EffectiveGap * 1000, 4)} mm, mean radius {F(l.MeanRadius * 1000, 3)} mm)");
        o.Write($"  {"",-6}");
        foreach (var p in r.Phases) o.Write($" {p.Name,10}");
        o.WriteLine();
        for (int k = 0; k < r.Phases.Length; k++)
        {
            o.Write($"  {r.Phases[k].Name,-6}");
            foreach (double v in l.Matrix[k]) o.Write($" {G(v * 1000),10}");
            o.WriteLine();
        }
        Row(o, "balanced (synchronous)", $"{G(l.Synchronous * 1000)} mH (magnetising x (1 + differential leakage))");
    }

    private static void WriteBackEmf(TextWriter o, AnalysisResult r)
    {
        if (r.BackEmf is not { } e) return;
        o.WriteLine();
        o.WriteLine($"back-EMF for B1 = {G(e.PeakFluxDensity)} T peak: flux per pole {G(e.FluxPerPole * 1000)} mWb");
        o.WriteLine($"  {"phase",-6} {"k_w1",8} {"V rms/Hz",10} {"V rms/krpm",11}");
        foreach (var p in e.Phases) o.WriteLine($"  {p.Name,-6} {F(p.WindingFactor, 4),8} {G(p.VoltsPerHertz),10} {G(p.VoltsPer1000Rpm),11}");
    }

    private static void WriteDrive(TextWriter o, AnalysisResult r, DriveAnalysis d)
    {
        o.WriteLine();
        o.WriteLine($"drive {d.Name} at t = {G(d.Time)} s");
        Row(o, "currents", string.Join("  ", r.Phases.Select(p => $"{p.Name} {G(d.Currents[p.Index])} A")));
        Row(o, "peak MMF", $"{G(d.PeakMmf)} A");
        if (d.PeakField is { } f)
        {
            Row(o, "peak field, thin gap", $"B {G(f.FluxDensity)} T, H {G(f.FieldStrength / 1000)} kA/m (Carter)");
            Row(o, "peak field, 2-D", $"rotor {G(f.ExactFluxDensityAtRotor)} T, bore {G(f.ExactFluxDensityAtBore)} T (smooth gap; bore at the tooth centres)");
            Row(o, "peak field, flux tube", $"rotor {G(f.RadialFluxDensityAtRotor)} T ({Pct(f.FluxTubeDeviationAtRotor)} vs 2-D), bore {G(f.RadialFluxDensityAtBore)} T ({Pct(f.FluxTubeDeviationAtBore)} vs 2-D)");
            if (FieldCaution.For(f) is { } caution) Row(o, "  caution", caution);
        }
        if (d.FundamentalField is { } b1)
        {
            Row(o, "fundamental B1", $"{G(b1.FluxDensity)} T thin gap (MMF {G(b1.Mmf)} A); 2-D rotor {G(b1.ExactFluxDensityAtRotor)} T, bore {G(b1.ExactFluxDensityAtBore)} T");
            Row(o, "B1, flux tube", $"rotor {G(b1.RadialFluxDensityAtRotor)} T ({Pct(b1.FluxTubeDeviationAtRotor)} vs 2-D), bore {G(b1.RadialFluxDensityAtBore)} T ({Pct(b1.FluxTubeDeviationAtBore)} vs 2-D)");
        }
        if (d.BackEmfFrequencyHz is { } hz)
        {
            // A machine constant (V per Hz of the declared B1) times this drive's frequency: the EMF a
            // rotor field would induce, not something this drive's currents produce.
            bool positiveSequence = d.Harmonics.Any(w => w.Order == r.Machine.PolePairs && w.FrequencyHz == hz && w.Kind == WaveKind.Forward);
            string label = positiveSequence ? $"back-EMF at {G(hz)} Hz" : $"EMF constant x {G(hz)} Hz";
            Row(o, label, string.Join("  ", r.Phases.Select(p => $"{p.Name} {G(d.BackEmfRms[p.Index])} V rms")) +
                (positiveSequence ? "" : " (machine constant times frequency: this drive is not a positive-sequence supply)"));
        }
        o.WriteLine($"  {"v",5} {"n",8} {"f Hz",8} {"forward A",11} {"backward A",11} {"standing A",11} {"speed rpm",10}  kind (+ speed: towards higher slot numbers)");
        foreach (var w in d.Harmonics)
            o.WriteLine($"  {N(w.Order),5} {F(w.ElectricalOrder, 3),8} {G(w.FrequencyHz),8} {G(w.Forward),11} {G(w.Backward),11} {G(w.Standing),11} {Speed(w),10}  {w.Kind.ToString().ToLowerInvariant()}");
    }

    // Signed by direction: forward waves move towards increasing slot number.
    private static string Speed(TravellingWave w) => w.Kind switch
    {
        WaveKind.Pulsating or WaveKind.Elliptic => "+/-" + G(Math.Abs(w.SpeedRpm)),
        _ => G(w.SpeedRpm),
    };

    private static void Row(TextWriter o, string name, string value) => o.WriteLine($"  {name,-24} {value}");

    private static string Orders(IReadOnlyCollection<int> orders) =>
        orders.Count == 0 ? "none" : "orders v = " + string.Join(", ", orders.Take(12).Select(N)) + (orders.Count > 12 ? ", ..." : "");

    private static string N(int v) => v.ToString(Inv);
    private static string F(double v, int decimals) => Clean(v).ToString("F" + decimals, Inv);
    private static string G(double v) => Clean(v).ToString("G5", Inv);
    private static string Opt(double? v) => v is { } x ? F(x, 4) : "-";
    private static string Pct(double v) => (v >= 0 ? "+" : "") + (v * 100).ToString("0.00", Inv) + " %";

    // Rounding noise such as 1e-17 prints as 0, and -0 as 0.
    private static double Clean(double v) => Math.Abs(v) < 1e-12 ? 0 : v;
}
