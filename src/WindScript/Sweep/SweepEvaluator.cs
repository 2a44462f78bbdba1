using WindScript.Analysis;
using WindScript.Model;
using WindScript.Synthesis;

namespace WindScript.Sweep;

/// <summary>
/// Lays out and evaluates swept layouts, reusing its buffers (one evaluator per thread). The
/// figures are those of the analysis model: winding factors from the coils
/// (<see cref="CoilStarSpectrum"/>, equal to <see cref="Analysis.WindingFactors"/> to rounding),
/// differential leakage exact over all orders (<see cref="Analysis.DifferentialLeakage"/>).
/// </summary>
/// <remarks>
/// The synthesised phases are copies of phase 0 shifted by k·Δ slots, so S_k(ν) = S_0(ν)·e^(−j2πνkΔ/Q):
/// the balanced waves need only phase 0's spectrum times Σ_k e^(−jkβ), β = 2πνΔ/Q ∓ φ, which
/// vanishes exactly when m·β is a whole turn and β is not (tested in integers). The spectrum
/// repeats with period Q in the order and mirrors at Q/2, so orders 0..Q/2 decide every order.
/// </remarks>
internal sealed class SweepEvaluator
{
    private const double Negligible = MachineAnalysis.Negligible;

    private readonly SweepSpec _spec;
    private readonly Dictionary<int, PhaseBelts> _beltsByPhases;
    private PhaseBelts _belts;
    private readonly StarLayout _layout;
    private readonly CoilStarSpectrum _spectrum;
    private int[] _conductors;
    private double[] _factors;
    private bool[] _present;

    public SweepEvaluator(SweepSpec spec)
    {
        if (spec.Problem() is { } problem) throw new ArgumentException(problem, nameof(spec));
        _spec = spec;
        _beltsByPhases = spec.PhaseList.ToDictionary(m => m, m => PhaseBelts.ForPhases(m)!);
        _belts = _beltsByPhases[spec.PhaseList[0]];
        // Sized once for the largest slot count, so that memory stays flat along the sweep.
        int q = spec.SlotsTo;
        _layout = new StarLayout(q);
        _spectrum = new CoilStarSpectrum(q);
        _conductors = new int[spec.PhaseList[^1] * q];
        _factors = new double[q / 2 + 1];
        _present = new bool[q / 2 + 1];
    }

    /// <summary>Evaluates one candidate into <paramref name="record"/>; false if it admits no balanced layout (the record is then unchanged).</summary>
    public bool TryEvaluate(SweepCandidate candidate, SweepRecord record)
    {
        int q = candidate.Slots, poles = candidate.Poles, p = poles / 2, m = candidate.Phases;
        if (!_beltsByPhases.TryGetValue(m, out var belts)) throw new ArgumentException($"{m} phases are not in the sweep", nameof(candidate));
        _belts = belts;
        var outcome = WindingSynthesizer.LayWithRule(q, p, _belts, candidate.Layers, candidate.Pitch, _layout, out int pitch);
        if (outcome != LayoutOutcome.Balanced) return false;

        EnsureCapacity(q, m, p);
        var conductors = _conductors.AsSpan(0, m * q);
        for (int k = 0; k < m; k++) _layout.SlotConductors(k, conductors.Slice(k * q, q));
        int orders = _spec.Orders;
        var factors = _factors.AsSpan(0, q / 2 + 1);   // base band: factors[ν], ν = 0..Q/2
        _spectrum.Compute(_layout, 0, factors);
        if (record.WindingFactors.Length != orders) record.WindingFactors = new double[orders];
        for (int n = 1; n <= orders; n++)
        {
            long order = (long)n * p;
            record.WindingFactors[n - 1] = order % q == 0 ? 0 : factors[Fold(order, q)];
        }

        record.Slots = q;
        record.Poles = poles;
        record.Phases = m;
        record.Layers = candidate.Layers;
        record.Pitch = pitch;
        record.Periodicity = (int)WindScript.Numerics.IntegerMath.Gcd(q, p);
        record.CoggingOrder = (int)WindScript.Numerics.IntegerMath.Lcm(q, poles);
        record.Sections = _layout.Sections();
        record.DifferentialLeakage = DifferentialLeakage.Compute(conductors, m, p, _belts.PhaseShiftDegrees * Math.PI / 180);
        MarkPresentOrders(q, p, m, _layout.PhaseStep, factors);
        FillOrderFlags(q, p, record);
        return true;
    }

