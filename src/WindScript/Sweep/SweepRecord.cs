namespace WindScript.Sweep;

/// <summary>
/// The figures of one swept layout. Orders are mechanical (cycles per revolution) unless named
/// electrical; the winding factors are those of every phase (the phases are identical copies).
/// An evaluator reuses one record for many layouts: copy what you keep.
/// </summary>
public sealed class SweepRecord
{
    /// <summary>Number of slots Q.</summary>
    public int Slots { get; internal set; }
    /// <summary>Number of poles 2p.</summary>
    public int Poles { get; internal set; }
    /// <summary>Number of phases m.</summary>
    public int Phases { get; internal set; }
    /// <summary>Number of layers (1 or 2).</summary>
    public int Layers { get; internal set; }
    /// <summary>Coil pitch in slots.</summary>
    public int Pitch { get; internal set; }

    /// <summary>Slots per pole per phase q = Q/(2p·m).</summary>
    public double SlotsPerPolePerPhase => (double)Slots / (Poles * Phases);

    /// <summary>Machine periodicity t = gcd(Q, p).</summary>
    public int Periodicity { get; internal set; }

    /// <summary>lcm(Q, 2p): the order of the first cogging-torque harmonic per revolution.</summary>
    public int CoggingOrder { get; internal set; }

    /// <summary>Identical sections around the bore; the number of parallel paths must divide it.</summary>
    public int Sections { get; internal set; }

    /// <summary>Winding factors at electrical orders 1..N: element n − 1 is the factor at mechanical order n·p.</summary>
    public double[] WindingFactors { get; internal set; } = [];

    /// <summary>Differential (harmonic) leakage coefficient for balanced currents, exact over all orders.</summary>
    public double DifferentialLeakage { get; internal set; }

    /// <summary>True if balanced currents make MMF waves of lower order than the working wave (ν &lt; p).</summary>
    public bool Subharmonics { get; internal set; }

    /// <summary>The lowest mechanical order of any MMF wave balanced currents make (p when there are no sub-harmonics).</summary>
    public int LowestOrder { get; internal set; }

    /// <summary>True if some even electrical harmonic (ν = 2k·p) is present.</summary>
    public bool EvenHarmonics { get; internal set; }

    /// <summary>True if waves of adjacent orders ν and ν + 1 coexist: their fields pull the rotor sideways (unbalanced magnetic pull).</summary>
    public bool AdjacentOrders { get; internal set; }

    /// <summary>Winding factor at the working order (electrical order 1).</summary>
    public double FundamentalWindingFactor => WindingFactors.Length > 0 ? WindingFactors[0] : 0;

    /// <summary>A copy that the evaluator will not overwrite.</summary>
    public SweepRecord Clone()
    {
        var copy = (SweepRecord)MemberwiseClone();
        copy.WindingFactors = (double[])WindingFactors.Clone();
        return copy;
    }
}
