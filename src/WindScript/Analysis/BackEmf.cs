namespace WindScript.Analysis;

/// <summary>
/// Back-EMF of a phase linked by a sinusoidal p-pole-pair gap field of peak B̂ (T):
/// flux per pole Φ = (2/π)·B̂·τ_p·l = 2·B̂·r·l/p (r the bore radius, τ_p the pole pitch at the
/// bore), and E_rms = (2π/√2)·f·k_w1·N_s·Φ (common practice; Pyrhonen et al., ch. 2), with the
/// fundamental winding factor k_w1 including skew and N_s the series turns per phase.
/// </summary>
internal static class BackEmf
{
    /// <summary>Fundamental flux per pole (Wb).</summary>
    public static double FluxPerPole(double peakFluxDensity, double boreRadius, double stackLength, int polePairs) =>
        2 * peakFluxDensity * boreRadius * stackLength / polePairs;

    /// <summary>RMS EMF (V) at electrical frequency f (Hz).</summary>
    public static double Rms(double frequencyHz, double windingFactor, double seriesTurns, double fluxPerPole) =>
        Math.PI * Math.Sqrt(2) * frequencyHz * windingFactor * seriesTurns * fluxPerPole;
}
