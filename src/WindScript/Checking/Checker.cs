using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Syntax;

namespace WindScript.Checking;

/// <summary>
/// The physical checks: layout, turns, paths, balance, harmonic content, drives and geometry.
/// They run on the evaluated design (so on whatever part of a broken file evaluated). Each
/// stage judges a whole winding, so it runs only if the stages before it found no error: a
/// dropped or doubled coil would otherwise make every later figure look wrong too.
/// </summary>
internal static class Checker
{
    public static IReadOnlyList<Diagnostic> Check(WindingDesign design, SyntaxTree? syntax = null, bool sourceHasErrors = false)
    {
        var c = new CheckContext(design, syntax);
        GeometryChecks.Run(c);
        TurnCountChecks.Run(c);
        bool sound = Clean(c, FeasibilityCheck.Run);
        // Two sides in one place is wrong whatever else is broken: this check is local.
        sound = Clean(c, LayoutChecks.Run) && sound && !sourceHasErrors && c.EveryPhaseWound;
        // A reversed coil is the usual root cause of an unbalanced phase: name it, not the imbalance.
        sound = sound && Quiet(c, OpposingCoilCheck.Run);
        sound = sound && Clean(c, PhaseBalanceChecks.Run) && Clean(c, ParallelPathChecks.Run);
        if (sound) HarmonicContentChecks.Run(c);
        DriveChecks.Run(c, windingChecked: sound);
        return c.Diagnostics.Items;
    }

    private static bool Quiet(CheckContext c, Action<CheckContext> check)
    {
        int before = c.Diagnostics.Items.Count;
        check(c);
        return c.Diagnostics.Items.Count == before;
    }

    private static bool Clean(CheckContext c, Action<CheckContext> check)
    {
        int before = c.Diagnostics.Items.Count(d => d.Severity == Severity.Error);
        check(c);
        return c.Diagnostics.Items.Count(d => d.Severity == Severity.Error) == before;
    }
}
