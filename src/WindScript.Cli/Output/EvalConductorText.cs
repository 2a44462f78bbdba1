using System.Globalization;
using WindScript.Analysis.Conductors;

namespace WindScript.Cli.Output;

/// <summary>
/// The conductor and slot figures of <c>eval</c> for people: slot fill, resistance, mass, the
/// complete per-phase inductances, and per drive the current density, copper loss, reactance and
/// torque. Units: mm, mm2, ohm, kg, mH, W, A/mm2, N m (the same in JSON field names and CSV headers).
/// </summary>
public static class EvalConductorText
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static void Write(TextWriter o, ConductorFigures c)
    {
        o.WriteLine();
        o.WriteLine("conductors and slots");
        if (c.Fill is { } f)
        {
            Row(o, "slot shape", f.Shape);
            Row(o, "slot area", $"gross {G(f.GrossArea * 1e6)} mm2, net {G(f.NetArea * 1e6)} mm2 (inside liner and separator)");
            Row(o, "strands per slot", $"{f.StrandsPerSlot} (fullest slot), each {G(f.StrandCopperArea * 1e6)} mm2 copper, {G(f.StrandInsulatedArea * 1e6)} mm2 insulated");
            Row(o, "copper / insulated area", $"{G(f.CopperArea * 1e6)} mm2 / {G(f.InsulatedArea * 1e6)} mm2");
            Row(o, "fill factor", $"gross {F(f.GrossFill, 3)} (copper / gross area), net {F(f.NetFill, 3)} (insulated / net area); limit {F(f.FillLimit, 3)}, packing limit {F(f.PackingLimit, 4)}");
            if (f.Opening is { } b1) Row(o, "slot opening", $"{G(b1 * 1e3)} mm; strand {G(f.StrandWidth * 1e3)} mm insulated");
        }
        if (c.Resistance is { } r)
        {
            Row(o, "material", $"{r.Material}, {G(r.Resistivity20 * 1e6)} ohm mm2/m at 20 degC, {G(r.ResistivityHot * 1e6)} at {G(r.Temperature)} degC");
            Row(o, "coil end length", $"{G(r.EndLength * 1e3)} mm (one end, mean over coils)");
            Row(o, "conductor mass", $"{G(r.Mass)} kg");
            o.WriteLine($"  {"phase",-6} {"MLT mm",10} {"length m",10} {"R20 ohm",10} {"R ohm",10}  (R at {G(r.Temperature)} degC)");
            foreach (var p in r.Phases)
                o.WriteLine($"  {p.Name,-6} {G(p.MeanTurnLength * 1e3),10} {G(p.ConductorLength),10} {G(p.Resistance20),10} {G(p.ResistanceHot),10}");
        }
        if (c.Inductances is { } l)
        {
            o.WriteLine("  per-phase inductances, mH (balanced currents)");
            Row(o, "  magnetising", Mh(l.Magnetising));
            Row(o, "  slot leakage", Mh(l.SlotLeakage) + (l.SlotPermeance is { } lu ? $" (permeance factor {F(lu, 4)})" : ""));
            Row(o, "  tooth-tip leakage", Mh(l.ToothTipLeakage) + (l.ToothTipPermeance is { } ld ? $" (permeance factor {F(ld, 4)})" : ""));
            Row(o, "  end-winding leakage", Mh(l.EndWindingLeakage));
            Row(o, "  skew leakage", Mh(l.SkewLeakage));
            Row(o, "  differential leakage", Mh(l.DifferentialLeakageInductance, " (coefficient x magnetising)"));
            Row(o, "  total leakage", Mh(l.TotalLeakage));
            Row(o, "  complete synchronous", Mh(l.CompleteSynchronous, " (magnetising + total leakage)"));
        }
        if (c.TorqueConstant is { } kt) Row(o, "torque constant", $"{G(kt)} N m/A rms (per phase current)");
        if (c.Drives.Length > 0)
        {
            o.WriteLine($"  {"drive",-14} {"f Hz",8} {"I rms A",9} {"J A/mm2",9} {"loss W",10} {"X_s ohm",9} {"angle deg",9} {"torque N m",11}");
            foreach (var d in c.Drives)
                o.WriteLine($"  {d.Name,-14} {Opt(d.FrequencyHz),8} {G(d.PhaseCurrentRms),9} {Opt(d.CurrentDensity / 1e6),9} {Opt(d.CopperLoss),10} {Opt(d.SynchronousReactance),9} {G(d.CurrentAngleDegrees),9} {Opt(d.Torque),11}");
        }
        o.WriteLine("  sources");
        foreach (var s in c.Sources) o.WriteLine($"    - {s}");
        if (c.Notes.Length > 0)
        {
            o.WriteLine("  notes");
            foreach (var n in c.Notes) o.WriteLine($"    - {n}");
        }
    }

    private static string Mh(double? henry, string note = "") => henry is { } h ? G(h * 1e3) + note : "- (inputs missing, see notes)";
    private static void Row(TextWriter o, string name, string value) => o.WriteLine($"  {name,-24} {value}");
    private static string F(double v, int decimals) => v.ToString("F" + decimals, Inv);
    private static string G(double v) => (Math.Abs(v) < 1e-12 ? 0 : v).ToString("G5", Inv);
    private static string Opt(double? v) => v is { } x ? G(x) : "-";
}
