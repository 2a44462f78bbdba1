using System.Collections.Immutable;

namespace WindScript.Analysis;

/// <summary>What to evaluate: the highest electrical order shown and the instant for MMF and field.</summary>
public sealed record AnalysisOptions
{
    /// <summary>Highest electrical order n = ν/p reported (mechanical orders 1..n·p).</summary>
    public int MaxElectricalOrder { get; init; } = 25;

    /// <summary>The instant (s) at which the MMF staircase and the field are taken.</summary>
    public double Time { get; init; }
}

/// <summary>
/// Everything <c>eval</c> shows for one design. Plain records with JSON-friendly members
/// (no NaN: undefined figures are null). Orders are mechanical (cycles per revolution);
/// electrical orders are ν/p and may be fractional.
/// </summary>
public sealed record AnalysisResult(
    MachineSummary Machine,
    WindingSummary Winding,
    ImmutableArray<PhaseAnalysis> Phases,
    double? DifferentialLeakage,
    BalancedMmfWaves Balanced,
    GapSummary Gap,
    InductanceMatrix? Inductances,
    BackEmfSummary? BackEmf,
    ImmutableArray<DriveAnalysis> Drives,
    ImmutableArray<string> Assumptions,
    ImmutableArray<string> Defaults,
    ImmutableArray<string> Notes,
    Conductors.ConductorFigures? Conductors = null);

/// <summary>Core facts: Q, 2p, p, phases, q = Q/(2pm), periodicities and cogging order lcm(Q, 2p).</summary>
public sealed record MachineSummary(
    string Name,
    int Slots,
    int Poles,
    int PolePairs,
    ImmutableArray<string> Phases,
    double PhaseShiftDegrees,
    double SlotsPerPolePerPhase,
    int Periodicity,
    int WindingPeriodicity,
    bool HalfPeriodReversal,
    bool AdjacentOrders,
    int CoggingOrder);

/// <summary>The winding as built: layers, paths, coils, skew, and the regular-winding form if recognised.</summary>
public sealed record WindingSummary(string Name, int Layers, int Paths, int Coils, double SkewSlots, RegularWinding? Regular);

/// <summary>One phase: series turns, signed conductors per slot (layers summed), axis and harmonics.</summary>
public sealed record PhaseAnalysis(
    string Name,
    int Index,
    double SeriesTurns,
    ImmutableArray<int> Conductors,
    double AxisElectricalDegrees,
    ImmutableArray<PhaseHarmonic> Harmonics);

/// <summary>
/// A phase harmonic: the winding factor (numeric, with skew), the skew factor, the closed-form
/// distribution and pitch factors for a regular winding (null otherwise) and the MMF wave
/// amplitude per ampere of phase current (A-turns/A, skew not applied).
/// </summary>
public sealed record PhaseHarmonic(
    int Order,
    double ElectricalOrder,
    double WindingFactor,
    double SkewFactor,
    double? DistributionFactor,
    double? PitchFactor,
    double MmfPerAmpere);

/// <summary>
/// The waves balanced unit currents produce (peak 1 A per phase, at the design's phase shift):
/// the working wave in A-turns and every other wave relative to it, with the orders that are
/// sub-harmonics (ν &lt; p), even electrical harmonics, and inter-harmonics (fractional n &gt; 1).
/// </summary>
public sealed record BalancedMmfWaves(
    double WorkingWave,
    ImmutableArray<BalancedWave> Waves,
    ImmutableArray<int> SubHarmonics,
    ImmutableArray<int> EvenHarmonics,
    ImmutableArray<int> InterHarmonics);

/// <summary>One order under balanced currents: forward and backward amplitudes relative to the working wave.</summary>
public sealed record BalancedWave(int Order, double ElectricalOrder, double Forward, double Backward);

/// <summary>
/// Gap geometry used: Carter's coefficient and the radii (m); null where the geometry is missing.
/// BoreRadius is the stator's gap surface: the bore, or the stator's outer surface when the rotor is outside.
/// </summary>
public sealed record GapSummary(
    double? CarterCoefficient,
    double? Gap,
    double? EffectiveGap,
    double? BoreRadius,
    double? RotorRadius,
    bool RotorOutside = false);

/// <summary>Back-EMF for the declared peak fundamental gap flux density.</summary>
public sealed record BackEmfSummary(double PeakFluxDensity, double FluxPerPole, ImmutableArray<PhaseEmf> Phases);

/// <summary>EMF constants of a phase: fundamental winding factor (with skew), V rms per Hz and per 1000 rpm.</summary>
public sealed record PhaseEmf(string Name, double WindingFactor, double VoltsPerHertz, double VoltsPer1000Rpm);

/// <summary>
/// A drive: phase currents at the instant, its travelling waves (every frequency and order),
/// the MMF staircase at the instant with its harmonic amplitudes, and the field figures of the
/// peak and of the fundamental at that instant (null without bore and gap).
/// </summary>
public sealed record DriveAnalysis(
    string Name,
    double Time,
    ImmutableArray<double> Currents,
    ImmutableArray<TravellingWave> Harmonics,
    ImmutableArray<double> Mmf,
    double PeakMmf,
    ImmutableArray<MmfHarmonic> MmfHarmonics,
    GapField? PeakField,
    GapField? FundamentalField,
    double? BackEmfFrequencyHz,
    ImmutableArray<double> BackEmfRms);

/// <summary>Amplitude (A-turns) of one order of the MMF staircase at the instant.</summary>
public sealed record MmfHarmonic(int Order, double ElectricalOrder, double Amplitude);
