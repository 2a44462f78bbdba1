using System.Text.Json.Serialization;
using WindScript.Analysis;

namespace WindScript.Cli.Output.Json;

/// <summary>One travelling wave of a drive: order, frequency, amplitudes, speed and kind.</summary>
public sealed record TravellingWaveJson(
    [property: JsonPropertyName("order")] int Order,
    [property: JsonPropertyName("electricalOrder")] double ElectricalOrder,
    [property: JsonPropertyName("frequencyHz")] double FrequencyHz,
    [property: JsonPropertyName("forward")] double Forward,
    [property: JsonPropertyName("backward")] double Backward,
    [property: JsonPropertyName("standing")] double Standing,
    [property: JsonPropertyName("speedRadPerSecond")] double SpeedRadPerSecond,
    [property: JsonPropertyName("speedRpm")] double SpeedRpm,
    [property: JsonPropertyName("kind")] string Kind)
{
    public static TravellingWaveJson From(TravellingWave w) => new(
        w.Order, w.ElectricalOrder, w.FrequencyHz, w.Forward, w.Backward, w.Standing, w.SpeedRadPerSecond, w.SpeedRpm, KindName(w.Kind));

    /// <summary>The schema's enum: "forward", "backward", "pulsating", "elliptic", "standing".</summary>
    public static string KindName(WaveKind kind) => kind switch
    {
        WaveKind.Forward => "forward",
        WaveKind.Backward => "backward",
        WaveKind.Pulsating => "pulsating",
        WaveKind.Elliptic => "elliptic",
        WaveKind.Standing => "standing",
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, null),
    };
}

/// <summary>Amplitude of one order of the MMF staircase at the instant.</summary>
public sealed record MmfHarmonicJson(
    [property: JsonPropertyName("order")] int Order,
    [property: JsonPropertyName("electricalOrder")] double ElectricalOrder,
    [property: JsonPropertyName("amplitude")] double Amplitude)
{
    public static MmfHarmonicJson From(MmfHarmonic h) => new(h.Order, h.ElectricalOrder, h.Amplitude);
}

/// <summary>Field figures of one MMF amplitude: thin gap (Carter), the flux-tube (1/r) approximation and the exact 2-D field.</summary>
public sealed record GapFieldJson(
    [property: JsonPropertyName("mmf")] double Mmf,
    [property: JsonPropertyName("effectiveGap")] double EffectiveGap,
    [property: JsonPropertyName("fieldStrength")] double FieldStrength,
    [property: JsonPropertyName("fluxDensity")] double FluxDensity,
    [property: JsonPropertyName("constantFieldFluxDensity")] double ConstantFieldFluxDensity,
    [property: JsonPropertyName("radialFluxDensityAtRotor")] double RadialFluxDensityAtRotor,
    [property: JsonPropertyName("radialFluxDensityAtBore")] double RadialFluxDensityAtBore,
    [property: JsonPropertyName("rotorDeviation")] double RotorDeviation,
    [property: JsonPropertyName("boreDeviation")] double BoreDeviation,
    [property: JsonPropertyName("exactFluxDensityAtRotor")] double ExactFluxDensityAtRotor,
    [property: JsonPropertyName("exactFluxDensityAtBore")] double ExactFluxDensityAtBore,
    [property: JsonPropertyName("fluxTubeDeviationAtRotor")] double FluxTubeDeviationAtRotor,
    [property: JsonPropertyName("fluxTubeDeviationAtBore")] double FluxTubeDeviationAtBore)
{
    public static GapFieldJson? From(GapField? f) => f is null ? null : new(
        f.Mmf, f.EffectiveGap, f.FieldStrength, f.FluxDensity, f.ConstantFieldFluxDensity,
        f.RadialFluxDensityAtRotor, f.RadialFluxDensityAtBore, f.RotorDeviation, f.BoreDeviation,
        f.ExactFluxDensityAtRotor, f.ExactFluxDensityAtBore, f.FluxTubeDeviationAtRotor, f.FluxTubeDeviationAtBore);
}

/// <summary>A drive at the instant: currents, waves, MMF staircase, field and back-EMF.</summary>
public sealed record DriveJson(
    [property: JsonPropertyName("name")] string Name,
    [property: JsonPropertyName("time")] double Time,
    [property: JsonPropertyName("currents")] IReadOnlyList<double> Currents,
    [property: JsonPropertyName("harmonics")] IReadOnlyList<TravellingWaveJson> Harmonics,
    [property: JsonPropertyName("mmf")] IReadOnlyList<double> Mmf,
    [property: JsonPropertyName("peakMmf")] double PeakMmf,
    [property: JsonPropertyName("mmfHarmonics")] IReadOnlyList<MmfHarmonicJson> MmfHarmonics,
    [property: JsonPropertyName("peakField")] GapFieldJson? PeakField,
    [property: JsonPropertyName("fundamentalField")] GapFieldJson? FundamentalField,
    [property: JsonPropertyName("backEmfFrequencyHz")] double? BackEmfFrequencyHz,
    [property: JsonPropertyName("backEmfRms")] IReadOnlyList<double> BackEmfRms)
{
    public static DriveJson From(DriveAnalysis d) => new(
        d.Name, d.Time, d.Currents, [.. d.Harmonics.Select(TravellingWaveJson.From)], d.Mmf, d.PeakMmf,
        [.. d.MmfHarmonics.Select(MmfHarmonicJson.From)], GapFieldJson.From(d.PeakField), GapFieldJson.From(d.FundamentalField),
        d.BackEmfFrequencyHz, d.BackEmfRms);
}
