using System.Collections.Immutable;
using System.Numerics;
using WindScript.Analysis;
using WindScript.Model;

namespace WindScript.Reporting.Plots;

/// <summary>
/// The currents a picture shows: a drive of the file (by name, or the first), or, when the file
/// has none, balanced currents of 1 A peak at the machine's phase shift and 50 Hz (stated in
/// every caption). Gives the currents at any instant and the MMF they make.
/// </summary>
public sealed class Excitation
{
    /// <summary>Frequency assumed for the balanced unit currents of a file without drives.</summary>
    public const double UnitFrequencyHz = 50;

    private Excitation(WindingDesign design, Drive drive, bool synthetic)
    {
        Design = design;
        Drive = drive;
        IsSynthetic = synthetic;
        Spectrum = WindingSpectrum.Of(design);
        double omega = drive.Currents.SelectMany(c => c.Components).Select(c => Math.Abs(c.Omega)).Where(w => w > 0).DefaultIfEmpty(0).Min();
        PeriodSeconds = omega > 0 ? 2 * Math.PI / omega : null;
    }

    public WindingDesign Design { get; }
    public Drive Drive { get; }
    public bool IsSynthetic { get; }
    internal WindingSpectrum Spectrum { get; }

    /// <summary>One period of the lowest current frequency; null for direct current (a standing field).</summary>
    public double? PeriodSeconds { get; }

    public string Name => IsSynthetic ? "balanced 1 A peak currents (no drive in the file)" : $"drive {Drive.Name}";

    /// <summary>Resolves a drive by name (null: the first drive, or balanced unit currents). Returns null when the name is unknown.</summary>
    public static Excitation? Resolve(WindingDesign design, string? driveName)
    {
        if (driveName is not null)
            return design.Drives.FirstOrDefault(d => d.Name == driveName) is { } named ? new Excitation(design, named, false) : null;
        if (design.Drives.Length > 0) return new Excitation(design, design.Drives[0], false);
        return new Excitation(design, BalancedUnitDrive(design), true);
    }

    public static Excitation Of(WindingDesign design, Drive drive) => new(design, drive, false);

    private static Drive BalancedUnitDrive(WindingDesign design)
    {
        double omega = 2 * Math.PI * UnitFrequencyHz, shift = design.PhaseShiftDegrees * Math.PI / 180;
        return new Drive
        {
            Name = "balanced_unit",
            Currents = [.. design.Phases.Select(p => new PhaseCurrent(p.Index, [new CurrentComponent(1, omega, -p.Index * shift)]))],
        };
    }

    public double[] CurrentsAt(double time) => Drive.CurrentsAt(time, Design.Phases.Length);

    /// <summary>The MMF staircase levels (A) at an instant; level i holds from slot centre i to i + 1 (0-based).</summary>
    public double[] MmfLevels(double time) => MmfStaircase.FromCurrents(Spectrum, CurrentsAt(time), time).Levels.ToArray();

    /// <summary>The complex amplitude of mechanical order ν at an instant: F_ν(θ) = Re(C·e^(jνθ)).</summary>
    public Complex Harmonic(double time, int order) => MmfStaircase.Harmonic(Spectrum, CurrentsAt(time), order);

    /// <summary>The current groups (one per frequency), strongest first.</summary>
    internal IReadOnlyList<CurrentPhasors> Groups =>
        [.. CurrentPhasors.Of(Drive, Design.Phases.Length).OrderByDescending(g => g.Phasors.Sum(p => p.Magnitude))];

    /// <summary>"t = 2.5 ms" (or "DC").</summary>
    public string DescribeTime(double time) => PeriodSeconds is null ? "direct current" : $"t = {Drawing.Ticks.Format(time * 1000)} ms";

    /// <summary>Currents at the instant, "U 53.7 A, V -26.9 A, ...".</summary>
    public string DescribeCurrents(double time)
    {
        var i = CurrentsAt(time);
        return string.Join(", ", Design.Phases.Select(p => $"{p.Name} {Drawing.Ticks.Format(Math.Round(i[p.Index], 2))} A"));
    }

    public static ImmutableArray<double> SlotCentresDegrees(int slots) =>
        [.. Enumerable.Range(0, slots).Select(i => SlotSpectrum.SlotAngle(i, slots) * 180 / Math.PI)];
}
