using System.Globalization;
using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Text;

namespace WindScript.Checking;

/// <summary>
/// Balance: every declared phase wound, equal series turns, equal fundamental winding factors,
/// axes the phase shift apart (Pyrhonen et al., ch. 2), and a working wave at the declared poles
/// (<see cref="WorkingWaveCheck"/>). An unbalanced winding is always an error; where a change to
/// one or two coils restores the balance (<see cref="BalanceRepair"/>), the error names them and
/// offers that change as a fix.
/// </summary>
internal static class PhaseBalanceChecks
{
    private const double AngleToleranceDegrees = 0.01;
    private const int MaxCulprits = 4;

    public static void Run(CheckContext c)
    {
        var d = c.Design;
        var totals = new PhaseTotals(d);
        if (ReportUnwound(c, totals)) return;
        var fault = BalanceRule.Judge(totals.Turns, totals.Phasors, d.PhaseShiftDegrees);
        if (fault == BalanceFault.None) return;
        if (fault == BalanceFault.NoFundamental)
        {
            WorkingWaveCheck.Report(c);
            return;
        }
        var (descriptor, message) = Describe(c, fault);
        var repairs = BalanceRepair.Find(d, totals);
        var diagnostic = descriptor.At(WindingKeyword(c), message);
        if (repairs.Count is > 0 and <= MaxCulprits)
        {
            foreach (var coil in repairs.SelectMany(r => r.Changes).SelectMany(ch => ch.Coils)) c.Culprits.Add(coil);
            var related = repairs.SelectMany(r => r.Changes.Select(ch => new RelatedSpan(ch.First.Span, Role(c, r, ch))))
                .Where(r => r.Span != default).DistinctBy(r => r.Span).ToArray();
            string culprit = repairs.Count == 1
                ? Explain(c, repairs[0], fault)
                : $"one of these changes balances the phases: {string.Join("; ", repairs.Select(r => Explain(c, r, fault)))}";
            diagnostic = diagnostic with { Message = $"{message}; {culprit}", Related = related };
            if (repairs.Count == 1 && Fix(c, repairs[0], descriptor.Code) is { } fix) diagnostic = diagnostic with { Fix = fix };
        }
        c.Diagnostics.Add(diagnostic);
    }

    private static bool ReportUnwound(CheckContext c, PhaseTotals totals)
    {
        var d = c.Design;
        var unwound = Enumerable.Range(0, c.PhaseCount).Where(k => totals.Turns[k] <= 0).ToArray();
        if (unwound.Length == 0) return false;
        if (unwound.Length == c.PhaseCount)
        {
            c.Diagnostics.Add(DiagnosticCatalog.PhaseNotWound, WindingKeyword(c),
                $"winding '{d.Winding.Name}' has no coils: {Names(c, unwound)} {(unwound.Length == 1 ? "is" : "are")} unwound");
            return true;
        }
        var wound = Enumerable.Range(0, c.PhaseCount).Except(unwound).ToArray();
        string others = $"{Names(c, wound)} {(wound.Length == 1 ? "has" : "have")} {TurnCountChecks.Format(d.SeriesTurns(wound[0]))} series turns";
        foreach (int k in unwound)
        {
            var span = d.Phases[k].Span != default ? d.Phases[k].Span : d.PhasesSpan != default ? d.PhasesSpan : WindingKeyword(c);
            c.Diagnostics.Add(DiagnosticCatalog.PhaseNotWound.At(span, $"phase {c.PhaseName(k)} has no coils in winding '{d.Winding.Name}' ({others}): every declared phase must be wound")
                with { Related = [new RelatedSpan(WindingKeyword(c), "the winding")] });
        }
        return true;
    }

    private static (DiagnosticDescriptor, string) Describe(CheckContext c, BalanceFault fault)
    {
        var d = c.Design;
        int p = d.PolePairs;
        string List(Func<int, string> value) => string.Join(", ", Enumerable.Range(0, c.PhaseCount).Select(k => $"{c.PhaseName(k)} {value(k)}"));
        switch (fault)
        {
            case BalanceFault.UnequalTurns:
                return (DiagnosticCatalog.UnequalSeriesTurns, $"the phases have unequal series turns: {List(k => TurnCountChecks.Format(d.SeriesTurns(k)))}");
            case BalanceFault.UnequalFactors:
                return (DiagnosticCatalog.UnequalWindingFactors, $"the phases have unequal fundamental winding factors: {List(k => Factor(c.Spectrum.WindingFactor(k, p)))}");
            default:
                var axes = Enumerable.Range(0, c.PhaseCount).Select(k => Analysis.WindingFactors.AxisElectricalDegrees(c.Spectrum.SlotConductors[k], p)).ToArray();
                return (DiagnosticCatalog.AxesNotEvenlySpaced,
                    $"phase axes relative to {c.PhaseName(0)} are {string.Join(", ", axes.Select((a, k) => $"{c.PhaseName(k)} {Angle(a - axes[0])}"))} electrical; a balanced winding spaces them {Angle(d.PhaseShiftDegrees)} apart");
        }
    }

