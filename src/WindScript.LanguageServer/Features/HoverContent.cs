using WindScript.Analysis;
using WindScript.Model;
using WindScript.Semantics;
using WindScript.Syntax;
using WindScript.Text;

namespace WindScript.LanguageServer.Features;

/// <summary>
/// What hover says about a place: a title (the thing, as written) and lines of evaluated facts
/// with units. The most specific answer wins: a name, a slot-pattern entry, a coil, a value,
/// a property, a waveform, a block, and last a keyword's one-line help.
/// </summary>
public sealed record HoverContent(TextSpan Span, string Title, IReadOnlyList<string> Lines)
{
    public static HoverContent? At(Compilation c, Func<AnalysisResult?> analysis, int offset)
    {
        var path = SyntaxNavigation.PathAt(c.Syntax.Root, offset);
        // A phase written in a coil or pattern is best explained by the coils it makes there.
        if (c.Semantics.SymbolAt(offset) is { } symbol && !(symbol.Kind == SymbolKind.Phase && path.Any(n => n is CoilSyntax or PatternEntrySyntax)))
            return ForSymbol(c, analysis, symbol, offset);
        for (int i = path.Count - 1; i >= 0; i--)
        {
            var answer = path[i] switch
            {
                PatternEntrySyntax entry => ForPatternEntry(c, entry),
                CoilSyntax coil => ForCoil(c, coil),
                PropertySyntax property => ForProperty(c, property, offset),
                ExpressionSyntax expression when path[i - 1] is not (ExpressionSyntax or PropertySyntax) => ForExpression(c, expression),
                SineTermSyntax or DcTermSyntax or PhaseCurrentSyntax or BalancedSyntax => ForDriveStatement(c, path, i),
                BlockSyntax block when block.Keyword.Span.Contains(offset) || block.Keyword.Span.End == offset => ForBlock(c, analysis, block),
                _ => null,
            };
            if (answer is not null) return answer;
        }
        return ForKeyword(c, offset);
    }

    // ---- names ---------------------------------------------------------------------------------

    private static HoverContent? ForSymbol(Compilation c, Func<AnalysisResult?> analysis, Symbol symbol, int offset)
    {
        var span = symbol.Definition.Contains(offset) || symbol.Definition.End == offset
            ? symbol.Definition
            : symbol.References.First(r => r.Contains(offset) || r.End == offset);
        var design = c.Design;
        switch (symbol.Kind)
        {
            case SymbolKind.Value:
                var let = SyntaxNavigation.Innermost<LetSyntax>(c.Syntax.Root, symbol.Definition.Start);
                var lines = new List<string>();
                if (symbol.Value is { } q) lines.Add($"value: {q}" + (q.Dimension.IsNone ? " (a plain number)" : $" ({q.Dimension.Describe()})"));
                else lines.Add("value: not evaluated (see the diagnostics on its line)");
                lines.Add(symbol.References.Count == 0 ? "never used" : $"used {Times(symbol.References.Count)}");
                return new HoverContent(span, let is null ? $"let {symbol.Name}" : OneLine(c.Source.Slice(let.Span)), lines);

            case SymbolKind.LoopVariable:
                var loop = SyntaxNavigation.Innermost<ForSyntax>(c.Syntax.Root, symbol.Definition.Start);
                return loop is null ? null : ForLoopVariable(c, loop, span);

            case SymbolKind.Phase:
                return ForPhase(c, analysis, symbol.Name, span);

            case SymbolKind.Machine when design is not null:
                return new HoverContent(span, $"machine {design.Name}", MachineFacts(design, analysis()));

            case SymbolKind.Winding when design is not null:
                return new HoverContent(span, $"winding {design.Winding.Name}", WindingFacts(design, analysis()));

            case SymbolKind.Group when design is not null:
                return new HoverContent(span, $"group {symbol.Name}", GroupFacts(design, symbol.Name));

            case SymbolKind.Drive when design is not null:
                var drive = design.Drives.FirstOrDefault(d => d.NameSpan == symbol.Definition);
                return drive is null ? null : new HoverContent(span, $"drive {drive.Name}", DriveFacts(design, drive));

            default:
                return new HoverContent(span, $"{symbol.Kind.ToString().ToLowerInvariant()} {symbol.Name}", ["(the file does not evaluate to a complete machine yet)"]);
        }
    }

