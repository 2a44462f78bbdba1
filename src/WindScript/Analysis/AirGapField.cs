namespace WindScript.Analysis;

/// <summary>
/// The radial air-gap field of an MMF F (A-turns) between ideal-iron surfaces.
/// Thin gap: H = F/(k_C·δ), B = μ0·H, the field constant across the gap.
/// Thick gap (exact radial model between coaxial cylinders of radii r_r &lt; r_s): flux
/// conservation with a radial field, ∂(r·B_r)/∂r = 0, gives B_r = Φ'(θ)/r; Ampere's law across
/// the gap, ∫ H_r dr = F, fixes Φ' = μ0·F / ln(r_s/r_r). So B(r) = μ0·F / (r·ln(r_s/r_r)):
/// highest at the rotor surface, lowest at the bore, and equal to the constant-field value
/// μ0·F/δ at the logarithmic mean radius δ/ln(r_s/r_r).
/// </summary>
internal static class AirGapField
{
    /// <summary>Permeability of vacuum, 4π·10⁻⁷ H/m (the SI 2019 value differs in the 10th digit).</summary>
    public const double Mu0 = 4e-7 * Math.PI;

    /// <summary>Thin-gap flux density (T) of an MMF across an effective gap k_C·δ (m).</summary>
    public static double ThinGapFluxDensity(double mmf, double effectiveGap) => Mu0 * mmf / effectiveGap;

    /// <summary>Thin-gap field strength (A/m).</summary>
    public static double ThinGapFieldStrength(double mmf, double effectiveGap) => mmf / effectiveGap;

    /// <summary>Radial-model flux density (T) at radius r between the rotor (r_r) and the bore (r_s).</summary>
    public static double RadialFluxDensity(double mmf, double rotorRadius, double boreRadius, double radius)
    {
        if (!(rotorRadius > 0 && boreRadius > rotorRadius))
            throw new ArgumentOutOfRangeException(nameof(boreRadius), "The bore radius must exceed the rotor radius, both positive.");
        return Mu0 * mmf / (radius * Math.Log(boreRadius / rotorRadius));
    }

    /// <summary>The field figures of one MMF value (usually the peak): thin gap with Carter, and the radial model.</summary>
    public static GapField Describe(double mmf, double rotorRadius, double boreRadius, double carter)
    {
        double gap = boreRadius - rotorRadius;
        double constant = ThinGapFluxDensity(mmf, gap);
        double atRotor = RadialFluxDensity(mmf, rotorRadius, boreRadius, rotorRadius);
        double atBore = RadialFluxDensity(mmf, rotorRadius, boreRadius, boreRadius);
        return new GapField(
            Mmf: mmf,
            EffectiveGap: carter * gap,
            FieldStrength: ThinGapFieldStrength(mmf, carter * gap),
            FluxDensity: ThinGapFluxDensity(mmf, carter * gap),
            ConstantFieldFluxDensity: constant,
            RadialFluxDensityAtRotor: atRotor,
            RadialFluxDensityAtBore: atBore,
            RotorDeviation: constant == 0 ? 0 : atRotor / constant - 1,
            BoreDeviation: constant == 0 ? 0 : atBore / constant - 1);
    }
}

/// <summary>
/// Air-gap field figures of one MMF value F (A-turns): the thin-gap field with Carter's
/// coefficient (H in A/m, B in T, across the effective gap in m), and for the smooth gap the
/// constant-field value μ0F/δ against the exact radial model at the rotor surface and at the
/// bore, with their relative deviations from the constant-field value.
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
    double BoreDeviation);
