using System.Collections.Immutable;
using System.Globalization;
using WindScript.Model;

namespace WindScript.Review;

/// <summary>
/// Drives matched by name and compared line by line on a canonical description of each phase
/// current (rounded to 6 significant digits, so rms and peak forms of one current agree).
/// </summary>
public static class DriveComparison
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
                changes.Add(new DriveChange(drive.Name, DriveChangeKind.Removed, [.. Describe(drive, a!).Select(x => new TextRow(x.Key, x.Value, null))]));
                continue;
            }
            var x = Describe(drive, a!);
            var y = Describe(other, b!);
            var rows = x.Keys.Concat(y.Keys).Distinct()
                .Select(key => new TextRow(key, x.GetValueOrDefault(key), y.GetValueOrDefault(key)))
                .Where(r => r.Changed)
                .ToImmutableArray();
            if (!rows.IsEmpty) changes.Add(new DriveChange(drive.Name, DriveChangeKind.Changed, rows));
        }
        foreach (var drive in after.Where(d => before.All(x => x.Name != d.Name)))
            changes.Add(new DriveChange(drive.Name, DriveChangeKind.Added, [.. Describe(drive, b!).Select(x => new TextRow(x.Key, null, x.Value))]));
        return changes.ToImmutable();
    }

    /// <summary>One line per phase current, plus the neutral; keyed by phase position so renamed phases still match.</summary>
    public static IReadOnlyDictionary<string, string> Describe(Drive drive, WindingDesign design)
    {
        var lines = new Dictionary<string, string>();
        foreach (var current in drive.Currents)
        {
            string name = current.Phase < design.Phases.Length ? design.Phases[current.Phase].Name : $"#{current.Phase + 1}";
            lines[$"phase {current.Phase + 1} ({name})"] = current.Components.IsEmpty ? "no current" : string.Join(" + ", current.Components.Select(Component));
        }
        lines["neutral"] = drive.Neutral ? "connected" : "not connected";
        return lines;
    }

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
