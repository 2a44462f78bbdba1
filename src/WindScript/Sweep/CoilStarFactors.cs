namespace WindScript.Sweep;

/// <summary>
/// Winding factors of one phase of a synthesised layout at mechanical orders 0..Q/2, from its
/// coils: every coil has the same pitch y, so the phase's slot spectrum factors into the star of
/// its go sides times the coil's own factor,
/// S(ν) = Σ_coils σ·e^(−jνθ_go)·(1 − e^(−j2πνy/Q)), hence
/// k_w(ν) = |Σ_coils σ·e^(−jνθ_go)| / coils · |sin(πνy/Q)| — the distribution factor of the go
/// sides times the pitch factor (Pyrhonen et al., ch. 2), exact for any single-pitch winding.
/// It equals the general computation from the coil sides (<see cref="Analysis.WindingFactors"/>)
/// to rounding, at a third of the work and with no dependency chain; tests hold them together.
/// </summary>
/// <remarks>Orders beyond Q/2 repeat: k_w(ν) = k_w(ν mod Q) mirrored at Q/2, and 0 at multiples of Q.</remarks>
internal sealed class CoilStarFactors(int slotCapacity)
{
    private int _slots = -1;
    private double[] _cos = [], _sin = [], _sinHalf = [];
    private double[] _re = [], _im = [];
    private int[] _goSlots = [], _polarity = [];
    private readonly int _capacity = slotCapacity;

    /// <summary>Fills factors[ν] for ν = 0..Q/2 (factors[0] = 0) for the coils of <paramref name="phase"/>.</summary>
    public void Compute(Synthesis.StarLayout layout, int phase, Span<double> factors)
    {
        int q = layout.Slots, half = q / 2, y = layout.Pitch;
        Prepare(q);
        int coils = 0;
        for (int s = 0; s < q; s++)
        {
            int polarity = layout.CoilAt(s);
            if (polarity == 0 || layout.PhaseAt(s, 0) != phase) continue;
            _goSlots[coils] = s;
            _polarity[coils++] = polarity;
        }
        var re = _re.AsSpan(0, half + 1);
        var im = _im.AsSpan(0, half + 1);
        re.Clear();
        im.Clear();
        for (int c = 0; c < coils; c++)
        {
            int step = _goSlots[c], index = 0;
            double sign = _polarity[c];
            for (int v = 1; v <= half; v++)
            {
                index += step;
                if (index >= q) index -= q;
                re[v] += sign * _cos[index];
                im[v] += sign * _sin[index];
            }
        }
        factors[0] = 0;
        double inverse = coils == 0 ? 0 : 1.0 / coils;
        int pitchIndex = 0;
        for (int v = 1; v <= half; v++)
        {
            pitchIndex += y;
            if (pitchIndex >= q) pitchIndex -= q;
            factors[v] = Math.Sqrt(re[v] * re[v] + im[v] * im[v]) * inverse * _sinHalf[pitchIndex];
        }
    }

    // Tables for Q: cos and sin of 2πk/Q, and |sin(πk/Q)|, k = 0..Q−1 (kept while Q stays the same).
    private void Prepare(int q)
    {
        if (q == _slots) return;
        _slots = q;
        if (_cos.Length < q)
        {
            int n = Math.Max(q, Math.Max(_capacity, 2 * _cos.Length));
            _cos = new double[n];
            _sin = new double[n];
            _sinHalf = new double[n];
            _goSlots = new int[n];
            _polarity = new int[n];
            _re = new double[n / 2 + 1];
            _im = new double[n / 2 + 1];
        }
        for (int k = 0; k < q; k++)
        {
            (_sin[k], _cos[k]) = Math.SinCos(2 * Math.PI * k / q);
            _sinHalf[k] = Math.Abs(Math.Sin(Math.PI * k / q));
        }
    }
}
