using System.Collections.Immutable;
using WindScript.Text;

namespace WindScript.Model;

/// <summary>The current of one phase in a drive: a sum of components (empty = no current).</summary>
public sealed record PhaseCurrent(int Phase, ImmutableArray<CurrentComponent> Components, TextSpan Span = default)
{
    /// <summary>The phase current (A) at <paramref name="time"/> (s), all components summed.</summary>
    public double At(double time)
    {
        double sum = 0;
        foreach (var c in Components) sum += c.At(time);
        return sum;
    }
}

/// <summary>An operating point: a current waveform for every phase.</summary>
public sealed record Drive
{
    /// <summary>The drive's name, as written after <c>drive</c>.</summary>
    public required string Name { get; init; }

    /// <summary>One entry per phase, in phase order.</summary>
    public required ImmutableArray<PhaseCurrent> Currents { get; init; }

    /// <summary>Electrical angle (rad) of the current ahead of the back-EMF, for the torque, if stated.</summary>
    public double? CurrentAngle { get; init; }

    /// <summary>True when the star point is connected, so zero-sequence current may flow.</summary>
    public bool Neutral { get; init; }

    /// <summary>For a balanced set: the phase indices in the stated sequence; empty otherwise.</summary>
    public ImmutableArray<int> Sequence { get; init; } = [];

    /// <summary>True when a current of the drive failed to evaluate (and was reported): its checks are skipped.</summary>
    public bool Incomplete { get; init; }

    /// <summary>Where the drive block is in the source.</summary>
    public TextSpan Span { get; init; }

    /// <summary>Where the drive's name is in the source.</summary>
    public TextSpan NameSpan { get; init; }

    /// <summary>
    /// Phase currents (A) at an instant, indexed by phase (the one place instantaneous currents
    /// are summed): <paramref name="phases"/> entries, or one per driven phase when omitted.
    /// </summary>
    public double[] CurrentsAt(double time, int? phases = null)
    {
        var i = new double[phases ?? Currents.Length];
        foreach (var c in Currents)
            if (c.Phase >= 0 && c.Phase < i.Length) i[c.Phase] += c.At(time);
        return i;
    }
}
