using WindScript.Analysis;
using WindScript.Model;

namespace WindScript.LanguageServer.Features;

/// <summary>The physics lines of hover, worded from the core analysis (winding factors, MMF spectrum, gap).</summary>
public static class WindingAnalysisText
{
    private const int HarmonicsShown = 4;

    /// <summary>Fundamental winding factor, the strongest MMF harmonics under balanced currents, leakage and symmetry warnings.</summary>
    public static IEnumerable<string> Winding(AnalysisResult? a, WindingDesign d)
    {
        if (a is null || a.Phases.IsEmpty) yield break;
        int p = d.PolePairs;
        var fundamentals = a.Phases.Select(ph => ph.Harmonics.FirstOrDefault(h => h.Order == p)).ToArray();
        if (fundamentals[0] is { } f1)
        {
            string closed = f1.DistributionFactor is { } kd && f1.PitchFactor is { } kp
                ? $" (distribution {Numbers.Show(Math.Abs(kd), 4)} × pitch {Numbers.Show(Math.Abs(kp), 4)}{(f1.SkewFactor < 1 ? $" × skew {Numbers.Show(f1.SkewFactor, 4)}" : "")})"
                : "";
            bool equal = fundamentals.All(h => h is not null && Math.Abs(h.WindingFactor - f1.WindingFactor) < 1e-6);
            yield return equal
                ? $"fundamental winding factor kw1 = {Numbers.Show(f1.WindingFactor, 4)}{closed}"
                : "fundamental winding factors: " + string.Join(", ", a.Phases.Select((ph, i) => $"{ph.Name} {Numbers.Show(fundamentals[i]?.WindingFactor ?? 0, 4)}"));
        }
        else
        {
            yield return $"no fundamental ({p} pole pairs): the winding does not make a {d.Poles}-pole field";
        }
        var waves = a.Balanced.Waves.Where(w => w.Order != p)
            .OrderByDescending(w => Math.Max(w.Forward, w.Backward)).Take(HarmonicsShown).OrderBy(w => w.Order).ToArray();
        if (waves.Length > 0)
            yield return "main MMF harmonics, balanced currents (electrical order: % of the working wave): " +
                         string.Join(", ", waves.Select(Wave));
        if (a.DifferentialLeakage is { } sigma) yield return $"differential leakage coefficient σδ = {Numbers.Show(sigma, 5)}";
        if (!a.Balanced.SubHarmonics.IsEmpty) yield return "sub-harmonics present (mechanical orders " + string.Join(", ", a.Balanced.SubHarmonics) + ")";
        if (!a.Balanced.EvenHarmonics.IsEmpty) yield return "even harmonics present (mechanical orders " + string.Join(", ", a.Balanced.EvenHarmonics) + ")";
    }

    /// <summary>A phase's fundamental winding factor and measured axis.</summary>
    public static IEnumerable<string> Phase(AnalysisResult? a, WindingDesign d, int phase)
    {
        if (a is null || phase >= a.Phases.Length) yield break;
        var ph = a.Phases[phase];
        if (ph.Harmonics.FirstOrDefault(h => h.Order == d.PolePairs) is { } f1)
            yield return $"fundamental winding factor {Numbers.Show(f1.WindingFactor, 4)}; magnetic axis of its coils at {Numbers.Show(ph.AxisElectricalDegrees, 2)}° electrical";
    }

    /// <summary>Gap figures of the machine: Carter's coefficient and the effective gap.</summary>
    public static IEnumerable<string> Machine(AnalysisResult? a)
    {
        if (a?.Gap is { CarterCoefficient: { } kc, EffectiveGap: { } gap })
            yield return $"Carter's coefficient kC = {Numbers.Show(kc, 4)}; effective gap {Numbers.Show(gap * 1000, 3)} mm";
    }

    private static string Wave(BalancedWave w)
    {
        bool forward = w.Forward >= w.Backward;
        double size = Math.Max(w.Forward, w.Backward);
        string direction = Math.Min(w.Forward, w.Backward) > 1e-9 * size ? "both ways" : forward ? "forward" : "backward";
        return $"{Numbers.Show(w.ElectricalOrder, 2)}: {Numbers.Show(100 * size, 2)} % {direction}";
    }
}
