using System.Numerics;
using MathNet.Numerics;
using WindScript.Analysis;
using WindScript.Model;

namespace WindScript.Tests.Analysis;

/// <summary>
/// The exact 2-D field of a thick gap (<see cref="AnnularGapField"/>, <see cref="StaircaseGapField"/>)
/// against an independent numerical solution of Laplace's equation in the annulus written here:
/// per harmonic φ(r, θ) = P(r)·cos νθ turns ∇²φ = 0 into the ODE r²P'' + rP' − ν²P = 0 between the
/// rotor (P = 0) and the stator surface (P = ±1), solved by second-order finite differences on a
/// uniform radial grid (our own tridiagonal solve) and Richardson-extrapolated over three grids.
/// </summary>
public class ThickGapFieldTests
{
    private const double Mu0 = 4e-7 * Math.PI;

    /// <summary>FD solution of r²P'' + rP' − ν²P = 0 on [rotor, stator] with P(rotor) = 0, P(stator) = sheet.</summary>
    private static double[] SolveRadialOde(int order, double rotor, double stator, int intervals, double sheet)
    {
        double r0 = Math.Min(rotor, stator), r1 = Math.Max(rotor, stator), h = (r1 - r0) / intervals;
        int n = intervals - 1;
        var lower = new double[n]; var diag = new double[n]; var upper = new double[n]; var rhs = new double[n];
        double left = rotor < stator ? 0 : sheet, right = rotor < stator ? sheet : 0;
        for (int i = 0; i < n; i++)
        {
            double r = r0 + (i + 1) * h;
            // P'' + P'/r − ν²P/r² = 0, central differences.
            lower[i] = 1 / (h * h) - 1 / (2 * h * r);
            upper[i] = 1 / (h * h) + 1 / (2 * h * r);
            diag[i] = -2 / (h * h) - (double)order * order / (r * r);
        }
        rhs[0] -= lower[0] * left;
        rhs[n - 1] -= upper[n - 1] * right;
        // Thomas algorithm.
        for (int i = 1; i < n; i++)
        {
            double w = lower[i] / diag[i - 1];
            diag[i] -= w * upper[i - 1];
            rhs[i] -= w * rhs[i - 1];
        }
        var p = new double[intervals + 1];
        p[0] = left; p[intervals] = right;
        p[n] = rhs[n - 1] / diag[n - 1];
        for (int i = n - 2; i >= 0; i--) p[i + 1] = (rhs[i] - upper[i] * p[i + 2]) / diag[i];
        return p;
    }

    /// <summary>dP/dr at the lower end (i = 0) or upper end of the grid, second-order one-sided.</summary>
    private static double EndSlope(double[] p, double h, bool lowerEnd) => lowerEnd
        ? (-3 * p[0] + 4 * p[1] - p[2]) / (2 * h)
        : (3 * p[^1] - 4 * p[^2] + p[^3]) / (2 * h);

    /// <summary>B_r per ampere (T) at the rotor and stator surfaces and B_θ per ampere at the mid radius, extrapolated.</summary>
    private static (double Rotor, double Stator, double MidTangential) NumericalField(int order, double stator, double rotor)
    {
        double sheet = rotor < stator ? 1 : -1;           // outward MMF of 1 A across the gap
        double Estimate(int intervals, int which)
        {
            var p = SolveRadialOde(order, rotor, stator, intervals, sheet);
            double r0 = Math.Min(rotor, stator), h = Math.Abs(stator - rotor) / intervals;
            bool rotorLow = rotor < stator;
            return which switch
            {
                0 => Mu0 * EndSlope(p, h, rotorLow),
                1 => Mu0 * EndSlope(p, h, !rotorLow),
                // B_θ = μ0 (1/r) ∂φ/∂θ = −μ0 ν P(r)/r · sin νθ: the coefficient of sin νθ.
                _ => -Mu0 * order * p[intervals / 2] / (r0 + intervals / 2 * h),
            };
        }
        double Extrapolated(int which)
        {
            const int n = 4000;
            double a = Estimate(n, which), b = Estimate(2 * n, which), c = Estimate(4 * n, which);
            double ab = (4 * b - a) / 3, bc = (4 * c - b) / 3;      // O(h²) error removed
            return (16 * bc - ab) / 15;                              // O(h⁴) removed
        }
        return (Extrapolated(0), Extrapolated(1), Extrapolated(2));
    }