    /// <summary>Why the change balances the phases, with the numbers of the phase it leaves.</summary>
    private static string Explain(CheckContext c, Repair r, BalanceFault fault)
    {
        var d = c.Design;
        var first = r.Changes[0];
        string what = Written(c, first);
        var repaired = BalanceRepair.Apply(d, r);
        int old = first.First.Phase;
        string written = r.Kind switch
        {
            RepairKind.MovePhase => $"as {c.PhaseName(old)}",
            RepairKind.SetTurns => $"with {first.First.Turns} turns",
            _ => "as written",
        };
        string Effect()
        {
            if (fault == BalanceFault.UnequalTurns)
                return $"{written} it gives {c.PhaseName(old)} {TurnCountChecks.Format(d.SeriesTurns(old))} series turns against {TurnCountChecks.Format(repaired.SeriesTurns(old))}";
            if (fault == BalanceFault.UnequalFactors)
            {
                var after = Analysis.WindingSpectrum.Of(repaired);
                return $"{written} it gives {c.PhaseName(old)} a winding factor of {Factor(c.Spectrum.WindingFactor(old, d.PolePairs))} against {Factor(after.WindingFactor(old, d.PolePairs))}";
            }
            return $"{written} it moves the axis of {c.PhaseName(old)} off the {Angle(d.PhaseShiftDegrees)} spacing";
        }
        bool many = first.Coils.Count > 1;
        return r.Kind switch
        {
            RepairKind.Reverse => $"{what} {(many ? "are" : "is")} reversed, by the winding's symmetry: {Effect()}",
            RepairKind.MovePhase => $"{what} {(many ? "belong" : "belongs")} to {Signed(first.NewPolarity * first.First.Polarity, c.PhaseName(first.NewPhase))} by the winding's symmetry: {Effect()}",
            RepairKind.SetTurns => $"{what} {(many ? "have" : "has")} {first.First.Turns} turns where the other coils have {first.NewTurns}: {Effect()}",
            _ => $"{what} {(many ? "belong" : "belongs")} to {c.PhaseName(first.NewPhase)} and {Written(c, r.Changes[1])} to {c.PhaseName(r.Changes[1].NewPhase)} by the winding's symmetry: exchanging their phases balances the winding",
        };
    }

    private static string Role(CheckContext c, Repair r, CoilChange ch) => r.Kind switch
    {
        RepairKind.Reverse => "this coil is reversed",
        RepairKind.MovePhase => $"this coil belongs to phase {Signed(ch.NewPolarity * ch.First.Polarity, c.PhaseName(ch.NewPhase))}",
        RepairKind.SetTurns => $"this coil should have {ch.NewTurns} turns",
        _ => $"this coil belongs to phase {c.PhaseName(ch.NewPhase)}",
    };

    private static CodeFix? Fix(CheckContext c, Repair r, string code)
    {
        if (c.Syntax is not { } tree || FixVerifier.Verifying) return null;
        if (RepairEdits.For(tree, r, c.PhaseName) is not { } edits) return null;
        var first = r.Changes[0];
        string title = r.Kind switch
        {
            RepairKind.Reverse => "Reverse the coil",
            RepairKind.MovePhase => first.NewPolarity == first.First.Polarity
                ? $"Move the coil to phase {c.PhaseName(first.NewPhase)}"
                : $"Move the coil to phase {c.PhaseName(first.NewPhase)} and reverse it",
            RepairKind.SetTurns => $"Give the coil {first.NewTurns} turns",
            _ => "Exchange the phases of the two coils",
        };
        return FixVerifier.Repairs(c, tree, edits, d => d.Code == code) ? new CodeFix(title, edits) : null;
    }

    /// <summary>"coil 9 -> 10 on line 20", or "the 4 coils written on line 11" for a line that writes several.</summary>
    private static string Written(CheckContext c, CoilChange change)
    {
        var coil = change.First;
        string line = c.Syntax is { } tree && coil.Span != default ? $" on line {tree.Source.GetPosition(coil.Span.Start).Line + 1}" : "";
        return change.Coils.Count == 1
            ? $"coil {coil.GoSlot} -> {coil.ReturnSlot}{line}"
            : $"the {change.Coils.Count} coils written{line}";
    }

    private static string Names(CheckContext c, int[] phases)
    {
        var names = phases.Select(c.PhaseName).ToArray();
        return names.Length == 1 ? names[0] : $"{string.Join(", ", names[..^1])} and {names[^1]}";
    }

    private static string Signed(int sign, string name) => (sign < 0 ? "-" : "") + name;

    internal static string Factor(double v) => v.ToString("0.0000", CultureInfo.InvariantCulture);

    /// <summary>
    /// +1 if each phase's axis lies the phase shift ahead of the previous one in the slot-numbering
    /// direction, -1 if behind, null if the axes are not evenly spaced either way.
    /// </summary>
    public static int? WindingDirection(ReadOnlySpan<double> axes, double shiftDegrees)
    {
        foreach (int sign in new[] { 1, -1 })
        {
            bool ok = true;
            for (int k = 1; k < axes.Length && ok; k++)
                ok = AngleDistance(axes[k] - axes[0], sign * k * shiftDegrees) < AngleToleranceDegrees;
            if (ok) return sign;
        }
        return null;
    }

    private static double AngleDistance(double a, double b)
    {
        double d = ((a - b) % 360 + 360) % 360;
        return Math.Min(d, 360 - d);
    }

    internal static string Angle(double degrees)
    {
        double d = ((degrees % 360) + 360) % 360;
        if (d > 180) d -= 360;
        return d.ToString("0.##", CultureInfo.InvariantCulture) + " deg";
    }

    internal static TextSpan WindingKeyword(CheckContext c) => c.Design.Winding.KeywordSpan;
}
