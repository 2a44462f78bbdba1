using System.Collections.Immutable;
using System.Globalization;
using WindScript.Analysis;
using WindScript.Model;
using WindScript.Text;

namespace WindScript.Synthesis;

/// <summary>The comment lines a synthesised file starts with: what it is, where the method comes from, its key figures.</summary>
public static class SynthesisHeader
{
    /// <summary>Comment lines that describe a synthesis (counts, pitch, sections), for the top of the emitted file.</summary>
    public static ImmutableArray<string> Lines(SynthesisResult result)
    {
        if (result.Design is not { } d) return [];
        var inv = CultureInfo.InvariantCulture;
        int q = d.Slots, poles = d.Poles, m = d.Phases.Length;
        var factors = new double[d.PolePairs];
        WindingFactors.Compute(d.Conductors, 0, 0, factors);
        string layers = d.Winding.Layers == 2 ? "double layer" : "single layer";
        string paths = result.Sections == 1 ? "1 parallel path at most" : $"parallel paths dividing {result.Sections}";
        return
        [
            $"{q} slots, {poles} poles, {m} phase{(m == 1 ? "" : "s")}, {layers}, coil pitch {result.Pitch} slot{(result.Pitch == 1 ? "" : "s")}:",
            "a balanced winding laid out by the star of slots (N. Bianchi, M. Dai Pre,",
            "IEE Proc. Electr. Power Appl., 2006).",
            $"q = {FractionText.Of(q, poles * m)} slots per pole per phase; periodicity t = gcd(Q, p) = {d.Periodicity};",
            $"cogging order lcm(Q, 2p) = {WindScript.Numerics.IntegerMath.Lcm(q, poles)}; fundamental winding factor {factors[d.PolePairs - 1].ToString("0.0000", inv)};",
            $"{result.Sections} identical section{(result.Sections == 1 ? "" : "s")}, so {paths}.",
            "An idealised analysis aid: verify by finite-element analysis and test before build.",
        ];
    }
}