    // Several orders and gap ratios, inner and outer rotor: measured agreement about 1e-10 relative; asserted to 1e-8.
    [Theory]
    [InlineData(1, 0.030, 0.024)]
    [InlineData(2, 0.030, 0.024)]
    [InlineData(6, 0.030, 0.024)]
    [InlineData(6, 0.100, 0.099)]
    [InlineData(5, 0.071, 0.0702)]
    [InlineData(3, 0.050, 0.025)]
    [InlineData(12, 0.050, 0.040)]
    [InlineData(25, 0.050, 0.045)]
    [InlineData(4, 0.060, 0.066)]      // outer rotor
    [InlineData(10, 0.040, 0.048)]     // outer rotor, thick
    public void Harmonic_field_agrees_with_a_finite_difference_solution(int order, double stator, double rotor)
    {
        var (atRotor, atStator, midTangential) = NumericalField(order, stator, rotor);
        double mid = (stator + rotor) / 2;
        AssertRelative(atRotor, AnnularGapField.RadialPerAmpere(order, stator, rotor, rotor), 1e-8);
        AssertRelative(atStator, AnnularGapField.RadialPerAmpere(order, stator, rotor, stator), 1e-8);
        AssertRelative(midTangential, AnnularGapField.TangentialPerAmpere(order, stator, rotor, mid), 1e-8);
        Assert.Equal(0, AnnularGapField.TangentialPerAmpere(order, stator, rotor, rotor), 15);
    }

    // The figures of the example, a 12-pole wave (ν = 6) in a 6 mm gap on a 30 mm bore radius:
    // the flux-tube model is about 33 % high at the rotor and 35 % low at the bore; for 2 poles under 2 %.
    [Fact]
    public void Flux_tube_error_for_a_short_wave_in_a_thick_gap()
    {
        var six = AirGapField.OfHarmonic(1000, 6, rotorRadius: 0.024, statorRadius: 0.030, carter: 1);
        Assert.InRange(six.FluxTubeDeviationAtRotor, 0.32, 0.34);
        Assert.InRange(six.FluxTubeDeviationAtBore, -0.36, -0.34);
        var one = AirGapField.OfHarmonic(1000, 1, rotorRadius: 0.024, statorRadius: 0.030, carter: 1);
        Assert.InRange(Math.Abs(one.FluxTubeDeviationAtRotor), 0, 0.02);
        Assert.InRange(Math.Abs(one.FluxTubeDeviationAtBore), 0, 0.02);
    }

    // Thin-gap limit (closed form): both surfaces see μ0·F/δ, to O(νδ/r).
    [Theory]
    [InlineData(1)]
    [InlineData(4)]
    [InlineData(20)]
    public void Thin_gap_limit_is_mu0_F_over_g(int order)
    {
        double stator = 0.1, gap = 1e-6, f = 500;
        double expected = Mu0 * f / gap;
        AssertRelative(expected, AnnularGapField.AtRotor(f, order, stator, stator - gap), 1e-4);
        AssertRelative(expected, AnnularGapField.AtStator(f, order, stator, stator - gap), 1e-4);
        AssertRelative(expected, AnnularGapField.AtStator(f, order, stator, stator + gap), 1e-4);
    }

    /// <summary>Ampere-conductors of a fictional 12-slot staircase, zero sum.</summary>
    private static readonly double[] Slots12 = [300, -120, -180, 60, 240, -300, -300, 120, 180, -60, -240, 300];

