using WindScript.Analysis;
using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Syntax;

namespace WindScript.Checking;

/// <summary>
/// The physical checks: layout, turns, paths, balance, harmonic content, drives and geometry.
/// They run on the evaluated design (so on whatever part of a broken file evaluated). Each
/// stage judges a whole winding, so it runs only if the stages before it found no error (a
/// dropped or doubled coil would otherwise make every later figure look wrong too); warnings
/// never stop a stage.
/// </summary>
internal static class Checker
{
    public static IReadOnlyList<Diagnostic> Check(WindingDesign design, SyntaxTree? syntax = null, bool sourceHasErrors = false)
    {
        var c = new CheckContext(design, syntax);
        GeometryChecks.Run(c);
        // Conductors and slots (#15): local to the slot and wire; they gate no other stage.
        ConductorChecks.Run(c);
        TurnCountChecks.Run(c);
        DeclaredPitchCheck.Run(c);
        bool admitted = Clean(c, FeasibilityCheck.Run);
        // Two sides in one place is wrong whatever else is broken: this check is local.
        bool placed = Clean(c, LayoutChecks.Run);
        bool complete = admitted && placed && !sourceHasErrors;
        // Only errors gate a stage: a warning never hides an error behind it.
        bool sound = complete && Clean(c, PhaseBalanceChecks.Run);
        // A warning about single coils; the coils a balance error already named are skipped.
        if (complete) OpposingCoilCheck.Run(c);
        sound = sound && Clean(c, ParallelPathChecks.Run);
        if (sound) HarmonicContentChecks.Run(c);
        DriveChecks.Run(c, windingChecked: sound);
        return c.Diagnostics.Items;
    }

    private static bool Clean(CheckContext c, Action<CheckContext> check)
    {
        int before = c.Diagnostics.Items.Count(d => d.Severity == Severity.Error);
        check(c);
        return c.Diagnostics.Items.Count(d => d.Severity == Severity.Error) == before;
    }
}
