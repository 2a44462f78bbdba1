using System.Globalization;
using System.Numerics;
using WindScript.Analysis;
using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Syntax;

namespace WindScript.Checking;

/// <summary>Drives: Kirchhoff without a neutral, balanced amplitudes and frequencies, and the direction of rotation.</summary>
internal static class DriveChecks
{
    public static void Run(CheckContext c, bool windingChecked)
    {
        if (c.PhaseCount < 2) return; // a single phase returns through its own terminals
        foreach (var drive in c.Design.Drives)
        {
            // A term that failed to evaluate was reported; the rest of the drive is not what was meant.
            if (drive.Incomplete) continue;
            var groups = CurrentPhasors.Of(drive, c.PhaseCount);
            double scale = groups.SelectMany(g => g.Phasors).Select(x => x.Magnitude).DefaultIfEmpty(0).Max();
            if (scale == 0) continue;
            if (!drive.Neutral)
            {
                var residual = groups.Select(g => (g, Sum: g.Phasors.Aggregate(Complex.Zero, (a, b) => a + b))).FirstOrDefault(x => x.Sum.Magnitude > 1e-9 * scale);
                if (residual.g is { } g)
                {
                    string freq = g.IsDirect ? "direct" : $"{g.FrequencyHz.ToString("0.###", CultureInfo.InvariantCulture)} Hz";
                    c.Diagnostics.Add(DiagnosticCatalog.CurrentsDoNotSumToZero, drive.NameSpan,
                        $"the {freq} currents of drive '{drive.Name}' sum to {residual.Sum.Magnitude.ToString("0.###", CultureInfo.InvariantCulture)} A{(g.IsDirect ? "" : " (peak)")}, not zero, and the drive has no 'neutral'");
                }
            }
            CheckAmplitudes(c, drive, groups, scale);
            if (windingChecked) CheckDirection(c, drive, groups);
        }
    }

    private static void CheckAmplitudes(CheckContext c, Drive drive, IReadOnlyList<CurrentPhasors> groups, double scale)
    {
        foreach (var g in groups.Where(g => !g.IsDirect))
        {
            var amplitudes = g.Phasors.Select(x => x.Magnitude).ToArray();
            if (amplitudes.Max() - amplitudes.Min() <= 1e-9 * scale) continue;
            string list = string.Join(", ", amplitudes.Select((a, k) => $"{c.PhaseName(k)} {a.ToString("0.###", CultureInfo.InvariantCulture)} A"));
            c.Diagnostics.Add(DiagnosticCatalog.UnequalPhaseCurrents, drive.NameSpan,
                $"at {g.FrequencyHz.ToString("0.###", CultureInfo.InvariantCulture)} Hz the phase currents of drive '{drive.Name}' differ (peak {list})");
            return;
        }
    }

    // Reads the fundamental's direction from rotating-field theory: which of the forward and
    // backward waves of order p the currents of the lowest AC frequency make.
    private static void CheckDirection(CheckContext c, Drive drive, IReadOnlyList<CurrentPhasors> groups)
    {
        var g = groups.FirstOrDefault(x => !x.IsDirect);
        if (g is null) return;
        var (forward, backward) = TravellingWaves.At(c.Spectrum, g.Phasors.AsSpan(), c.Design.PolePairs);
        if (backward.Magnitude <= 2 * forward.Magnitude || backward.Magnitude < 1e-9) return;
        var diagnostic = DiagnosticCatalog.SequenceAgainstWinding.At(drive.NameSpan,
            $"drive '{drive.Name}' turns the field backwards (towards decreasing slot numbers): its phase sequence is opposite to the order of the phase axes");
        if (c.Syntax is not null && FindBalanced(c.Syntax, drive) is { } balanced && balanced.Sequence.Count >= 3)
        {
            // Reversing a sequence: keep the first phase, reverse the rest (U V W -> U W V).
            var names = balanced.Sequence.Select(n => n.Text).ToList();
            var reversed = new[] { names[0] }.Concat(names.Skip(1).Reverse());
            var span = balanced.Sequence[0].Span.Cover(balanced.Sequence[^1].Span);
            diagnostic = diagnostic with { Fix = new CodeFix($"Use the sequence {string.Join(" ", reversed)}", [new TextEdit(span, string.Join(" ", reversed))]) };
        }
        c.Diagnostics.Add(diagnostic);
    }

    private static BalancedSyntax? FindBalanced(SyntaxTree tree, Drive drive) =>
        tree.Root.Statements.OfType<BlockSyntax>().Where(b => b.Span == drive.Span).SelectMany(b => b.Body).OfType<BalancedSyntax>().FirstOrDefault();
}