    /// <summary>Exact Fourier coefficient F̂_ν (complex, F = Re(F̂ e^(jνθ))) of the zero-mean staircase, integrated level by level.</summary>
    private static Complex StaircaseCoefficient(double[] ampereConductors, int order)
    {
        int q = ampereConductors.Length;
        var levels = new double[q];
        double level = 0;
        for (int i = 0; i < q; i++) { level += ampereConductors[i]; levels[i] = level; }   // from slot i's centre to slot i+1's
        double mean = levels.Average();
        Complex sum = Complex.Zero;
        for (int i = 0; i < q; i++)
        {
            double a = 2 * Math.PI * (i + 0.5) / q, b = 2 * Math.PI * (i + 1.5) / q;
            // ∫_a^b e^(−jνθ) dθ = (e^(−jνb) − e^(−jνa)) / (−jν)
            sum += (levels[i] - mean) * (Complex.Exp(new Complex(0, -order * b)) - Complex.Exp(new Complex(0, -order * a))) / new Complex(0, -order);
        }
        return sum / Math.PI;
    }

    // The staircase field at the rotor and inside the gap as the sum of its harmonics, each from the
    // finite-difference solution: B_r = Σ_ν B_FD(ν, r)·Re(F̂_ν e^(jνθ)), orders until e^(−ν·distance) is negligible.
    [Theory]
    [InlineData(0.030, 0.024, 0.0)]
    [InlineData(0.030, 0.024, 0.5)]
    [InlineData(0.050, 0.030, 0.0)]
    [InlineData(0.040, 0.050, 0.0)]    // outer rotor
    public void Staircase_field_is_the_sum_of_the_finite_difference_harmonics(double stator, double rotor, double fraction)
    {
        double radius = rotor + fraction * (stator - rotor);
        var field = new StaircaseGapField(Slots12, stator, rotor);
        double lambda = Math.Abs(Math.Log(stator / rotor)), distance = Math.Abs(Math.Log(stator / radius));
        int orders = (int)Math.Ceiling(30 / distance);
        var theta = new[] { 0.1, 0.9, 2.0, 3.3, 5.0 };
        var expected = new double[theta.Length];
        for (int v = 1; v <= orders; v++)
        {
            var coefficient = StaircaseCoefficient(Slots12, v);
            if (coefficient.Magnitude < 1e-12) continue;
            double perAmpere = RadialPerAmpereByFd(v, stator, rotor, radius);
            for (int i = 0; i < theta.Length; i++)
                expected[i] += perAmpere * (coefficient * Complex.Exp(new Complex(0, v * theta[i]))).Real;
        }
        double scale = expected.Max(Math.Abs);
        for (int i = 0; i < theta.Length; i++)
            Assert.True(Math.Abs(field.RadialAt(radius, theta[i]) - expected[i]) <= 1e-6 * scale,
                $"θ = {theta[i]}: {field.RadialAt(radius, theta[i])} vs {expected[i]} (λ = {lambda})");
    }

    // The sampled grid (folded orders + one FFT) equals the pointwise sum, and the peak is the largest sample or above.
    [Theory]
    [InlineData(0.030, 0.024)]
    [InlineData(0.050, 0.0495)]
    [InlineData(0.040, 0.046)]
    public void Sampled_field_equals_the_pointwise_sum(double stator, double rotor)
    {
        var field = new StaircaseGapField(Slots12, stator, rotor);
        foreach (double radius in new[] { rotor, (rotor + stator) / 2 })
        {
            var samples = field.SampleRadial(radius, 96);
            double scale = samples.Max(Math.Abs);
            for (int j = 0; j < 96; j += 7)
                Assert.True(Math.Abs(samples[j] - field.RadialAt(radius, 2 * Math.PI * j / 96)) <= 1e-10 * scale);
        }
        Assert.True(field.PeakAtRotor() >= field.SampleRadial(rotor, 384).Max(Math.Abs) * (1 - 1e-12));
    }

