using System.Collections.Immutable;

namespace WindScript.Analysis.Conductors;

/// <summary>
/// The conductor and slot figures of a design (SI: m, m², Ω, kg, H, W, A/m², N·m; temperatures in degC).
/// Null parts need inputs the file does not give (the notes say which).
/// </summary>
public sealed record ConductorFigures(
    SlotFill? Fill,
    WindingResistance? Resistance,
    PhaseInductanceSet? Inductances,
    double? TorqueConstant,
    ImmutableArray<DriveConductorFigures> Drives,
    ImmutableArray<string> Sources,
    ImmutableArray<string> Notes);

/// <summary>
/// The fill of the fullest slot: slot areas (gross: the conductor region inside the iron, or the area as
/// given; net: inside liner and separator), strands in it, one strand's copper and insulated area, the
/// fill factors (gross: copper over gross area; net: insulated conductors over net area), the packing
/// limit and the fill limit the checks use, the opening and the narrowest insulated strand width.
/// </summary>
public sealed record SlotFill(
    string Shape,
    double GrossArea,
    double NetArea,
    int StrandsPerSlot,
    double StrandCopperArea,
    double StrandInsulatedArea,
    double CopperArea,
    double InsulatedArea,
    double GrossFill,
    double NetFill,
    double PackingLimit,
    double FillLimit,
    double? Opening,
    double StrandWidth);

/// <summary>Resistance figures: temperature, resistivities, coil-end length, and per phase the mean turn length and resistances; the winding's conductor mass.</summary>
public sealed record WindingResistance(
    string Material,
    double Temperature,
    double Resistivity20,
    double ResistivityHot,
    double EndLength,
    double Mass,
    ImmutableArray<PhaseResistanceFigures> Phases);

/// <summary>One phase: mean length of turn (m), total conductor length (m), resistance at 20 degC and at the operating temperature (Ω).</summary>
public sealed record PhaseResistanceFigures(string Name, double MeanTurnLength, double ConductorLength, double Resistance20, double ResistanceHot);

/// <summary>
/// Per-phase inductances for balanced currents (H): magnetising, slot, tooth-tip, end-winding, skew
/// and differential leakage, their sum (the total leakage) and the complete synchronous inductance L_m + L_σ (not the air-gap one of <see cref="AnalysisResult.Inductances"/>); null where
/// an input is missing. Also the slot permeance factors λ (÷ μ0 per unit length) of the slot.
/// </summary>
public sealed record PhaseInductanceSet(
    double? Magnetising,
    double? SlotLeakage,
    double? ToothTipLeakage,
    double? EndWindingLeakage,
    double? SkewLeakage,
    double? DifferentialLeakageInductance,
    double? TotalLeakage,
    double? CompleteSynchronous,
    double? SlotPermeance,
    double? ToothTipPermeance);

/// <summary>
/// A drive: its frequency (Hz, the strongest AC component), the largest phase rms current (A), the rms
/// current density (A/m²), copper loss at the operating temperature (W), synchronous reactance (Ω),
/// current angle (deg electrical) and torque (N·m) when a gap flux density is stated.
/// </summary>
public sealed record DriveConductorFigures(
    string Name,
    double? FrequencyHz,
    double PhaseCurrentRms,
    double? CurrentDensity,
    double? CopperLoss,
    double? SynchronousReactance,
    double CurrentAngleDegrees,
    double? Torque);
