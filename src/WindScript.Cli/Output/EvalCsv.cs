using System.Globalization;
using WindScript.Analysis;

namespace WindScript.Cli.Output;

/// <summary>
/// <c>eval --format csv</c>: one row per harmonic, for spreadsheets. Rows of kind "phase" carry
/// winding factors, "balanced" the waves of balanced unit currents relative to the working wave,
/// "drive" the travelling waves of a drive; columns that do not apply stay empty.
/// </summary>
public static class EvalCsv
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public const string Header =
        "kind,name,order,electricalOrder,windingFactor,distributionFactor,pitchFactor,skewFactor,mmfPerAmpere,frequencyHz,forward,backward,standing,speedRpm,waveKind";

    public static void Write(TextWriter o, AnalysisResult r)
    {
        o.WriteLine(Header);
        foreach (var p in r.Phases)
            foreach (var h in p.Harmonics)
                Line(o, "phase", p.Name, h.Order, h.ElectricalOrder, h.WindingFactor, h.DistributionFactor, h.PitchFactor, h.SkewFactor, h.MmfPerAmpere,
                    null, null, null, null, null, "");
        foreach (var w in r.Balanced.Waves)
            Line(o, "balanced", "", w.Order, w.ElectricalOrder, null, null, null, null, null, null, w.Forward, w.Backward, null, null, "");
        foreach (var d in r.Drives)
            foreach (var w in d.Harmonics)
                Line(o, "drive", d.Name, w.Order, w.ElectricalOrder, null, null, null, null, null, w.FrequencyHz, w.Forward, w.Backward, w.Standing,
                    w.SpeedRpm, w.Kind.ToString().ToLowerInvariant());
    }

    private static void Line(TextWriter o, string kind, string name, int order, double electrical, params object?[] rest)
    {
        o.Write($"{kind},{Quote(name)},{order.ToString(Inv)},{electrical.ToString("R", Inv)}");
        foreach (var value in rest)
            o.Write("," + value switch { double d => d.ToString("R", Inv), string s => Quote(s), _ => "" });
        o.WriteLine();
    }

    private static string Quote(string s) => s.IndexOfAny([',', '"', '\n']) < 0 ? s : "\"" + s.Replace("\"", "\"\"") + "\"";
}
