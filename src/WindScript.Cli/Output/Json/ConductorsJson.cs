using System.Text.Json.Serialization;
using WindScript.Analysis.Conductors;

namespace WindScript.Cli.Output.Json;

// Conductors and slots (#15) in `eval --format json`: SI units (m, m2, ohm, ohm m, kg, H, W, A/m2, N m), temperatures in degC.

/// <summary>The fill of the fullest slot.</summary>
public sealed record SlotFillJson(
    [property: JsonPropertyName("shape")] string Shape,
    [property: JsonPropertyName("grossArea")] double GrossArea,
    [property: JsonPropertyName("netArea")] double NetArea,
    [property: JsonPropertyName("strandsPerSlot")] int StrandsPerSlot,
    [property: JsonPropertyName("strandCopperArea")] double StrandCopperArea,
    [property: JsonPropertyName("strandInsulatedArea")] double StrandInsulatedArea,
    [property: JsonPropertyName("copperArea")] double CopperArea,
    [property: JsonPropertyName("insulatedArea")] double InsulatedArea,
    [property: JsonPropertyName("grossFill")] double GrossFill,
    [property: JsonPropertyName("netFill")] double NetFill,
    [property: JsonPropertyName("packingLimit")] double PackingLimit,
    [property: JsonPropertyName("fillLimit")] double FillLimit,
    [property: JsonPropertyName("opening")] double? Opening,
    [property: JsonPropertyName("strandWidth")] double StrandWidth)
{
    public static SlotFillJson? From(SlotFill? f) => f is null ? null : new(f.Shape, f.GrossArea, f.NetArea, f.StrandsPerSlot, f.StrandCopperArea,
        f.StrandInsulatedArea, f.CopperArea, f.InsulatedArea, f.GrossFill, f.NetFill, f.PackingLimit, f.FillLimit, f.Opening, f.StrandWidth);
}

/// <summary>One phase's turn length and resistances.</summary>
public sealed record PhaseResistanceJson(
    [property: JsonPropertyName("name")] string Name,
    [property: JsonPropertyName("meanTurnLength")] double MeanTurnLength,
    [property: JsonPropertyName("conductorLength")] double ConductorLength,
    [property: JsonPropertyName("resistance20")] double Resistance20,
    [property: JsonPropertyName("resistanceAtTemperature")] double ResistanceAtTemperature)
{
    public static PhaseResistanceJson From(PhaseResistanceFigures p) => new(p.Name, p.MeanTurnLength, p.ConductorLength, p.Resistance20, p.ResistanceHot);
}

/// <summary>Material, temperature, resistivities, coil-end length, mass and phase resistances.</summary>
public sealed record ResistanceJson(
    [property: JsonPropertyName("material")] string Material,
    [property: JsonPropertyName("temperature")] double Temperature,
    [property: JsonPropertyName("resistivity20")] double Resistivity20,
    [property: JsonPropertyName("resistivityAtTemperature")] double ResistivityAtTemperature,
    [property: JsonPropertyName("endLength")] double EndLength,
    [property: JsonPropertyName("mass")] double Mass,
    [property: JsonPropertyName("phases")] IReadOnlyList<PhaseResistanceJson> Phases)
{
    public static ResistanceJson? From(WindingResistance? r) => r is null ? null :
        new(r.Material, r.Temperature, r.Resistivity20, r.ResistivityHot, r.EndLength, r.Mass, [.. r.Phases.Select(PhaseResistanceJson.From)]);
}

/// <summary>Per-phase inductances for balanced currents (H) and the slot's permeance factors.</summary>
public sealed record PhaseInductancesJson(
    [property: JsonPropertyName("magnetising")] double? Magnetising,
    [property: JsonPropertyName("slotLeakage")] double? SlotLeakage,
    [property: JsonPropertyName("toothTipLeakage")] double? ToothTipLeakage,
    [property: JsonPropertyName("endWindingLeakage")] double? EndWindingLeakage,
    [property: JsonPropertyName("skewLeakage")] double? SkewLeakage,
    [property: JsonPropertyName("differentialLeakageInductance")] double? DifferentialLeakageInductance,
    [property: JsonPropertyName("totalLeakage")] double? TotalLeakage,
    [property: JsonPropertyName("completeSynchronous")] double? CompleteSynchronous,
    [property: JsonPropertyName("slotPermeance")] double? SlotPermeance,
    [property: JsonPropertyName("toothTipPermeance")] double? ToothTipPermeance)
{
    public static PhaseInductancesJson? From(PhaseInductanceSet? l) => l is null ? null : new(l.Magnetising, l.SlotLeakage, l.ToothTipLeakage,
        l.EndWindingLeakage, l.SkewLeakage, l.DifferentialLeakageInductance, l.TotalLeakage, l.CompleteSynchronous, l.SlotPermeance, l.ToothTipPermeance);
}

/// <summary>A drive's current density, copper loss, reactance and torque.</summary>
public sealed record DriveConductorsJson(
    [property: JsonPropertyName("name")] string Name,
    [property: JsonPropertyName("frequencyHz")] double? FrequencyHz,
    [property: JsonPropertyName("phaseCurrentRms")] double PhaseCurrentRms,
    [property: JsonPropertyName("currentDensity")] double? CurrentDensity,
    [property: JsonPropertyName("copperLoss")] double? CopperLoss,
    [property: JsonPropertyName("synchronousReactance")] double? SynchronousReactance,
    [property: JsonPropertyName("currentAngleDegrees")] double CurrentAngleDegrees,
    [property: JsonPropertyName("torque")] double? Torque)
{
    public static DriveConductorsJson From(DriveConductorFigures d) =>
        new(d.Name, d.FrequencyHz, d.PhaseCurrentRms, d.CurrentDensity, d.CopperLoss, d.SynchronousReactance, d.CurrentAngleDegrees, d.Torque);
}

/// <summary>Everything about conductors and slots; null in the document when the file has neither a slot nor a conductor block.</summary>
public sealed record ConductorsJson(
    [property: JsonPropertyName("fill")] SlotFillJson? Fill,
    [property: JsonPropertyName("resistance")] ResistanceJson? Resistance,
    [property: JsonPropertyName("inductances")] PhaseInductancesJson? Inductances,
    [property: JsonPropertyName("torqueConstant")] double? TorqueConstant,
    [property: JsonPropertyName("drives")] IReadOnlyList<DriveConductorsJson> Drives,
    [property: JsonPropertyName("sources")] IReadOnlyList<string> Sources,
    [property: JsonPropertyName("notes")] IReadOnlyList<string> Notes)
{
    public static ConductorsJson? From(ConductorFigures? c) => c is null ? null : new(SlotFillJson.From(c.Fill), ResistanceJson.From(c.Resistance),
        PhaseInductancesJson.From(c.Inductances), c.TorqueConstant, [.. c.Drives.Select(DriveConductorsJson.From)], c.Sources, c.Notes);
}
