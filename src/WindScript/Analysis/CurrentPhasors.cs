using System.Collections.Immutable;
using System.Numerics;
using WindScript.Model;

namespace WindScript.Analysis;

/// <summary>
/// The currents of a drive at one angular frequency ω ≥ 0, as one phasor per phase:
/// i_k(t) = Re(I_k e^(jωt)). Direct current is ω = 0 with real phasors.
/// </summary>
internal sealed record CurrentPhasors(double Omega, ImmutableArray<Complex> Phasors)
{
    public double FrequencyHz => Model.CurrentComponent.AsWritten(Omega / (2 * Math.PI));

    public bool IsDirect => Omega == 0;

    /// <summary>
    /// Splits a drive into its frequencies (ascending), summing components of one phase that
    /// share a frequency. A negative ω is folded onto +|ω| (cos(−ωt + φ) = cos(ωt − φ)).
    /// </summary>
    public static IReadOnlyList<CurrentPhasors> Of(Drive drive, int phases)
    {
        var groups = new List<(double Omega, Complex[] Phasors)>();
        foreach (var current in drive.Currents)
        {
            if (current.Phase < 0 || current.Phase >= phases) continue;
            foreach (var c in current.Components)
            {
                double omega = Math.Abs(c.Omega);
                double angle = c.Omega < 0 ? -c.PhaseAngle : c.PhaseAngle;
                var phasor = omega == 0 ? new Complex(c.Peak * Math.Cos(angle), 0) : Complex.FromPolarCoordinates(c.Peak, angle);
                int g = groups.FindIndex(x => SameFrequency(x.Omega, omega));
                if (g < 0) { groups.Add((omega, new Complex[phases])); g = groups.Count - 1; }
                groups[g].Phasors[current.Phase] += phasor;
            }
        }
        return groups.OrderBy(x => x.Omega).Select(x => new CurrentPhasors(x.Omega, [.. x.Phasors])).ToArray();
    }

    /// <summary>A balanced m-phase set of unit peak: I_k = e^(−jkφ) (or e^(+jkφ) reversed), φ = phase shift.</summary>
    public static CurrentPhasors Balanced(int phases, double phaseShiftRadians, double omega = 1, bool reversed = false)
    {
        var result = new Complex[phases];
        for (int k = 0; k < phases; k++) result[k] = Complex.FromPolarCoordinates(1, (reversed ? 1 : -1) * k * phaseShiftRadians);
        return new CurrentPhasors(omega, [.. result]);
    }

    private static bool SameFrequency(double a, double b) => Math.Abs(a - b) <= 1e-9 * Math.Max(1, Math.Max(a, b));
}
