using System.Globalization;
using WindScript.Analysis;

namespace WindScript.Cli.Output;

/// <summary>
/// <c>eval --format csv</c>: one row per harmonic, for spreadsheets. Rows of kind "phase" carry
/// winding factors, "balanced" the waves of balanced unit currents relative to the working wave,
/// "drive" the travelling waves of a drive; columns that do not apply stay empty. Conductor and slot
/// figures are rows of kind "slot", "resistance", "inductance" and "conductorDrive" with the last three
/// columns: the figure's name (as in JSON), its value in SI and its unit.
/// </summary>
public static class EvalCsv
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public const string Header =
        "kind,name,order,electricalOrder,windingFactor,distributionFactor,pitchFactor,skewFactor,mmfPerAmpere,frequencyHz,forward,backward,standing,speedRpm,waveKind,figure,value,unit";

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
        if (r.Conductors is { } c) WriteConductors(o, c);
    }

    private static void WriteConductors(TextWriter o, Analysis.Conductors.ConductorFigures c)
    {
        void Figure(string kind, string name, string figure, double? value, string unit)
        {
            if (value is not { } v) return;
            o.WriteLine($"{kind},{Quote(name)},,,,,,,,,,,,,,{figure},{v.ToString("R", Inv)},{unit}");
        }
        if (c.Fill is { } f)
        {
            Figure("slot", f.Shape, "grossArea", f.GrossArea, "m2");
            Figure("slot", f.Shape, "netArea", f.NetArea, "m2");
            Figure("slot", f.Shape, "strandsPerSlot", f.StrandsPerSlot, "");
            Figure("slot", f.Shape, "copperArea", f.CopperArea, "m2");
            Figure("slot", f.Shape, "insulatedArea", f.InsulatedArea, "m2");
            Figure("slot", f.Shape, "grossFill", f.GrossFill, "");
            Figure("slot", f.Shape, "netFill", f.NetFill, "");
            Figure("slot", f.Shape, "fillLimit", f.FillLimit, "");
        }
        if (c.Resistance is { } r)
        {
            Figure("resistance", "", "temperature", r.Temperature, "degC");
            Figure("resistance", "", "endLength", r.EndLength, "m");
            Figure("resistance", "", "mass", r.Mass, "kg");
            foreach (var p in r.Phases)
            {
                Figure("resistance", p.Name, "meanTurnLength", p.MeanTurnLength, "m");
                Figure("resistance", p.Name, "resistance20", p.Resistance20, "ohm");
                Figure("resistance", p.Name, "resistanceAtTemperature", p.ResistanceHot, "ohm");
            }
        }
        if (c.Inductances is { } l)
        {
            Figure("inductance", "", "magnetising", l.Magnetising, "H");
            Figure("inductance", "", "slotLeakage", l.SlotLeakage, "H");
            Figure("inductance", "", "toothTipLeakage", l.ToothTipLeakage, "H");
            Figure("inductance", "", "endWindingLeakage", l.EndWindingLeakage, "H");
            Figure("inductance", "", "skewLeakage", l.SkewLeakage, "H");
            Figure("inductance", "", "differentialLeakage", l.DifferentialLeakageInductance, "H");
            Figure("inductance", "", "totalLeakage", l.TotalLeakage, "H");
            Figure("inductance", "", "completeSynchronous", l.CompleteSynchronous, "H");
        }
        Figure("inductance", "", "torqueConstant", c.TorqueConstant, "N m/A");
        foreach (var d in c.Drives)
        {
            Figure("conductorDrive", d.Name, "phaseCurrentRms", d.PhaseCurrentRms, "A");
            Figure("conductorDrive", d.Name, "currentDensity", d.CurrentDensity, "A/m2");
            Figure("conductorDrive", d.Name, "copperLoss", d.CopperLoss, "W");
            Figure("conductorDrive", d.Name, "synchronousReactance", d.SynchronousReactance, "ohm");
            Figure("conductorDrive", d.Name, "torque", d.Torque, "N m");
        }
    }

    private static void Line(TextWriter o, string kind, string name, int order, double electrical, params object?[] rest)
    {
        o.Write($"{kind},{Quote(name)},{order.ToString(Inv)},{electrical.ToString("R", Inv)}");
        foreach (var value in rest)
            o.Write("," + value switch { double d => d.ToString("R", Inv), string s => Quote(s), _ => "" });
        o.WriteLine(",,,"); // figure, value, unit: conductor rows only
    }

    private static string Quote(string s) => s.IndexOfAny([',', '"', '\n']) < 0 ? s : "\"" + s.Replace("\"", "\"\"") + "\"";
}