    private static HoverContent ForLoopVariable(Compilation c, ForSyntax loop, TextSpan span)
    {
        var headerEnd = (loop.Step ?? loop.To).Span.End;
        var title = OneLine(c.Source.Slice(TextSpan.FromBounds(loop.Span.Start, headerEnd)));
        int slots = c.Design?.Slots ?? 0;
        var from = ExpressionProbe.Evaluate(c.Semantics, loop.From, slots);
        var to = ExpressionProbe.Evaluate(c.Semantics, loop.To, slots);
        var step = loop.Step is null ? Units.Quantity.Plain(1) : ExpressionProbe.Evaluate(c.Semantics, loop.Step, slots);
        var lines = new List<string>();
        if (from is { } a && to is { } b && step is { } s && s.Value != 0)
        {
            long count = Math.Max(0, (long)Math.Floor((b.Value - a.Value) / s.Value) + 1);
            lines.Add($"loop variable: {Numbers.Show(a.Value)}, {Numbers.Show(a.Value + s.Value)}, … up to {Numbers.Show(b.Value)} ({count} pass{(count == 1 ? "" : "es")})");
        }
        else lines.Add("loop variable (its range does not evaluate)");
        return new HoverContent(span, title, lines);
    }

    private static HoverContent ForPhase(Compilation c, Func<AnalysisResult?> analysis, string name, TextSpan span)
    {
        if (c.Design is not { } d || d.Phases.FirstOrDefault(p => p.Name == name) is not { } phase)
            return new HoverContent(span, $"phase {name}", []);
        var coils = d.Winding.Coils.Where(k => k.Phase == phase.Index).ToArray();
        var lines = new List<string>
        {
            $"phase {phase.Index + 1} of {d.Phases.Length}; axis at {Numbers.Show(phase.Index * d.PhaseShiftDegrees, 2)}° electrical (phase shift {Numbers.Show(d.PhaseShiftDegrees, 2)}°)",
            $"{coils.Length} coil{(coils.Length == 1 ? "" : "s")}, {d.TotalTurns(phase.Index)} turns in all",
            $"series turns per phase: {Numbers.Show(d.SeriesTurns(phase.Index), 2)} ({d.Winding.Paths} parallel path{(d.Winding.Paths == 1 ? "" : "s")})",
        };
        lines.AddRange(WindingAnalysisText.Phase(analysis(), d, phase.Index));
        return new HoverContent(span, $"phase {name}", lines);
    }

    // ---- coils ---------------------------------------------------------------------------------

    private static HoverContent? ForCoil(Compilation c, CoilSyntax coil)
    {
        if (c.Design is not { } d) return null;
        var coils = d.Winding.Coils.Where(k => coil.Span.Contains(k.Span) && k.Span.Start == coil.Span.Start).ToArray();
        var title = OneLine(c.Source.Slice(coil.Span));
        if (coils.Length == 0) return new HoverContent(coil.Span, title, ["no coil: this line did not evaluate (see its diagnostics)"]);
        return new HoverContent(coil.Span, title, CoilLines(d, coils));
    }

    private static HoverContent? ForPatternEntry(Compilation c, PatternEntrySyntax entry)
    {
        if (c.Design is not { } d) return null;
        if (entry.Phase is null) return new HoverContent(entry.Span, "_", ["an empty position: no coil side of this group here"]);
        // A go side's coil starts at its entry; a single-layer coil also ends at its return entry.
        var coils = d.Winding.Coils.Where(k => k.Span.Start == entry.Span.Start || k.Span.End == entry.Span.End && k.Span.Length > 0).ToArray();
        var title = (entry.Reversed ? "-" : "") + entry.Phase.Text;
        if (coils.Length == 0)
            return new HoverContent(entry.Span, title, [entry.Reversed ? "a return side (its coil is listed on the go side)" : "no coil: the pattern did not evaluate (see its diagnostics)"]);
        return new HoverContent(entry.Span, title, CoilLines(d, coils));
    }

    private static List<string> CoilLines(WindingDesign d, IReadOnlyList<Coil> coils)
    {
        const int Shown = 8;
        var lines = new List<string>();
        if (coils.Count > 1) lines.Add($"{coils.Count} coils from this line:");
        foreach (var k in coils.Take(Shown)) lines.Add(CoilLine(d, k));
        if (coils.Count > Shown) lines.Add($"… and {coils.Count - Shown} more");
        var turns = coils.GroupBy(k => k.Phase).Select(g => $"{d.Phases[g.Key].Name} {g.Sum(k => k.Turns)}");
        if (coils.Count > 1) lines.Add("turns from this line: " + string.Join(", ", turns));
        return lines;
    }

