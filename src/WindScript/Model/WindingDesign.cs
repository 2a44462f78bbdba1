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
    public required string Name { get; init; }

    public required int Slots { get; init; }

    /// <summary>Number of poles, 2p (always even).</summary>
    public required int Poles { get; init; }

    public int PolePairs => Poles / 2;

    public required ImmutableArray<Phase> Phases { get; init; }

    /// <summary>Intended electrical angle between the axes of successive phases, in degrees.</summary>
    public required double PhaseShiftDegrees { get; init; }

    public Geometry Geometry { get; init; } = new();

    public required Winding Winding { get; init; }

    public ImmutableArray<Drive> Drives { get; init; } = [];

    /// <summary>Defaults the evaluator applied that change results, worded for people ("phase shift 120 deg (default 360/m)").</summary>
    public ImmutableArray<string> Defaults { get; init; } = [];

    public TextSpan MachineSpan { get; init; }

    /// <summary>The span of the <c>machine</c> keyword, where whole-machine diagnostics point.</summary>
    public TextSpan MachineKeywordSpan { get; init; }
    public TextSpan SlotsSpan { get; init; }
    public TextSpan PolesSpan { get; init; }
    public TextSpan PhasesSpan { get; init; }

    /// <summary>Machine periodicity t = gcd(Q, p).</summary>
    public int Periodicity => (int)Gcd(Slots, PolePairs);

    // Cached with the winding it was built from: a `with` copy that changes the winding or
    // the slot count must not reuse a stale matrix.
    private (Winding Winding, int Slots, int Phases, ConductorMatrix Matrix)? _conductors;

    /// <summary>Signed conductors per phase, slot and layer (computed once per winding).</summary>
    public ConductorMatrix Conductors
    {
        get
        {
            if (_conductors is { } c && ReferenceEquals(c.Winding, Winding) && c.Slots == Slots && c.Phases == Phases.Length)
                return c.Matrix;
            var m = ConductorMatrix.FromCoils(Phases.Length, Slots, Winding.Layers, Winding.Coils);
            _conductors = (Winding, Slots, Phases.Length, m);
            return m;
        }
    }

    /// <summary>Turns of all coils of a phase (before dividing into paths).</summary>
    public int TotalTurns(int phase)
    {
        int sum = 0;
        foreach (var c in Winding.Coils) if (c.Phase == phase) sum += c.Turns;
        return sum;
    }

    /// <summary>Series turns per phase: all turns of the phase divided by the parallel paths.</summary>
    public double SeriesTurns(int phase) => (double)TotalTurns(phase) / Math.Max(1, Winding.Paths);

    public static long Gcd(long a, long b)
    {
        a = Math.Abs(a); b = Math.Abs(b);
        while (b != 0) (a, b) = (b, a % b);
        return a;
    }

    public static long Lcm(long a, long b) => a == 0 || b == 0 ? 0 : Math.Abs(a / Gcd(a, b) * b);
}
