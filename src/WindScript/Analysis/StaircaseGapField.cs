using System.Numerics;

namespace WindScript.Analysis;

/// <summary>
/// The exact 2-D gap field of a whole MMF staircase: the sum over every harmonic of
/// <see cref="AnnularGapField"/>. The staircase comes from ampere-conductors A_s concentrated
/// at the slot centres θ_s = 2π(s + ½)/Q on the stator surface, so F̂_ν = S(ν)/(jπν) with
/// S(ν) = Σ_s A_s e^(−jνθ_s) and
///   B_r(r, θ) = μ0/(πr) Σ_ν cosh(νρ)/sinh(νλ) · Im(S(ν) e^(jνθ)),  ρ = ln(r/c).
/// Near the stator the series converges slowly (a conductor on the surface has a 1/distance
/// field), so its leading part e^(−ν(λ−|ρ|)) is summed in closed form per slot,
/// Σ_ν zⁿ = z/(1 − z) with z = e^(−(λ−|ρ|) + j(θ − θ_s)), and only a geometrically decaying
/// remainder is summed term by term. At the stator surface itself the field is infinite at the
/// conductors; <see cref="PeakAtStatorTeeth"/> reads it at the tooth centres, midway between slots,
/// where the staircase is flat.
/// </summary>
internal sealed class StaircaseGapField
{
    private readonly double[] _ampereConductors;
    private readonly Complex[] _slotSums;     // S(ν) for ν = 0..Q−1; S(ν + Q) = −S(ν)
    private readonly double _lambda;

    public StaircaseGapField(ReadOnlySpan<double> slotAmpereConductors, double statorRadius, double rotorRadius)
    {
        if (!(statorRadius > 0 && rotorRadius > 0 && statorRadius != rotorRadius))
            throw new ArgumentOutOfRangeException(nameof(rotorRadius), "The stator and rotor radii must be positive and differ.");
        StatorRadius = statorRadius;
        RotorRadius = rotorRadius;
        _lambda = Math.Abs(Math.Log(statorRadius / rotorRadius));
        _ampereConductors = slotAmpereConductors.ToArray();
        int q = _ampereConductors.Length;
        _slotSums = new Complex[q];
        for (int v = 0; v < q; v++)
        {
            Complex sum = Complex.Zero;
            for (int s = 0; s < q; s++) sum += _ampereConductors[s] * Complex.FromPolarCoordinates(1, -v * SlotAngle(s, q));
            _slotSums[v] = sum;
        }
    }

    public double StatorRadius { get; }
    public double RotorRadius { get; }
    public int Slots => _ampereConductors.Length;

    private static double SlotAngle(int slot, int slots) => 2 * Math.PI * (slot + 0.5) / slots;

    private Complex SlotSum(int order)
    {
        int q = _slotSums.Length, period = order / q;
        var s = _slotSums[order % q];
        return period % 2 == 0 ? s : -s;
    }

    /// <summary>Radial flux density (T) at radius r (between the two surfaces) and angle θ.</summary>
    public double RadialAt(double radius, double theta) => Evaluate(radius, theta).Radial;

    /// <summary>Tangential flux density (T) at radius r and angle θ (positive towards increasing θ).</summary>
    public double TangentialAt(double radius, double theta) => Evaluate(radius, theta).Tangential;

    /// <summary>Both components (T) at radius r and angle θ.</summary>
    public (double Radial, double Tangential) Evaluate(double radius, double theta)
    {
        int q = Slots;
        if (q == 0) return (0, 0);
        double rho = Math.Log(radius / RotorRadius);
        double absRho = Math.Min(Math.Abs(rho), _lambda), eps = _lambda - absRho;
        // Closed-form part: Σ_ν e^(−νε) e^(jν(θ−θ_s)) = z/(1 − z) per slot.
        double radial = 0, tangential = 0;
        for (int s = 0; s < q; s++)
        {
            if (_ampereConductors[s] == 0) continue;
            double x = theta - SlotAngle(s, q);
            var z = Complex.FromPolarCoordinates(Math.Exp(-eps), x);
            var one = Complex.One - z;
            if (one.Magnitude < 1e-300) return (double.PositiveInfinity, 0);   // on a conductor
            var sum = z / one;
            radial += _ampereConductors[s] * sum.Imaginary;
            tangential += _ampereConductors[s] * sum.Real;
        }
        // Remainder: e^(−νε)·(e^(−2ν|ρ|) ± e^(−2νλ))/(1 − e^(−2νλ)), decaying at least as e^(−νλ).
        var (radialTerms, tangentialTerms) = RemainderTerms(absRho, eps);
        var step = Complex.FromPolarCoordinates(1, theta);
        var turn = step;
        for (int v = 1; v <= radialTerms.Length; v++, turn *= step)
        {
            var t = SlotSum(v) * turn;
            radial += radialTerms[v - 1] * t.Imaginary;
            tangential += tangentialTerms[v - 1] * t.Real;
        }
        double scale = AirGapField.Mu0 / (Math.PI * radius);
        return (scale * radial, Math.Sign(rho) * scale * tangential);
    }

