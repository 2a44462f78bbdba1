using System.Globalization;
using WindScript.Diagnostics;

namespace WindScript.Checking;

/// <summary>Declared series turns and conductors per slot against what the coils give.</summary>
internal static class TurnCountChecks
{
    public static void Run(CheckContext c)
    {
        var d = c.Design;
        var w = d.Winding;
        if (w.DeclaredSeriesTurns is { } declared)
        {
            var actual = Enumerable.Range(0, c.PhaseCount).Select(d.SeriesTurns).ToArray();
            if (actual.Any(n => Math.Abs(n - declared) > 1e-9))
            {
                string list = string.Join(", ", actual.Select((n, k) => $"{c.PhaseName(k)} {Format(n)}"));
                var diagnostic = DiagnosticCatalog.SeriesTurnsMismatch.At(w.SeriesTurnsSpan,
                    $"series_turns says {declared}, but the coils give {list} (turns of the phase's coils / {w.Paths} path{(w.Paths == 1 ? "" : "s")})");
                // One obvious fix: every phase agrees on a whole number.
                if (actual.Distinct().Count() == 1 && actual[0] % 1 == 0 && c.Syntax is not null)
                    diagnostic = diagnostic with { Fix = SourceEdits.ReplaceValue(c.Syntax, w.SeriesTurnsSpan, Format(actual[0]), $"Set series_turns to {Format(actual[0])}") };
                c.Diagnostics.Add(diagnostic);
            }
        }
        if (w.DeclaredConductorsPerSlot is { } perSlot)
        {
            var m = d.Conductors;
            var counts = new int[d.Slots];
            for (int s = 0; s < d.Slots; s++)
                for (int l = 0; l < m.Layers; l++)
                    for (int p = 0; p < m.Phases; p++)
                        counts[s] += Math.Abs(m[p, s, l]);
            var wrong = Enumerable.Range(1, d.Slots).Where(s => counts[s - 1] != perSlot).ToArray();
            if (wrong.Length > 0)
            {
                var diagnostic = DiagnosticCatalog.ConductorsPerSlotMismatch.At(w.ConductorsPerSlotSpan,
                    $"conductors_per_slot says {perSlot}, but {Slots(wrong)} hold{(wrong.Length == 1 ? "s" : "")} {string.Join(", ", wrong.Select(s => counts[s - 1]).Distinct())}");
                if (counts.Distinct().Count() == 1 && c.Syntax is not null)
                    diagnostic = diagnostic with { Fix = SourceEdits.ReplaceValue(c.Syntax, w.ConductorsPerSlotSpan, counts[0].ToString(CultureInfo.InvariantCulture), $"Set conductors_per_slot to {counts[0]}") };
                c.Diagnostics.Add(diagnostic);
            }
        }
    }

    private static string Slots(int[] slots) =>
        slots.Length == 1 ? $"slot {slots[0]}" : slots.Length <= 6 ? $"slots {string.Join(", ", slots)}" : $"{slots.Length} slots (first {slots[0]})";

    internal static string Format(double v) => v.ToString("0.###", CultureInfo.InvariantCulture);
}
