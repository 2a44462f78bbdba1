using System.Text.Json.Serialization;
using WindScript.Analysis;

namespace WindScript.Cli.Output.Json;

// The public shape of `eval --format json` (schemas/eval.schema.json). These records belong to the
// output, not to the core: every field name is spelled out here, so renaming a core property can
// never rename a public field. Each record is built from its core counterpart by `From`.

/// <summary>Machine facts: Q, 2p, p, phases, q, periodicities and the cogging order.</summary>
public sealed record MachineJson(
    [property: JsonPropertyName("name")] string Name,
    [property: JsonPropertyName("slots")] int Slots,
    [property: JsonPropertyName("poles")] int Poles,
    [property: JsonPropertyName("polePairs")] int PolePairs,
    [property: JsonPropertyName("phases")] IReadOnlyList<string> Phases,
    [property: JsonPropertyName("phaseShiftDegrees")] double PhaseShiftDegrees,
    [property: JsonPropertyName("slotsPerPolePerPhase")] double SlotsPerPolePerPhase,
    [property: JsonPropertyName("periodicity")] int Periodicity,
    [property: JsonPropertyName("windingPeriodicity")] int WindingPeriodicity,
    [property: JsonPropertyName("halfPeriodReversal")] bool HalfPeriodReversal,
    [property: JsonPropertyName("adjacentOrders")] bool AdjacentOrders,
    [property: JsonPropertyName("coggingOrder")] int CoggingOrder)
{
    public static MachineJson From(MachineSummary m) => new(
        m.Name, m.Slots, m.Poles, m.PolePairs, m.Phases, m.PhaseShiftDegrees, m.SlotsPerPolePerPhase,
        m.Periodicity, m.WindingPeriodicity, m.HalfPeriodReversal, m.AdjacentOrders, m.CoggingOrder);
}

/// <summary>The regular-winding form (integer q and coil pitch in slots) when recognised.</summary>
public sealed record RegularJson(
    [property: JsonPropertyName("slotsPerPolePerPhase")] int SlotsPerPolePerPhase,
    [property: JsonPropertyName("coilPitch")] int CoilPitch)
{
    public static RegularJson? From(RegularWinding? r) => r is null ? null : new(r.SlotsPerPolePerPhase, r.CoilPitch);
}

/// <summary>Layers, paths, coils and skew of the winding.</summary>
public sealed record WindingJson(
    [property: JsonPropertyName("name")] string Name,
    [property: JsonPropertyName("layers")] int Layers,
    [property: JsonPropertyName("paths")] int Paths,
    [property: JsonPropertyName("coils")] int Coils,
    [property: JsonPropertyName("skewSlots")] double SkewSlots,
    [property: JsonPropertyName("regular")] RegularJson? Regular)
{
    public static WindingJson From(WindingSummary w) =>
        new(w.Name, w.Layers, w.Paths, w.Coils, w.SkewSlots, RegularJson.From(w.Regular));
}

/// <summary>One phase harmonic: winding, skew, distribution and pitch factors and MMF per ampere.</summary>
public sealed record PhaseHarmonicJson(
    [property: JsonPropertyName("order")] int Order,
    [property: JsonPropertyName("electricalOrder")] double ElectricalOrder,
    [property: JsonPropertyName("windingFactor")] double WindingFactor,
    [property: JsonPropertyName("skewFactor")] double SkewFactor,
    [property: JsonPropertyName("distributionFactor")] double? DistributionFactor,
    [property: JsonPropertyName("pitchFactor")] double? PitchFactor,
    [property: JsonPropertyName("mmfPerAmpere")] double MmfPerAmpere)
{
    public static PhaseHarmonicJson From(PhaseHarmonic h) => new(
        h.Order, h.ElectricalOrder, h.WindingFactor, h.SkewFactor, h.DistributionFactor, h.PitchFactor, h.MmfPerAmpere);
}

/// <summary>One phase: series turns, conductors per slot, axis and harmonics.</summary>
public sealed record PhaseJson(
    [property: JsonPropertyName("name")] string Name,
    [property: JsonPropertyName("index")] int Index,
    [property: JsonPropertyName("seriesTurns")] double SeriesTurns,
    [property: JsonPropertyName("conductors")] IReadOnlyList<int> Conductors,
    [property: JsonPropertyName("axisElectricalDegrees")] double AxisElectricalDegrees,
    [property: JsonPropertyName("harmonics")] IReadOnlyList<PhaseHarmonicJson> Harmonics)
{
    public static PhaseJson From(PhaseAnalysis p) => new(
        p.Name, p.Index, p.SeriesTurns, p.Conductors, p.AxisElectricalDegrees, [.. p.Harmonics.Select(PhaseHarmonicJson.From)]);
}

