namespace WindScript.Analysis;

/// <summary>
/// The radial air-gap field of an MMF F (A-turns) between ideal-iron surfaces.
/// Thin gap: H = F/(k_C·δ), B = μ0·H, the field constant across the gap.
/// Thick gap, flux-tube (1/r) approximation between coaxial cylinders of radii r_r &lt; r_s:
/// flux conservation with a purely radial field, ∂(r·B_r)/∂r = 0, gives B_r = Φ'(θ)/r; Ampere's
/// law across the gap, ∫ H_r dr = F, fixes Φ' = μ0·F / ln(r_s/r_r). So B(r) = μ0·F / (r·ln(r_s/r_r)).
/// This ignores the tangential field and so holds only for waves long against the gap; the exact
/// 2-D solution per harmonic is <see cref="AnnularGapField"/>.
/// </summary>
internal static class AirGapField
{
    /// <summary>Permeability of vacuum, 4π·10⁻⁷ H/m (the SI 2019 value differs in the 10th digit).</summary>
    public const double Mu0 = 4e-7 * Math.PI;

    /// <summary>Thin-gap flux density (T) of an MMF across an effective gap k_C·δ (m).</summary>
    public static double ThinGapFluxDensity(double mmf, double effectiveGap) => Mu0 * mmf / effectiveGap;

    /// <summary>Thin-gap field strength (A/m).</summary>
    public static double ThinGapFieldStrength(double mmf, double effectiveGap) => mmf / effectiveGap;

    /// <summary>
    /// Flux-tube (1/r) approximation of the flux density (T) at radius r between the rotor surface
    /// (r_r) and the stator surface (r_s), either way round: B = μ0·F/(r·|ln(r_s/r_r)|). It holds only
    /// for a field that varies slowly around the gap; <see cref="AnnularGapField"/> is the 2-D solution.
    /// </summary>
    public static double RadialFluxDensity(double mmf, double rotorRadius, double statorRadius, double radius)
    {
        if (!(rotorRadius > 0 && statorRadius > 0 && statorRadius != rotorRadius))
            throw new ArgumentOutOfRangeException(nameof(statorRadius), "The stator and rotor radii must be positive and differ.");
        return Mu0 * mmf / (radius * Math.Abs(Math.Log(statorRadius / rotorRadius)));
    }

    /// <summary>
    /// The field figures of one MMF value (usually the peak): thin gap with Carter, the flux-tube
    /// approximation, and the exact 2-D values at the rotor and stator surfaces that the caller
    /// computed (<see cref="AnnularGapField"/> for one harmonic, <see cref="StaircaseGapField"/> for a staircase).
    /// </summary>
    public static GapField Describe(double mmf, double rotorRadius, double statorRadius, double carter, double exactAtRotor, double exactAtStator)
    {
        double gap = Math.Abs(statorRadius - rotorRadius);
        double constant = ThinGapFluxDensity(mmf, gap);
        double atRotor = RadialFluxDensity(mmf, rotorRadius, statorRadius, rotorRadius);
        double atBore = RadialFluxDensity(mmf, rotorRadius, statorRadius, statorRadius);
        return new GapField(
            Mmf: mmf,
            EffectiveGap: carter * gap,
            FieldStrength: ThinGapFieldStrength(mmf, carter * gap),
            FluxDensity: ThinGapFluxDensity(mmf, carter * gap),
            ConstantFieldFluxDensity: constant,
            RadialFluxDensityAtRotor: atRotor,
            RadialFluxDensityAtBore: atBore,
            RotorDeviation: constant == 0 ? 0 : atRotor / constant - 1,
            BoreDeviation: constant == 0 ? 0 : atBore / constant - 1,
            ExactFluxDensityAtRotor: exactAtRotor,
            ExactFluxDensityAtBore: exactAtStator,
            FluxTubeDeviationAtRotor: exactAtRotor == 0 ? 0 : atRotor / exactAtRotor - 1,
            FluxTubeDeviationAtBore: exactAtStator == 0 ? 0 : atBore / exactAtStator - 1);
    }

    /// <summary>Field figures of one MMF harmonic of mechanical order ν and amplitude F (A).</summary>
    public static GapField OfHarmonic(double mmf, int order, double rotorRadius, double statorRadius, double carter) =>
        Describe(mmf, rotorRadius, statorRadius, carter,
            AnnularGapField.AtRotor(mmf, order, statorRadius, rotorRadius),
            AnnularGapField.AtStator(mmf, order, statorRadius, rotorRadius));
}

/// <summary>
/// Air-gap field figures of one MMF value F (A): the thin-gap field with Carter's coefficient
/// (H in A/m, B in T, across the effective gap in m); for the smooth gap the constant-field value
/// μ0F/δ, the flux-tube (1/r) approximation at the rotor and stator surfaces with its deviation
/// from the constant field, and the exact 2-D peak radial flux density at both surfaces with the
/// flux-tube approximation's deviation from it (flux tube / 2-D − 1). "Bore" is the stator's gap
/// surface, inside the rotor for an outer-rotor machine.
/// </summary>
public sealed record GapField(
    double Mmf,
    double EffectiveGap,
    double FieldStrength,
    double FluxDensity,
    double ConstantFieldFluxDensity,
    double RadialFluxDensityAtRotor,
    double RadialFluxDensityAtBore,
    double RotorDeviation,
    double BoreDeviation,
    double ExactFluxDensityAtRotor,
    double ExactFluxDensityAtBore,
    double FluxTubeDeviationAtRotor,
    double FluxTubeDeviationAtBore);
