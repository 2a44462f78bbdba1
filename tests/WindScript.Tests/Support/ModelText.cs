using System.Globalization;
using System.Text;
using WindScript.Model;

namespace WindScript.Tests.Support;

/// <summary>A complete, order-stable text form of an evaluated design, for comparing two models.</summary>
public static class ModelText
{
    public static string Describe(WindingDesign d)
    {
        var inv = CultureInfo.InvariantCulture;
        var sb = new StringBuilder();
        sb.AppendLine($"{d.Name} Q={d.Slots} 2p={d.Poles} phases={string.Join(",", d.Phases.Select(p => p.Name))} shift={d.PhaseShiftDegrees.ToString("R", inv)}");
        var g = d.Geometry;
        sb.AppendLine($"geometry {g.BoreDiameter} {g.StackLength} {g.Gap} {g.SlotOpening} {g.RotorRadius} {g.SkewSlots} {g.GapFluxDensity}");
        var w = d.Winding;
        sb.AppendLine($"winding {w.Name} layers={w.Layers} paths={w.Paths} pitch={w.DeclaredPitch} series={w.DeclaredSeriesTurns} cps={w.DeclaredConductorsPerSlot}");
        foreach (var c in w.Coils)
            sb.AppendLine($"coil {c.Phase} {c.GoSlot}->{c.ReturnSlot} L{c.GoLayer}/{c.ReturnLayer} n={c.Turns} pol={c.Polarity} g={c.Group}");
        foreach (var drive in d.Drives)
        {
            sb.AppendLine($"drive {drive.Name} neutral={drive.Neutral} seq={string.Join(",", drive.Sequence)}");
            foreach (var pc in drive.Currents)
                foreach (var comp in pc.Components)
                    sb.AppendLine($"  {pc.Phase}: {comp.Peak.ToString("R", inv)} {comp.Omega.ToString("R", inv)} {comp.PhaseAngle.ToString("R", inv)}");
        }
        foreach (var text in d.Defaults) sb.AppendLine("default " + text);
        return sb.ToString();
    }
}
