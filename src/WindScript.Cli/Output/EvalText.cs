using System.Globalization;
using WindScript.Model;
using WindScript.Text;

namespace WindScript.Cli.Output;

/// <summary>The people-readable summary of an evaluated design (machine, phases, turns, slot layout).</summary>
public static class EvalText
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    // Four decimals, or three significant digits for a small value (q = 1/25000 is 0.00004, never "0").
    private static string Decimal(double v) =>
        Math.Round(v, 4) != 0 || v == 0 ? v.ToString("0.####", Inv) : double.Parse(v.ToString("G3", Inv), Inv).ToString("0.#################", Inv);

    public static void WriteSummary(TextWriter o, WindingDesign d)
    {
        o.WriteLine($"machine {d.Name}");
        o.WriteLine($"  slots Q            {d.Slots}");
        o.WriteLine($"  poles 2p           {d.Poles}");
        o.WriteLine($"  phases m           {d.Phases.Length} ({string.Join(" ", d.Phases.Select(p => p.Name))})");
        o.WriteLine($"  phase shift        {d.PhaseShiftDegrees.ToString("0.###", Inv)} deg electrical");
        double q = (double)d.Slots / (d.Poles * d.Phases.Length);
        o.WriteLine($"  slots/pole/phase q {FractionText.Of(d.Slots, d.Poles * d.Phases.Length)}{(q % 1 == 0 ? "" : $" = {Decimal(q)}")}");
        WriteGeometry(o, d.Geometry, d.Slots);
        o.WriteLine();
        var w = d.Winding;
        o.WriteLine($"winding {w.Name}");
        o.WriteLine($"  layers             {w.Layers}");
        o.WriteLine($"  coils              {w.Coils.Length}");
        o.WriteLine($"  parallel paths     {w.Paths}");
        var pitches = w.Coils.Select(c => c.PitchSlots(d.Slots)).Distinct().Order().ToArray();
        if (pitches.Length > 0) o.WriteLine($"  coil pitch         {string.Join(", ", pitches)} slot{(pitches.Length == 1 && pitches[0] == 1 ? "" : "s")} (pole pitch {FractionText.Of(d.Slots, d.Poles)} slots)");
        o.WriteLine();
        o.WriteLine("  phase  coils  turns  series turns");
        for (int p = 0; p < d.Phases.Length; p++)
        {
            int coils = w.Coils.Count(c => c.Phase == p);
            o.WriteLine($"  {d.Phases[p].Name,-5}  {coils,5}  {d.TotalTurns(p),5}  {d.SeriesTurns(p).ToString("0.##", Inv),12}");
        }
        o.WriteLine();
        WriteLayout(o, d);
        if (d.Defaults.Length > 0)
        {
            o.WriteLine();
            o.WriteLine("defaults applied");
            foreach (var text in d.Defaults) o.WriteLine($"  {text}");
        }
    }

    private static void WriteGeometry(TextWriter o, Geometry g, int slots)
    {
        void Mm(string name, double? metres) { if (metres is { } v) o.WriteLine($"  {name,-18} {(v * 1000).ToString("0.###", Inv)} mm"); }
        if (g.RotorOutside) o.WriteLine($"  {"rotor",-18} outside (bore = the stator's outer diameter at the gap)");
        Mm("bore diameter", g.BoreDiameter);
        Mm("stack length", g.StackLength);
        Mm("air gap", g.Gap);
        Mm("slot opening", g.SlotOpening);
        Mm("rotor radius", g.RotorRadius);
        Mm("back diameter", g.BackDiameter);
        Mm("slot pitch", g.SlotPitch(slots));
        if (g.SkewSlots != 0) o.WriteLine($"  {"skew",-18} {g.SkewSlots.ToString("0.###", Inv)} slot pitches");
        if (g.GapFluxDensity is { } b) o.WriteLine($"  {"gap flux density",-18} {b.ToString("0.###", Inv)} T (peak, fundamental)");
    }

    /// <summary>The slot layout per layer, in rows of at most 24 slots.</summary>
    public static void WriteLayout(TextWriter o, WindingDesign d)
    {
        var layout = SlotLayout.From(d);
        string[] layerNames = d.Winding.Layers == 1 ? ["slot"] : ["top", "bottom"];
        var labels = new string[layout.Layers, d.Slots];
        int width = 3;
        for (int l = 0; l < layout.Layers; l++)
            for (int s = 1; s <= d.Slots; s++)
                width = Math.Max(width, (labels[l, s - 1] = layout.Label(s, l, d.Phases)).Length);
        width++;
        o.WriteLine("slot layout (+ go side, - return side)");
        const int perRow = 24;
        for (int from = 1; from <= d.Slots; from += perRow)
        {
            int to = Math.Min(d.Slots, from + perRow - 1);
            o.Write($"  {"slot",-7}");
            for (int s = from; s <= to; s++) o.Write(s.ToString(Inv).PadLeft(width));
            o.WriteLine();
            for (int l = 0; l < layout.Layers; l++)
            {
                o.Write($"  {layerNames[l],-7}");
                for (int s = from; s <= to; s++) o.Write(labels[l, s - 1].PadLeft(width));
                o.WriteLine();
            }
        }
    }
}