    private static string CoilLine(WindingDesign d, Coil k)
    {
        string Layer(int layer) => d.Winding.Layers == 1 ? "" : layer == 0 ? " (top)" : " (bottom)";
        int y = k.PitchSlots(d.Slots);
        string phase = (k.Polarity < 0 ? "-" : "+") + d.Phases[k.Phase].Name;
        string group = k.Group.Length > 0 ? $", group {k.Group}" : "";
        return $"coil {phase}: slot {k.GoSlot}{Layer(k.GoLayer)} → slot {k.ReturnSlot}{Layer(k.ReturnLayer)}, {k.Turns} turn{(k.Turns == 1 ? "" : "s")}, " +
               $"pitch {y} slot{(y == 1 ? "" : "s")} ({Numbers.Fraction(y * d.Poles, d.Slots)} of the pole pitch){group}";
    }

    // ---- values and properties -------------------------------------------------------------------

    private static HoverContent? ForExpression(Compilation c, ExpressionSyntax expression)
    {
        if (expression is NumberSyntax { Unit: null }) return null; // a bare number says all there is
        var value = ExpressionProbe.Evaluate(c.Semantics, expression, c.Design?.Slots ?? 0);
        var text = OneLine(c.Source.Slice(expression.Span));
        if (value is not { } q) return new HoverContent(expression.Span, text, ["(depends on a loop variable, or does not evaluate)"]);
        return new HoverContent(expression.Span, text, [$"= {q}" + (q.Dimension.IsNone ? "" : $" ({q.Dimension.Describe()})")]);
    }

    private static HoverContent? ForProperty(Compilation c, PropertySyntax property, int offset)
    {
        var keyword = property.Keyword.Text;
        var title = OneLine(c.Source.Slice(property.Span));
        var lines = new List<string>();
        if (Vocabulary.Help(keyword) is { } help) lines.Add(help);
        var value = ExpressionProbe.Evaluate(c.Semantics, property.Value, c.Design?.Slots ?? 0);
        if (value is { } q && !(property.Value is NumberSyntax { Unit: null })) lines.Add($"= {q}");
        if (c.Design is { } d) lines.AddRange(PropertyFacts(d, property.Property.Name));
        return new HoverContent(property.Span, title, lines);
    }

    private static IEnumerable<string> PropertyFacts(WindingDesign d, PropertyName property)
    {
        int p = d.PolePairs;
        switch (property)
        {
            case PropertyName.Slots:
                yield return $"slot pitch {Numbers.Show(360.0 * p / d.Slots, 3)}° electrical ({Numbers.Show(360.0 / d.Slots, 3)}° mechanical)";
                yield return $"slots per pole and phase q = {Numbers.Fraction(d.Slots, d.Poles * d.Phases.Length)}";
                break;
            case PropertyName.Poles:
                yield return $"{p} pole pair{(p == 1 ? "" : "s")}; pole pitch {Numbers.Fraction(d.Slots, d.Poles)} slots";
                break;
            case PropertyName.Pitch when d.Winding.DeclaredPitch is { } y:
                yield return $"{Numbers.Fraction(y * d.Poles, d.Slots)} of the pole pitch ({Numbers.Fraction(d.Slots, d.Poles)} slots)" +
                             (y * d.Poles < d.Slots ? ": short-pitched" : y * d.Poles == d.Slots ? ": full pitch" : ": long-pitched");
                break;
            case PropertyName.Paths or PropertyName.Turns or PropertyName.SeriesTurns or PropertyName.Layers:
                foreach (var line in SeriesTurns(d)) yield return line;
                break;
            case PropertyName.Bore when d.Geometry.SlotPitch(d.Slots) is { } tau:
                yield return $"slot pitch at the bore {Numbers.Show(tau * 1000, 3)} mm";
                yield return $"pole pitch at the bore {Numbers.Show(Math.PI * d.Geometry.BoreDiameter!.Value / d.Poles * 1000, 2)} mm";
                break;
            case PropertyName.SlotOpening when d.Geometry.SlotOpening is { } b0 && d.Geometry.SlotPitch(d.Slots) is { } pitch:
                yield return $"{Numbers.Show(100 * b0 / pitch, 1)} % of the slot pitch";
                break;
        }
    }

