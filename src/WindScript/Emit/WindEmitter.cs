using System.Globalization;
using System.Text;
using WindScript.Syntax;
using WindScript.Model;
using WindScript.Semantics;
using WindScript.Text;

namespace WindScript.Emit;

/// <summary>
/// Writes a <see cref="WindingDesign"/> as canonical .wind text: the form the formatter
/// produces, one fact per line, so that generated files diff cleanly and read back to the same
/// model. A regular winding is written as a slot pattern (<c>top: U -W V ...</c> with
/// <c>pitch N slots</c>); any other as explicit <c>coil</c> lines, grouped as in the design.
/// </summary>
/// <remarks>
/// What the text cannot say is reported, not guessed: a double-layer coil with both sides in
/// one layer throws <see cref="NotSupportedException"/>. Names that are not valid words are
/// made valid ("my machine" becomes my_machine). Lengths are written in mm, frequencies in Hz,
/// angles in degrees; numbers to 12 significant digits.
/// </remarks>
public static partial class WindEmitter
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>The design as canonical .wind text (the formatter leaves it unchanged; compiling it gives the same design).</summary>
    public static string Emit(WindingDesign design, EmitOptions? options = null)
    {
        options ??= new EmitOptions();
        var o = new StringBuilder();
        foreach (var line in options.Header) o.Append(line.Length == 0 ? "#" : "# " + line).Append('\n');
        if (options.Header.Length > 0) o.Append('\n');
        var phaseNames = design.Phases.Select(p => SourceNames.Safe(p.Name, $"P{p.Index + 1}")).ToArray();
        WriteMachine(o, design, phaseNames);
        WriteSlotAndConductor(o, design);
        o.Append('\n');
        WriteWinding(o, design, phaseNames, options);
        foreach (var drive in design.Drives)
        {
            o.Append('\n');
            WriteDrive(o, drive, phaseNames);
        }
        return o.ToString();
    }

    private static void WriteMachine(StringBuilder o, WindingDesign d, string[] phases)
    {
        Open(o, BlockKind.Machine, d.Name);
        Line(o, $"{W(PropertyName.Slots)} {d.Slots}");
        Line(o, $"{W(PropertyName.Poles)} {d.Poles}");
        Line(o, $"{Vocabulary.PhasesWord} " + string.Join(" ", phases));
        if (Math.Abs(d.PhaseShiftDegrees - PhaseShift.DefaultDegrees(d.Phases.Length)) > 1e-12)
            Line(o, $"{W(PropertyName.PhaseShift)} {Number(d.PhaseShiftDegrees)} deg");
        var g = d.Geometry;
        void Millimetres(PropertyName property, double? metres) { if (metres is { } v) Line(o, $"{W(property)} {Number(v * 1000)} mm"); }
        Millimetres(PropertyName.Bore, g.BoreDiameter);
        Millimetres(PropertyName.Stack, g.StackLength);
        Millimetres(PropertyName.Gap, g.Gap);
        Millimetres(PropertyName.SlotOpening, g.SlotOpening);
        Millimetres(PropertyName.RotorRadius, g.RotorRadius);
        Millimetres(PropertyName.BackDiameter, g.BackDiameter);
        if (g.RotorOutside) Line(o, $"{Vocabulary.Word(PropertyName.Rotor)} outside");
        if (g.SkewSlots != 0) Line(o, $"{W(PropertyName.Skew)} {Number(g.SkewSlots)} slots");
        if (g.GapFluxDensity is { } b) Line(o, $"{W(PropertyName.GapFluxDensity)} {Number(b)} T");
        o.Append("}\n");
    }

    private static void WriteWinding(StringBuilder o, WindingDesign d, string[] phases, EmitOptions options)
    {
        var w = d.Winding;
        Open(o, BlockKind.Winding, w.Name);
        Line(o, $"{W(PropertyName.Layers)} {w.Layers}");
        var pattern = options.PreferPatterns ? PatternForm.TryCreate(d) : null;
        int turns = pattern?.Turns ?? CommonTurns(w);
        if (w.Coils.Length > 0) Line(o, $"{W(PropertyName.Turns)} {turns}", "per coil");
        if ((pattern?.Pitch ?? w.DeclaredPitch) is { } pitch) Line(o, $"{W(PropertyName.Pitch)} {pitch} slots", PitchComment(d));
        Line(o, $"{W(PropertyName.Paths)} {w.Paths}");
        if (w.DeclaredSeriesTurns is { } n) Line(o, $"{W(PropertyName.SeriesTurns)} {n}");
        if (w.DeclaredConductorsPerSlot is { } z) Line(o, $"{W(PropertyName.ConductorsPerSlot)} {z}");
        if (pattern is not null) WritePattern(o, d, pattern, phases, options.EntriesPerLine);
        else WriteCoils(o, d, phases, turns);
        o.Append("}\n");
    }

    private static string PitchComment(WindingDesign d) => $"pole pitch {FractionText.Of(d.Slots, d.Poles)} slots";

    private static void WritePattern(StringBuilder o, WindingDesign d, PatternForm pattern, string[] phases, int perLine)
    {
        bool single = d.Winding.Layers == 1;
        string keyword = Vocabulary.Word(single ? LayerName.Slots : LayerName.Top) + ":";
        o.Append(Indent(1)).Append(single
            ? "# each + side returns one pitch on as the - side\n"
            : "# go sides in the top layer; each returns one pitch on in the bottom layer\n");
        int q = d.Slots, period = pattern.Period();
        perLine = Math.Max(1, perLine);
        if (period <= perLine)
        {
            var entries = string.Join(" ", pattern.Entries.Take(period).Select(e => Entry(e, phases)));
            Line(o, q / period > 1 ? $"{keyword} {entries} {Vocabulary.Repeat} {q / period}" : $"{keyword} {entries}");
            return;
        }
        int lines = (q + perLine - 1) / perLine, size = (q + lines - 1) / lines;
        for (int from = 0; from < q; from += size)
        {
            int to = Math.Min(q, from + size);
            var entries = string.Join(" ", pattern.Entries[from..to].Select(e => Entry(e, phases)));
            Line(o, $"{keyword} {entries}", $"slots {from + 1}-{to}");
        }
    }

    private static string Entry((int Phase, int Sign) e, string[] phases) =>
        e.Phase < 0 ? Vocabulary.EmptySlot : (e.Sign < 0 ? "-" : "") + phases[e.Phase];

    private static void WriteCoils(StringBuilder o, WindingDesign d, string[] phases, int turns)
    {
        var w = d.Winding;
        foreach (var group in w.Coils.GroupBy(c => c.Group))
        {
            int depth = 1;
            if (group.Key != "")
            {
                o.Append(Indent(1));
                Open(o, BlockKind.Group, group.Key);
                depth = 2;
            }
            foreach (var c in group)
            {
                var text = new StringBuilder(Vocabulary.Coil).Append(' ');
                if (c.Polarity < 0) text.Append('-');
                text.Append(phases[c.Phase]).Append(": ").Append(c.GoSlot.ToString(Inv)).Append(" -> ").Append(c.ReturnSlot.ToString(Inv));
                if (c.Turns != turns) text.Append(' ').Append(W(PropertyName.Turns)).Append(' ').Append(c.Turns.ToString(Inv));
                text.Append(LayerClause(c, w.Layers));
                o.Append(Indent(depth)).Append(text).Append('\n');
            }
            if (depth == 2) o.Append(Indent(1)).Append("}\n");
        }
    }

    private static string LayerClause(Coil c, int layers)
    {
        if (layers == 1)
        {
            if (c.GoLayer == 0 && c.ReturnLayer == 0) return "";
        }
        else
        {
            if (c.GoLayer == 0 && c.ReturnLayer == 1) return "";
            if (c.GoLayer == 1 && c.ReturnLayer == 0) return $" {Vocabulary.Layer} {Vocabulary.Word(LayerName.Bottom)}";
        }
        throw new NotSupportedException(
            $"coil {c.GoSlot} -> {c.ReturnSlot} has its sides in layers {c.GoLayer} and {c.ReturnLayer} of a {layers}-layer winding, which the language cannot write");
    }

    // The turn count most coils share (ties: the smaller), written once as the winding's 'turns'.
    private static int CommonTurns(Winding w) =>
        w.Coils.Length == 0 ? 1 : w.Coils.GroupBy(c => c.Turns).OrderByDescending(g => g.Count()).ThenBy(g => g.Key).First().Key;

    private static void WriteDrive(StringBuilder o, Drive drive, string[] phases)
    {
        Open(o, BlockKind.Drive, drive.Name);
        if (drive.Neutral) Line(o, Vocabulary.Neutral);
        if (drive.CurrentAngle is { } angle) Line(o, $"{W(PropertyName.CurrentAngle)} {Number(angle * 180 / Math.PI)} deg");
        foreach (var current in drive.Currents)
        {
            if (current.Components.IsDefaultOrEmpty || current.Phase < 0 || current.Phase >= phases.Length) continue;
            Line(o, $"{phases[current.Phase]} = " + string.Join(" + ", current.Components.Select(Term)));
        }
        o.Append("}\n");
    }

    private static string Term(CurrentComponent c) => c.IsDirect
        ? $"{Vocabulary.Dc} {Number(c.Peak)} A"
        : $"{Vocabulary.Sine} {Number(c.Peak)} A {Vocabulary.Word(AmplitudeMeasure.Peak)} {Vocabulary.At} {Number(c.Omega / (2 * Math.PI))} Hz {Vocabulary.Phase} {Number(c.PhaseAngle * 180 / Math.PI)} deg";

    private static string W(PropertyName property) => Vocabulary.Word(property);

    // "machine NAME {": the block word, and the name made safe to read back.
    private static void Open(StringBuilder o, BlockKind kind, string name)
    {
        string word = Vocabulary.Word(kind);
        o.Append(word).Append(' ').Append(SourceNames.Safe(name, word)).Append(" {\n");
    }

    /// <summary>A number as the language reads it: invariant culture, 12 significant digits, no noise digits.</summary>
    public static string Number(double value)
    {
        if (value == 0) return "0";
        var text = value.ToString("G12", Inv);
        return text.Contains('E') ? text.Replace("E+", "e").Replace("E-", "e-") : text;
    }

    private static void Line(StringBuilder o, string text, string? comment = null)
    {
        o.Append(Indent(1)).Append(text);
        if (comment is not null) o.Append("  # ").Append(comment);
        o.Append('\n');
    }

    private static string Indent(int depth) => depth == 1 ? "  " : "    ";
}
