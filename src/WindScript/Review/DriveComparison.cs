using System.Collections.Immutable;
using System.Globalization;
using WindScript.Model;

namespace WindScript.Review;

/// <summary>
/// Drives matched by name and compared line by line on a canonical description of each phase
/// current (rounded to 6 significant digits, so rms and peak forms of one current agree).
/// </summary>
internal static class DriveComparison
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static ImmutableArray<DriveChange> Compare(WindingDesign? a, WindingDesign? b)
    {
        var before = a?.Drives ?? [];
        var after = b?.Drives ?? [];
        var changes = ImmutableArray.CreateBuilder<DriveChange>();
        foreach (var drive in before)
        {
            var other = after.FirstOrDefault(d => d.Name == drive.Name);
            if (other is null)
            {
                changes.Add(new DriveChange(drive.Name, DriveChangeKind.Removed, [.. Describe(drive, a!).Select(x => new TextRow(Label(x.Key, a!), x.Value, null))]));
                continue;
            }
            var x = Describe(drive, a!);
            var y = Describe(other, b!);
            var rows = x.Keys.Concat(y.Keys).Distinct().Order()
                .Select(key => new TextRow(Label(key, b!), x.GetValueOrDefault(key), y.GetValueOrDefault(key)))
                .Where(r => r.Changed)
                .ToImmutableArray();
            if (!rows.IsEmpty) changes.Add(new DriveChange(drive.Name, DriveChangeKind.Changed, rows));
        }
        foreach (var drive in after.Where(d => before.All(x => x.Name != d.Name)))
            changes.Add(new DriveChange(drive.Name, DriveChangeKind.Added, [.. Describe(drive, b!).Select(x => new TextRow(Label(x.Key, b!), null, x.Value))]));
        return changes.ToImmutable();
    }

    /// <summary>Key for the neutral line in <see cref="Describe"/>; other keys are phase indices.</summary>
    public const int Neutral = int.MaxValue;

    /// <summary>
    /// One line per phase current (keyed by phase index, so renamed phases still match) and one
    /// for the neutral (key <see cref="Neutral"/>), in key order.
    /// </summary>
    public static SortedDictionary<int, string> Describe(Drive drive, WindingDesign design)
    {
        var lines = new SortedDictionary<int, string>();
        foreach (var current in drive.Currents)
            lines[current.Phase] = current.Components.IsEmpty ? "no current" : string.Join(" + ", current.Components.Select(Component));
        lines[Neutral] = drive.Neutral ? "connected" : "not connected";
        return lines;
    }

    /// <summary>"phase 1 (U)" or "neutral".</summary>
    public static string Label(int key, WindingDesign design) =>
        key == Neutral ? "neutral" : $"phase {key + 1} ({(key < design.Phases.Length ? design.Phases[key].Name : "?")})";

    private static string Component(CurrentComponent c)
    {
        if (c.IsDirect) return $"dc {Number(c.Peak)} A";
        double degrees = c.PhaseAngle * 180 / Math.PI % 360;
        if (degrees <= -180) degrees += 360;
        if (degrees > 180) degrees -= 360;
        return $"sine {Number(c.Peak)} A peak at {Number(c.FrequencyHz)} Hz phase {Number(degrees)} deg";
    }

    private static string Number(double x)
    {
        double rounded = double.Parse(x.ToString("G6", Inv), Inv);
        return (rounded == 0 ? 0 : rounded).ToString("0.#####", Inv);
    }
}