    // present[ν] for ν = 0..Q/2: does a wave of order ν exist under balanced currents (relative size above Negligible)?
    private void MarkPresentOrders(int q, int p, int m, int step, ReadOnlySpan<double> factors)
    {
        double working = Wave(p, q, m, step, factors);
        for (int v = 0; v <= q / 2; v++) _present[v] = working > 0 && Wave(v, q, m, step, factors) > Negligible * working;
    }

    // Size of the balanced wave of order ν, up to a factor common to all orders: k_w(ν)·max|Σ_k e^(−jkβ±)|/ν.
    private double Wave(int order, int q, int m, int step, ReadOnlySpan<double> factors)
    {
        if (order % q == 0) return 0;   // the net conductors of a balanced phase are zero
        long turn = (long)q * _belts.ShiftDenominator;                       // β in units of 1/(Q·den) turn
        long shift = (long)_belts.ShiftNumerator * q;                        // φ in the same units
        long along = (long)order % q * step % q * _belts.ShiftDenominator;   // ν·Δ/Q turns
        double g = Math.Max(Geometric(along - shift, turn, m), Geometric(along + shift, turn, m));
        return factors[Fold(order, q)] * g / order;
    }

    // |Σ_k e^(−jkβ)| for β = 2π·b/turn: exactly 0 when m·b is a whole number of turns and b is not.
    private static double Geometric(long b, long turn, int m)
    {
        b %= turn;
        if (b < 0) b += turn;
        if (b == 0) return m;
        if (b * m % turn == 0) return 0;   // b < Q·den and m ≤ 64: no overflow
        double beta = 2 * Math.PI * b / turn;
        return Math.Abs(Math.Sin(m * beta / 2) / Math.Sin(beta / 2));
    }

    // The base-band order (1..Q/2) with the same spectrum magnitude as order ν (which is not a multiple of Q).
    private static int Fold(long order, int q)
    {
        int r = (int)(order % q);
        return r <= q / 2 ? r : q - r;
    }

    private bool Present(int order, int q)
    {
        int r = order % q;
        return _present[r <= q / 2 ? r : q - r];
    }

    private void FillOrderFlags(int q, int p, SweepRecord record)
    {
        bool sub = false;
        for (int v = 1; v < p && v <= q && !sub; v++) sub = Present(v, q);
        record.Subharmonics = sub;
        int lowest = p;
        for (int v = 1; v < p && v <= q / 2; v++)
            if (Present(v, q)) { lowest = v; break; }
        record.LowestOrder = lowest;
        bool even = false;
        int evenPeriod = q / (int)WindScript.Numerics.IntegerMath.Gcd(2L * p, q);
        for (int k = 1; k <= evenPeriod && !even; k++) even = Present((int)(2L * k * p % q), q);
        record.EvenHarmonics = even;
        bool adjacent = false;
        for (int v = 1; v <= q && !adjacent; v++) adjacent = Present(v, q) && Present(v + 1, q);
        record.AdjacentOrders = adjacent;
    }

    private void EnsureCapacity(int q, int m, int p)
    {
        if (_conductors.Length < m * q) _conductors = new int[m * q];
        if (_factors.Length < q / 2 + 1) _factors = new double[q / 2 + 1];
        if (_present.Length < q / 2 + 1) _present = new bool[q / 2 + 1];
    }
}