    private static IEnumerable<string> SeriesTurns(WindingDesign d) =>
    [
        "series turns per phase: " + string.Join(", ", d.Phases.Select(ph => $"{ph.Name} {Numbers.Show(d.SeriesTurns(ph.Index), 2)}")) +
        $" ({d.Winding.Paths} parallel path{(d.Winding.Paths == 1 ? "" : "s")})",
    ];

    // ---- blocks --------------------------------------------------------------------------------

    private static HoverContent? ForBlock(Compilation c, Func<AnalysisResult?> analysis, BlockSyntax block)
    {
        var name = block.Name.Text;
        if (c.Design is not { } d) return new HoverContent(block.Keyword.Span, $"{block.Keyword.Text} {name}", [Vocabulary.Help(block.Keyword.Text) ?? ""]);
        var lines = block.Kind switch
        {
            BlockKind.Machine => MachineFacts(d, analysis()),
            BlockKind.Winding => WindingFacts(d, analysis()),
            BlockKind.Group => GroupFacts(d, name),
            BlockKind.Drive when d.Drives.FirstOrDefault(x => x.Span == block.Span) is { } drive => DriveFacts(d, drive),
            _ => [],
        };
        return new HoverContent(block.Keyword.Span, $"{block.Keyword.Text} {name}", lines);
    }

    public static List<string> MachineFacts(WindingDesign d, AnalysisResult? analysis)
    {
        int p = d.PolePairs;
        var lines = new List<string>
        {
            $"Q = {d.Slots} slots, 2p = {d.Poles} poles, m = {d.Phases.Length} phases ({string.Join(" ", d.Phases.Select(x => x.Name))})",
            $"slots per pole and phase q = {Numbers.Fraction(d.Slots, d.Poles * d.Phases.Length)}; pole pitch {Numbers.Fraction(d.Slots, d.Poles)} slots",
            $"slot pitch {Numbers.Show(360.0 * p / d.Slots, 3)}° electrical; periodicity t = gcd(Q, p) = {d.Periodicity}; cogging order lcm(Q, 2p) = {WindScript.Numerics.IntegerMath.Lcm(d.Slots, d.Poles)}",
        };
        var g = d.Geometry;
        var dims = new List<string>();
        if (g.RotorOutside) dims.Add("rotor outside");
        if (g.BoreDiameter is { } bore) dims.Add($"bore {Numbers.Show(bore * 1000, 2)} mm");
        if (g.StackLength is { } stack) dims.Add($"stack {Numbers.Show(stack * 1000, 2)} mm");
        if (g.EffectiveMechanicalGap is { } gap) dims.Add($"gap {Numbers.Show(gap * 1000, 3)} mm");
        if (g.SlotPitch(d.Slots) is { } tau) dims.Add($"slot pitch {Numbers.Show(tau * 1000, 2)} mm");
        if (dims.Count > 0) lines.Add(string.Join(", ", dims));
        lines.AddRange(WindingAnalysisText.Machine(analysis));
        return lines;
    }

    public static List<string> WindingFacts(WindingDesign d, AnalysisResult? analysis)
    {
        var w = d.Winding;
        var lines = new List<string>
        {
            $"{w.Layers} layer{(w.Layers == 1 ? "" : "s")}, {w.Coils.Length} coils, {w.Paths} parallel path{(w.Paths == 1 ? "" : "s")}",
        };
        var pitches = w.Coils.Select(k => k.PitchSlots(d.Slots)).Distinct().Order().ToArray();
        if (pitches.Length > 0)
            lines.Add($"coil pitch {string.Join(", ", pitches)} slot{(pitches is [1] ? "" : "s")} (pole pitch {Numbers.Fraction(d.Slots, d.Poles)} slots)");
        lines.AddRange(SeriesTurns(d));
        lines.AddRange(WindingAnalysisText.Winding(analysis, d));
        return lines;
    }