    private static double RadialPerAmpereByFd(int order, double stator, double rotor, double radius)
    {
        double sheet = rotor < stator ? 1 : -1;
        double Slope(int intervals)
        {
            var p = SolveRadialOde(order, rotor, stator, intervals, sheet);
            double r0 = Math.Min(rotor, stator), h = Math.Abs(stator - rotor) / intervals;
            int i = (int)Math.Round((radius - r0) / h);
            if (i == 0) return EndSlope(p, h, true);
            if (i == intervals) return EndSlope(p, h, false);
            return (p[i + 1] - p[i - 1]) / (2 * h);
        }
        double a = Slope(2000), b = Slope(4000), c = Slope(8000);
        double ab = (4 * b - a) / 3, bc = (4 * c - b) / 3;
        return Mu0 * (16 * bc - ab) / 15;
    }

    // Ampere's law along a radial line at each tooth centre (MathNet.Numerics integration):
    // ∫ H_r dr from rotor to stator equals the staircase level there; and H_θ = 0 on the iron
    // surfaces between conductors. This checks the closed-form sum near the conductors too.
    [Theory]
    [InlineData(0.030, 0.024)]
    [InlineData(0.050, 0.049)]
    [InlineData(0.040, 0.046)]
    public void Ampere_law_holds_across_the_gap_at_every_tooth(double stator, double rotor)
    {
        var field = new StaircaseGapField(Slots12, stator, rotor);
        int q = Slots12.Length;
        var levels = new double[q];
        double level = 0;
        for (int i = 0; i < q; i++) { level += Slots12[i]; levels[i] = level; }
        double mean = levels.Average();
        for (int i = 0; i < q; i++)
        {
            double theta = 2 * Math.PI * (i + 1) / q;
            double integral = Integrate.OnClosedInterval(r => field.RadialAt(r, theta) / Mu0, Math.Min(rotor, stator), Math.Max(rotor, stator), 1e-10);
            Assert.Equal(levels[i] - mean, integral, 5);          // F is the outward MMF either way round
            Assert.Equal(0, field.TangentialAt(stator, theta), 9);
            Assert.Equal(0, field.TangentialAt(rotor, theta), 9);
        }
    }

    // Thin-gap limit of the staircase: at a tooth centre both surfaces see μ0·F/δ of the flat step.
    [Fact]
    public void Staircase_thin_gap_limit_is_the_flat_step()
    {
        double stator = 0.1, gap = 2e-5;
        var field = new StaircaseGapField(Slots12, stator, stator - gap);
        double level = Slots12.Take(1).Sum() - Enumerable.Range(1, 12).Select(n => Slots12.Take(n).Sum()).Average();
        Assert.NotEqual(0, level);
        AssertRelative(Mu0 * level / gap, field.RadialAt(stator - gap, 2 * Math.PI * 1 / 12), 1e-3);
        AssertRelative(Mu0 * level / gap, field.RadialAt(stator, 2 * Math.PI * 1 / 12), 1e-3);
    }

