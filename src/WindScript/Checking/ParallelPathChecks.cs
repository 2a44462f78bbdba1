using WindScript.Diagnostics;

namespace WindScript.Checking;

/// <summary>Parallel paths: they must split each phase into equal sections with equal EMF phasors.</summary>
internal static class ParallelPathChecks
{
    public static void Run(CheckContext c)
    {
        var w = c.Design.Winding;
        int a = w.Paths;
        if (a <= 1) return;
        var at = w.PathsSpan != default ? w.PathsSpan : PhaseBalanceChecks.WindingKeyword(c);
        for (int k = 0; k < c.PhaseCount; k++)
        {
            int coils = w.Coils.Count(coil => coil.Phase == k);
            if (coils % a != 0)
            {
                c.Diagnostics.Add(DiagnosticCatalog.PathsDoNotDivideCoils, at,
                    $"phase {c.PhaseName(k)} has {coils} coils, which {a} parallel paths cannot share equally");
                return;
            }
        }
        var symmetry = c.Symmetry;
        int sections = symmetry.WindingPeriodicity * (symmetry.HalfPeriodReversal ? 2 : 1);
        if (sections % a != 0)
            c.Diagnostics.Add(DiagnosticCatalog.PathsUnequalEmf, at,
                $"{a} parallel paths need {a} identical sections of each phase, but the layout has {sections} " +
                $"(periodicity {symmetry.WindingPeriodicity}{(symmetry.HalfPeriodReversal ? ", reversed every half period" : "")}); the paths' EMFs would differ");
    }
}