    private (double AbsRho, double[] Radial, double[] Tangential)? _terms;

    /// <summary>The remainder coefficients of one radius, computed once and kept for the next call at the same radius.</summary>
    private (double[] Radial, double[] Tangential) RemainderTerms(double absRho, double eps)
    {
        if (_terms is { } cached && cached.AbsRho == absRho) return (cached.Radial, cached.Tangential);
        int limit = AnnularGapField.OrdersNeeded(_lambda, 0, Slots);
        var radial = new List<double>();
        var tangential = new List<double>();
        for (int v = 1; v <= limit; v++)
        {
            double e = Math.Exp(-v * eps), a = Math.Exp(-2 * v * absRho), l = Math.Exp(-2 * v * _lambda), d = 1 - l;
            if (e * (a + l) < 1e-18 * d) break;
            radial.Add(e * (a + l) / d);
            tangential.Add(e * (l - a) / d);
        }
        _terms = (absRho, radial.ToArray(), tangential.ToArray());
        return (_terms.Value.Radial, _terms.Value.Tangential);
    }

    /// <summary>
    /// B_r (T) at radius r on the grid θ_j = 2πj/n: the closed-form part per slot and point, the
    /// remainder folded onto the grid (e^(jνθ_j) has period n in ν) and summed by one inverse FFT,
    /// exact on the grid.
    /// </summary>
    public double[] SampleRadial(double radius, int points)
    {
        int q = Slots;
        var result = new double[points];
        if (q == 0) return result;
        double rho = Math.Log(radius / RotorRadius);
        double absRho = Math.Min(Math.Abs(rho), _lambda), eps = _lambda - absRho;
        var (radialTerms, _) = RemainderTerms(absRho, eps);
        var buckets = new Complex[points];
        for (int v = 1; v <= radialTerms.Length; v++) buckets[v % points] += radialTerms[v - 1] * SlotSum(v);
        MathNet.Numerics.IntegralTransforms.Fourier.Inverse(buckets, MathNet.Numerics.IntegralTransforms.FourierOptions.NoScaling);
        double scale = AirGapField.Mu0 / (Math.PI * radius), decay = Math.Exp(-eps);
        for (int j = 0; j < points; j++)
        {
            double theta = 2 * Math.PI * j / points, closed = 0;
            for (int s = 0; s < q; s++)
            {
                if (_ampereConductors[s] == 0) continue;
                var z = Complex.FromPolarCoordinates(decay, theta - SlotAngle(s, q));
                closed += _ampereConductors[s] * (z / (Complex.One - z)).Imaginary;
            }
            result[j] = scale * (closed + buckets[j].Imaginary);
        }
        return result;
    }

    /// <summary>Largest |B_r| (T) over the rotor surface (the field there is smooth).</summary>
    public double PeakAtRotor()
    {
        int q = Slots;
        if (q == 0) return 0;
        int n = q * 32;
        var samples = SampleRadial(RotorRadius, n);
        double h = 2 * Math.PI / n, best = -1, bestTheta = 0;
        for (int i = 0; i < n; i++)
            if (Math.Abs(samples[i]) > best) { best = Math.Abs(samples[i]); bestTheta = i * h; }
        // Golden-section refinement within one sample either side.
        double lo = bestTheta - h, hi = bestTheta + h, g = (Math.Sqrt(5) - 1) / 2;
        double x1 = hi - g * (hi - lo), x2 = lo + g * (hi - lo);
        double f1 = Math.Abs(RadialAt(RotorRadius, x1)), f2 = Math.Abs(RadialAt(RotorRadius, x2));
        for (int i = 0; i < 40 && hi - lo > 1e-12; i++)
        {
            if (f1 > f2) { hi = x2; x2 = x1; f2 = f1; x1 = hi - g * (hi - lo); f1 = Math.Abs(RadialAt(RotorRadius, x1)); }
            else { lo = x1; x1 = x2; f1 = f2; x2 = lo + g * (hi - lo); f2 = Math.Abs(RadialAt(RotorRadius, x2)); }
        }
        return Math.Max(best, Math.Max(f1, f2));
    }

    /// <summary>Largest |B_r| (T) on the stator surface at the tooth centres θ = 2π(s + 1)/Q.</summary>
    public double PeakAtStatorTeeth()
    {
        int q = Slots;
        double best = 0;
        for (int s = 0; s < q; s++) best = Math.Max(best, Math.Abs(RadialAt(StatorRadius, 2 * Math.PI * (s + 1) / q)));
        return best;
    }
}