    // Inductances of a thick gap: the working-wave share uses the 2-D permeance ν·coth(νλ) instead of
    // r_m/δ, computed here from the finite-difference field at the stator surface (the flux that links
    // the coils): L_kl = l/k_C·[μ0 r_m/δ·∫N_k N_l dθ + π·Σ_(ν≤Q/2)(r_s·B_FD(ν)/μ0·μ0 − μ0 r_m/δ)·Re(C_k conj C_l)].
    [Fact]
    public void Thick_gap_inductances_use_the_two_dimensional_permeance()
    {
        // The example: 36 slots, 12 poles, 6 mm gap on a 30 mm bore radius.
        var geometry = new Geometry { BoreDiameter = 0.060, StackLength = 0.05, Gap = 0.006 };
        var d = Designs.IntegralSlot(36, 12, 3, geometry: geometry);
        var w = WindingSpectrum.Of(d);
        var l = Inductances.Of(d, w, carter: 1)!;
        Assert.True(l.ThickGap);
        double rs = 0.030, rr = 0.024, rm = 0.027, delta = 0.006, length = 0.05;
        var thin = Inductances.TurnsProducts(w);
        for (int k = 0; k < 3; k++)
            for (int j = 0; j < 3; j++)
            {
                double sum = Mu0 * rm / delta * thin[k, j];
                for (int v = 1; v <= 18; v++)
                {
                    double twoD = rs * RadialPerAmpereByFd(v, rs, rr, rs);
                    sum += Math.PI * (twoD - Mu0 * rm / delta) * (w.TurnsCoefficient(k, v) * Complex.Conjugate(w.TurnsCoefficient(j, v))).Real;
                }
                AssertRelative(length * sum, l.Matrix[k][j], 1e-6);
            }
        // The flux-tube figure is 35 % low for the working wave: the working share alone grows by ν·coth(νλ)·δ/r_m.
        Assert.InRange(AnnularGapField.PermeanceRatio(6, rs, rr), 1 / 0.66, 1 / 0.64);
        // A thin gap keeps the winding-function figures.
        var thinCore = new Geometry { BoreDiameter = 0.15, StackLength = 0.12, Gap = 0.0005 };
        Assert.False(Inductances.Of(Designs.IntegralSlot(36, 4, 7, geometry: thinCore), WindingSpectrum.Of(Designs.IntegralSlot(36, 4, 7, geometry: thinCore)), 1)!.ThickGap);
    }

    // An outer-rotor machine: the rotor's gap surface lies at bore/2 + gap, Carter's slot pitch is
    // the stator's at the gap, and the 2-D field is the outer-rotor annulus (checked above by FD).
    [Fact]
    public void Outer_rotor_machine_uses_the_radii_outside_the_stator()
    {
        var geometry = new Geometry { BoreDiameter = 0.142, StackLength = 0.035, Gap = 0.0008, SlotOpening = 0.002, RotorOutside = true };
        var drive = new Drive { Name = "d", Currents = [.. Enumerable.Range(0, 3).Select(k => new PhaseCurrent(k, [new CurrentComponent(25, 2 * Math.PI * 150, -k * 2 * Math.PI / 3)]))] };
        var d = Designs.ToothCoils(12, 10, geometry: geometry, drives: [drive]);
        var r = MachineAnalysis.Evaluate(d);
        Assert.Equal(0.071 + 0.0008, r.Gap.RotorRadius!.Value, 12);
        Assert.True(r.Gap.RotorOutside);
        Assert.Equal(CarterCoefficient.Compute(Math.PI * 0.142 / 12, 0.002, 0.0008), r.Gap.CarterCoefficient!.Value, 12);
        var b1 = r.Drives[0].FundamentalField!;
        AssertRelative(AnnularGapField.AtRotor(b1.Mmf, 5, 0.071, 0.0718), b1.ExactFluxDensityAtRotor, 1e-12);
        // Outside the stator the flux tube widens towards the rotor: B falls from stator to rotor.
        Assert.True(b1.RadialFluxDensityAtBore > b1.RadialFluxDensityAtRotor);
        Assert.True(b1.ExactFluxDensityAtBore > b1.ExactFluxDensityAtRotor);
        Assert.NotNull(r.Inductances);
        Assert.Equal((0.071 + 0.0718) / 2, r.Inductances!.MeanRadius, 12);
    }

    private static void AssertRelative(double expected, double actual, double tolerance) =>
        Assert.True(Math.Abs(actual - expected) <= tolerance * Math.Abs(expected), $"expected {expected:R}, got {actual:R} (relative {Math.Abs(actual / expected - 1):E2})");
}