/// <summary>One order under balanced unit currents, relative to the working wave.</summary>
public sealed record BalancedWaveJson(
    [property: JsonPropertyName("order")] int Order,
    [property: JsonPropertyName("electricalOrder")] double ElectricalOrder,
    [property: JsonPropertyName("forward")] double Forward,
    [property: JsonPropertyName("backward")] double Backward)
{
    public static BalancedWaveJson From(BalancedWave w) => new(w.Order, w.ElectricalOrder, w.Forward, w.Backward);
}

/// <summary>The waves of balanced unit currents.</summary>
public sealed record BalancedJson(
    [property: JsonPropertyName("workingWave")] double WorkingWave,
    [property: JsonPropertyName("waves")] IReadOnlyList<BalancedWaveJson> Waves,
    [property: JsonPropertyName("subHarmonics")] IReadOnlyList<int> SubHarmonics,
    [property: JsonPropertyName("evenHarmonics")] IReadOnlyList<int> EvenHarmonics,
    [property: JsonPropertyName("interHarmonics")] IReadOnlyList<int> InterHarmonics)
{
    public static BalancedJson From(BalancedMmfWaves b) => new(
        b.WorkingWave, [.. b.Waves.Select(BalancedWaveJson.From)], b.SubHarmonics, b.EvenHarmonics, b.InterHarmonics);
}

/// <summary>Gap geometry: Carter's coefficient and radii in m.</summary>
public sealed record GapJson(
    [property: JsonPropertyName("carterCoefficient")] double? CarterCoefficient,
    [property: JsonPropertyName("gap")] double? Gap,
    [property: JsonPropertyName("effectiveGap")] double? EffectiveGap,
    [property: JsonPropertyName("boreRadius")] double? BoreRadius,
    [property: JsonPropertyName("rotorRadius")] double? RotorRadius,
    [property: JsonPropertyName("rotorOutside")] bool RotorOutside)
{
    public static GapJson From(GapSummary g) => new(g.CarterCoefficient, g.Gap, g.EffectiveGap, g.BoreRadius, g.RotorRadius, g.RotorOutside);
}

/// <summary>Air-gap self and mutual inductances (H) and the synchronous inductance.</summary>
public sealed record InductancesJson(
    [property: JsonPropertyName("matrix")] IReadOnlyList<IReadOnlyList<double>> Matrix,
    [property: JsonPropertyName("synchronous")] double Synchronous,
    [property: JsonPropertyName("meanRadius")] double MeanRadius,
    [property: JsonPropertyName("effectiveGap")] double EffectiveGap,
    [property: JsonPropertyName("thickGap")] bool ThickGap)
{
    public static InductancesJson? From(InductanceMatrix? i) =>
        i is null ? null : new([.. i.Matrix.Select(row => (IReadOnlyList<double>)row)], i.Synchronous, i.MeanRadius, i.EffectiveGap, i.ThickGap);
}

/// <summary>EMF constants of one phase.</summary>
public sealed record PhaseEmfJson(
    [property: JsonPropertyName("name")] string Name,
    [property: JsonPropertyName("windingFactor")] double WindingFactor,
    [property: JsonPropertyName("voltsPerHertz")] double VoltsPerHertz,
    [property: JsonPropertyName("voltsPer1000Rpm")] double VoltsPer1000Rpm)
{
    public static PhaseEmfJson From(PhaseEmf e) => new(e.Name, e.WindingFactor, e.VoltsPerHertz, e.VoltsPer1000Rpm);
}

/// <summary>Back-EMF for the declared fundamental gap flux density.</summary>
public sealed record BackEmfJson(
    [property: JsonPropertyName("peakFluxDensity")] double PeakFluxDensity,
    [property: JsonPropertyName("fluxPerPole")] double FluxPerPole,
    [property: JsonPropertyName("phases")] IReadOnlyList<PhaseEmfJson> Phases)
{
    public static BackEmfJson? From(BackEmfSummary? b) =>
        b is null ? null : new(b.PeakFluxDensity, b.FluxPerPole, [.. b.Phases.Select(PhaseEmfJson.From)]);
}