    private static List<string> GroupFacts(WindingDesign d, string group)
    {
        var coils = d.Winding.Coils.Where(k => k.Group == group).ToArray();
        var lines = new List<string> { $"{coils.Length} coil{(coils.Length == 1 ? "" : "s")}" };
        foreach (var byPhase in coils.GroupBy(k => k.Phase).OrderBy(g => g.Key))
            lines.Add($"{d.Phases[byPhase.Key].Name}: {byPhase.Count()} coils, {byPhase.Sum(k => k.Turns)} turns");
        return lines;
    }

    // ---- drives --------------------------------------------------------------------------------

    private static HoverContent? ForDriveStatement(Compilation c, IReadOnlyList<SyntaxNode> path, int index)
    {
        if (c.Design is not { } d) return null;
        var block = path.Take(index).OfType<BlockSyntax>().LastOrDefault(b => b.Kind == BlockKind.Drive);
        var drive = block is null ? null : d.Drives.FirstOrDefault(x => x.Span == block.Span);
        if (drive is null) return null;
        var node = path[index];
        var statement = path.Take(index + 1).OfType<StatementSyntax>().Last();
        return new HoverContent(node.Span, OneLine(c.Source.Slice(statement.Span)), DriveFacts(d, drive));
    }

    public static List<string> DriveFacts(WindingDesign d, Drive drive)
    {
        var lines = new List<string>();
        foreach (var current in drive.Currents)
        {
            var phase = d.Phases[current.Phase].Name;
            if (current.Components.IsEmpty) { lines.Add($"{phase}: no current"); continue; }
            lines.Add($"{phase}: " + string.Join(" + ", current.Components.Select(Component)));
        }
        if (drive.Sequence.Length > 0) lines.Add("sequence " + string.Join(" ", drive.Sequence.Select(k => d.Phases[k].Name)));
        var omegas = drive.Currents.SelectMany(x => x.Components).Where(x => !x.IsDirect).Select(x => Math.Abs(x.Omega))
            .Distinct().Order().ToArray();
        int p = d.PolePairs;
        foreach (var omega in omegas)
        {
            double mech = omega / p;
            lines.Add($"rotating field at {Numbers.Show(omega / (2 * Math.PI), 3)} Hz: ω/p = {Numbers.Show(mech, 2)} rad/s = {Numbers.Show(mech * 60 / (2 * Math.PI), 2)} rpm mechanical (p = {p})");
        }
        if (omegas.Length == 0 && drive.Currents.Any(x => !x.Components.IsEmpty)) lines.Add("direct current only: a standing field (speed 0)");
        // The gap field at t = 0, with the caution eval and the report give beside it.
        var evaluated = Analysis.MachineAnalysis.Evaluate(d, new Analysis.AnalysisOptions { MaxElectricalOrder = 1 }).Drives.FirstOrDefault(x => x.Name == drive.Name);
        if (evaluated?.PeakField is { } f)
        {
            lines.Add($"peak gap field at t = 0: {Numbers.Show(f.FluxDensity, 3)} T thin gap (Carter), 2-D {Numbers.Show(f.ExactFluxDensityAtRotor, 3)} T at the rotor");
            if (Analysis.FieldCaution.For(f) is { } caution) lines.Add("caution: " + caution);
        }
        return lines;
    }

    private static string Component(CurrentComponent x)
    {
        if (x.IsDirect) return $"{Numbers.Show(x.Peak, 3)} A dc";
        return $"{Numbers.Show(x.Peak, 3)} A peak ({Numbers.Show(x.Peak / Math.Sqrt(2), 3)} A rms) at {Numbers.Show(x.FrequencyHz, 3)} Hz, φ = {Numbers.Degrees(x.PhaseAngle)}";
    }

    // ---- keywords ------------------------------------------------------------------------------

    private static HoverContent? ForKeyword(Compilation c, int offset)
    {
        foreach (var token in c.Syntax.Tokens)
        {
            if (token.Span.Start > offset) break;
            if (token.Kind != TokenKind.Word || !(token.Span.Contains(offset) || token.Span.End == offset)) continue;
            if (Vocabulary.Help(token.Text) is { } help) return new HoverContent(token.Span, token.Text, [help]);
        }
        return null;
    }

    private static string OneLine(string text)
    {
        var line = string.Join(" ", text.Split(['\r', '\n'], StringSplitOptions.RemoveEmptyEntries).Select(s => s.Trim()));
        return line.Length <= 120 ? line : line[..117] + "...";
    }

    private static string Times(int n) => n == 1 ? "once" : $"{n} times";
}
