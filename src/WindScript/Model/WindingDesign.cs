using System.Collections.Immutable;
using WindScript.Text;

namespace WindScript.Model;

/// <summary>
/// The evaluated, immutable description of one machine: core, phases, one winding and its
/// drives. This is what every analysis, check and output reads. Build it by evaluating source
/// (see <c>Compilation</c>) or directly in code.
/// </summary>
public sealed record WindingDesign
{
    /// <summary>The machine's name, as written after <c>machine</c>.</summary>
    public required string Name { get; init; }

    /// <summary>Number of slots Q, numbered from 1.</summary>
    public required int Slots { get; init; }

    /// <summary>Number of poles, 2p (always even).</summary>
    public required int Poles { get; init; }

    /// <summary>Pole pairs p.</summary>
    public int PolePairs => Poles / 2;

    /// <summary>The phases, in order.</summary>
    public required ImmutableArray<Phase> Phases { get; init; }

    /// <summary>Intended electrical angle between the axes of successive phases, in degrees.</summary>
    public required double PhaseShiftDegrees { get; init; }

    /// <summary>Core dimensions (bore, stack, gap, slot opening, skew...).</summary>
    public Geometry Geometry { get; init; } = new();

    /// <summary>The winding: layers, paths and coils.</summary>
    public required Winding Winding { get; init; }

    /// <summary>The slot's cross-section, if the file has a slot block.</summary>
    public SlotGeometry? Slot { get; init; }

    /// <summary>The conductor, end windings and temperature, if the file has a conductor block.</summary>
    public ConductorSpec? Conductor { get; init; }

    /// <summary>The operating points (drives), in source order.</summary>
    public ImmutableArray<Drive> Drives { get; init; } = [];

    /// <summary>Defaults the evaluator applied that change results, worded for people ("phase shift 120 deg (default 360/m)").</summary>
    public ImmutableArray<string> Defaults { get; init; } = [];

    /// <summary>Where the machine block is in the source.</summary>
    public TextSpan MachineSpan { get; init; }

    /// <summary>The span of the <c>machine</c> keyword, where whole-machine diagnostics point.</summary>
    public TextSpan MachineKeywordSpan { get; init; }
    /// <summary>Where <c>slots</c> is written.</summary>
    public TextSpan SlotsSpan { get; init; }
    /// <summary>Where <c>poles</c> is written.</summary>
    public TextSpan PolesSpan { get; init; }
    /// <summary>Where <c>phases</c> is written.</summary>
    public TextSpan PhasesSpan { get; init; }

    /// <summary>Machine periodicity t = gcd(Q, p).</summary>
    public int Periodicity => (int)Numerics.IntegerMath.Gcd(Slots, PolePairs);

    /// <summary>
    /// Signed conductors per phase, slot and layer, computed once per design instance and kept
    /// outside it (<see cref="ConductorMatrix.Of"/>), so the design stays a plain immutable value.
    /// </summary>
    public ConductorMatrix Conductors => ConductorMatrix.Of(this);

    /// <summary>Slots per pole per phase q = Q/(2p·m) (0 without poles or phases).</summary>
    public double SlotsPerPolePerPhase => Poles == 0 || Phases.Length == 0 ? 0 : (double)Slots / (Poles * Phases.Length);

    /// <summary>
    /// Winding factor of a phase at mechanical order ν, skew included: the numeric factor of the
    /// conductor model (<see cref="Analysis.WindingSpectrum.WindingFactor"/>) times the one skew
    /// formula (<see cref="Analysis.ClosedFormFactors.Skew"/>).
    /// </summary>
    public double WindingFactor(int phase, int order) =>
        Analysis.WindingSpectrum.Of(this).WindingFactor(phase, order) * Analysis.ClosedFormFactors.Skew(order, Geometry.SkewSlots, Slots);

    /// <summary>Winding factor of a phase at the working order ν = p, skew included.</summary>
    public double FundamentalWindingFactor(int phase) => WindingFactor(phase, PolePairs);

    /// <summary>Turns of the phase before dividing into paths, from the conductor model: Σ|n| over its sides / 2.</summary>
    public int TotalTurns(int phase) => Analysis.WindingSpectrum.Of(this).SideTurns(phase) / 2;

    /// <summary>
    /// Series turns per phase from the conductor model (the one the winding factors come from):
    /// Σ|n| over the phase's sides / 2 / parallel paths.
    /// </summary>
    public double SeriesTurns(int phase) => Analysis.WindingSpectrum.Of(this).SeriesTurns(phase);
}
