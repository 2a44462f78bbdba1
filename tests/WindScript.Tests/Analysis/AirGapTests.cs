using MathNet.Numerics;
using WindScript.Analysis;

namespace WindScript.Tests.Analysis;

public class AirGapTests
{
    // Carter's coefficient (Pyrhonen et al. ch. 3) written in Carter's other classical form,
    // γ = (4/π)[x·atan x − ln √(1 + x²)], x = b/2δ, k_C = τ/(τ − γδ) (from memory): same value.
    [Theory]
    [InlineData(0.010, 0.002, 0.0005)]
    [InlineData(0.0131, 0.0028, 0.0005)]
    [InlineData(0.020, 0.004, 0.0015)]
    [InlineData(0.008, 0.0005, 0.001)]
    public void Carter_coefficient_equals_the_gamma_form(double pitch, double opening, double gap)
    {
        double x = opening / (2 * gap);
        double gamma = 4 / Math.PI * (x * Math.Atan(x) - Math.Log(Math.Sqrt(1 + x * x)));
        Assert.Equal(pitch / (pitch - gamma * gap), CarterCoefficient.Compute(pitch, opening, gap), 12);
    }

    // The simpler approximation k_C ≈ τ/(τ − b²/(5δ + b)) (Pyrhonen et al. ch. 3, from memory)
    // agrees to within 1 % over practical slot openings.
    [Theory]
    [InlineData(0.010, 0.002, 0.0005)]
    [InlineData(0.0131, 0.0028, 0.0005)]
    [InlineData(0.020, 0.004, 0.0015)]
    [InlineData(0.012, 0.006, 0.0003)]
    public void Carter_coefficient_agrees_with_the_quick_approximation(double pitch, double opening, double gap)
    {
        double approx = pitch / (pitch - opening * opening / (5 * gap + opening));
        double exact = CarterCoefficient.Compute(pitch, opening, gap);
        Assert.True(exact > 1);
        Assert.True(Math.Abs(exact / approx - 1) < 0.01, $"{exact} vs {approx}");
    }

    [Fact]
    public void Carter_coefficient_has_the_right_limits()
    {
        Assert.Equal(1, CarterCoefficient.Compute(0.01, 0, 0.001));
        Assert.Equal(1, CarterCoefficient.Compute(0.01, 1e-9, 0.001), 6);               // closed slots
        Assert.Equal(0.01 / (0.01 - 0.003), CarterCoefficient.Compute(0.01, 0.003, 1e-9), 4); // opening lost entirely
        Assert.Throws<ArgumentOutOfRangeException>(() => CarterCoefficient.Compute(0.01, 0.012, 0.001));
        Assert.Throws<ArgumentOutOfRangeException>(() => CarterCoefficient.Compute(0.01, 0.002, 0));
    }

    // The radial model against numerical integration (MathNet.Numerics): Ampere's law across the
    // gap, ∫ H_r dr = F, and flux conservation, B·r the same at every radius.
    [Theory]
    [InlineData(0.05, 0.0495, 1000)]
    [InlineData(0.05, 0.035, 1000)]
    [InlineData(0.20, 0.10, -350)]
    public void Radial_model_satisfies_ampere_and_flux_conservation(double bore, double rotor, double mmf)
    {
        double lineIntegral = Integrate.OnClosedInterval(r => AirGapField.RadialFluxDensity(mmf, rotor, bore, r) / AirGapField.Mu0, rotor, bore);
        Assert.Equal(mmf, lineIntegral, 8);
        double mid = (bore + rotor) / 2;
        Assert.Equal(AirGapField.RadialFluxDensity(mmf, rotor, bore, rotor) * rotor, AirGapField.RadialFluxDensity(mmf, rotor, bore, mid) * mid, 12);
        var field = AirGapField.OfHarmonic(mmf, 1, rotor, bore, 1.0);
        Assert.True(field.RotorDeviation > 0 && field.BoreDeviation < 0);
        // Mean of B across the gap (numerically) equals the constant-field value μ0F/δ: both carry the same MMF.
        double mean = Integrate.OnClosedInterval(r => AirGapField.RadialFluxDensity(mmf, rotor, bore, r), rotor, bore) / (bore - rotor);
        Assert.Equal(field.ConstantFieldFluxDensity, mean, 9);
    }

    [Fact]
    public void Thin_gap_limit_of_the_radial_model_is_the_constant_field_with_first_order_deviation()
    {
        double bore = 0.075, gap = 0.0005;
        var f = AirGapField.OfHarmonic(1000, 1, bore - gap, bore, carter: 1.1);
        Assert.InRange(f.RotorDeviation / (gap / (2 * bore)), 0.99, 1.01);    // ≈ +δ/2r
        Assert.InRange(f.BoreDeviation / (-gap / (2 * bore)), 0.99, 1.01);    // ≈ −δ/2r
        Assert.Equal(AirGapField.Mu0 * 1000 / (1.1 * gap), f.FluxDensity, 12);
        Assert.Equal(1000 / (1.1 * gap), f.FieldStrength, 6);
    }
}
