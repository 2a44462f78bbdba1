namespace WindScript.Analysis;

/// <summary>
/// The exact 2-D field of one MMF harmonic in a smooth gap between coaxial ideal-iron cylinders:
/// the stator surface at radius a carries the current sheet, the rotor surface at radius c is an
/// equipotential (c &lt; a inner rotor, c &gt; a outer rotor). In the gap H = ∇φ with ∇²φ = 0; for
/// an outward MMF F(θ) = Re(F̂ e^(jνθ)) the solution of Laplace's equation in the annulus that is
/// 0 at the rotor and carries F across the gap is
///   φ = Re(F̂ e^(jνθ)) · sinh(ν ln(r/c)) / sinh(ν ln(a/c)),
/// i.e. a combination of r^ν and r^(−ν), so
///   B_r = μ0 F̂ (ν/r) cosh(ν ln(r/c)) / sinh(νλ),   B_θ = −μ0 (ν/r) sinh(ν ln(r/c)) / sinh(νλ) · Im(F̂ e^(jνθ)),
/// with λ = |ln(a/c)|: B_r ∝ r^(ν−1) and r^(−ν−1) as the separated solution says. At the rotor
/// B_r = μ0 F ν/(c sinh νλ), at the stator μ0 F (ν/a) coth νλ, and for a thin gap (νλ → 0) both
/// tend to μ0 F/δ. (Separation of variables in polar coordinates, as in any electromagnetics text;
/// the same annulus solution is the armature-reaction field of Z. Q. Zhu, D. Howe, IEEE Trans.
/// Magn. 29(1), 1993 — from memory.) Smooth surfaces: slotting is not in the 2-D solution.
/// </summary>
internal static class AnnularGapField
{
    /// <summary>cosh(νρ)/sinh(νλ) for |ρ| ≤ λ, without overflow at high orders.</summary>
    private static double CoshOverSinh(double order, double rho, double lambda)
    {
        double a = Math.Abs(rho);
        return Math.Exp(order * (a - lambda)) * (1 + Math.Exp(-2 * order * a)) / (1 - Math.Exp(-2 * order * lambda));
    }

    /// <summary>sinh(νρ)/sinh(νλ) for |ρ| ≤ λ, signed as ρ, without overflow.</summary>
    private static double SinhOverSinh(double order, double rho, double lambda)
    {
        double a = Math.Abs(rho);
        return Math.Sign(rho) * Math.Exp(order * (a - lambda)) * (1 - Math.Exp(-2 * order * a)) / (1 - Math.Exp(-2 * order * lambda));
    }

    private static double Lambda(double statorRadius, double rotorRadius)
    {
        if (!(statorRadius > 0 && rotorRadius > 0 && statorRadius != rotorRadius))
            throw new ArgumentOutOfRangeException(nameof(rotorRadius), "The stator and rotor radii must be positive and differ.");
        return Math.Abs(Math.Log(statorRadius / rotorRadius));
    }

    /// <summary>B_r amplitude (T) at radius r of an MMF harmonic of amplitude 1 A and mechanical order ν ≥ 1.</summary>
    public static double RadialPerAmpere(int order, double statorRadius, double rotorRadius, double radius)
    {
        double lambda = Lambda(statorRadius, rotorRadius);
        return AirGapField.Mu0 * order / radius * CoshOverSinh(order, Math.Log(radius / rotorRadius), lambda);
    }

    /// <summary>
    /// B_θ amplitude (T) at radius r per ampere of MMF amplitude: B_θ = value · sin(νθ + α) for
    /// F = F̂ cos(νθ + α). Zero at the rotor (no current there); ∓μ0 ν F/a at the stator sheet.
    /// </summary>
    public static double TangentialPerAmpere(int order, double statorRadius, double rotorRadius, double radius)
    {
        double lambda = Lambda(statorRadius, rotorRadius);
        return -AirGapField.Mu0 * order / radius * SinhOverSinh(order, Math.Log(radius / rotorRadius), lambda);
    }

    /// <summary>Peak B_r (T) at the rotor surface of a harmonic of amplitude F (A).</summary>
    public static double AtRotor(double mmf, int order, double statorRadius, double rotorRadius) =>
        mmf * RadialPerAmpere(order, statorRadius, rotorRadius, rotorRadius);

    /// <summary>Peak B_r (T) at the stator surface (the bore of an inner-rotor machine).</summary>
    public static double AtStator(double mmf, int order, double statorRadius, double rotorRadius) =>
        mmf * RadialPerAmpere(order, statorRadius, rotorRadius, statorRadius);

    /// <summary>
    /// The 2-D permeance of order ν relative to the flux-tube one: ν·coth(νλ)·δ/r_m, the factor by
    /// which the flux an order-ν MMF drives into the stator surface differs from μ0·r_m·F/δ per radian
    /// (r_m the mean gap radius); 1 in the thin-gap limit.
    /// </summary>
    public static double PermeanceRatio(int order, double statorRadius, double rotorRadius)
    {
        double lambda = Lambda(statorRadius, rotorRadius);
        double gap = Math.Abs(statorRadius - rotorRadius), mean = (statorRadius + rotorRadius) / 2;
        return order * CoshOverSinh(order, lambda, lambda) * gap / mean;
    }

    /// <summary>
    /// A gap is thick when the 2-D permeance of the working order p differs from the flux-tube one
    /// by more than 1 %; then the inductances use the 2-D permeance (a thin gap keeps the textbook
    /// winding-function figures unchanged).
    /// </summary>
    public static bool IsThick(int workingOrder, double statorRadius, double rotorRadius) =>
        Math.Abs(PermeanceRatio(workingOrder, statorRadius, rotorRadius) - 1) > 0.01;

    /// <summary>Highest order whose field at radius r still matters to 1e-17 of the lowest (geometric decay e^(−ν(λ−|ρ|))).</summary>
    internal static int OrdersNeeded(double lambda, double rho, int slots)
    {
        double decay = lambda - Math.Abs(rho);
        if (decay <= 0) return int.MaxValue;
        return (int)Math.Min(2_000_000, Math.Ceiling(40 / decay) + 2 * slots);
    }
}
