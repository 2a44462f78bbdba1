using System.Collections.Immutable;
using WindScript.Text;

namespace WindScript.Model;

/// <summary>The current of one phase in a drive: a sum of components (empty = no current).</summary>
public sealed record PhaseCurrent(int Phase, ImmutableArray<CurrentComponent> Components, TextSpan Span = default)
{
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
    public required string Name { get; init; }

    /// <summary>One entry per phase, in phase order.</summary>
    public required ImmutableArray<PhaseCurrent> Currents { get; init; }

    /// <summary>True when the star point is connected, so zero-sequence current may flow.</summary>
    public bool Neutral { get; init; }

    /// <summary>For a balanced set: the phase indices in the stated sequence; empty otherwise.</summary>
    public ImmutableArray<int> Sequence { get; init; } = [];

    public TextSpan Span { get; init; }

    public TextSpan NameSpan { get; init; }

    /// <summary>Phase currents at an instant, in phase order.</summary>
    public double[] CurrentsAt(double time)
    {
        var i = new double[Currents.Length];
        for (int k = 0; k < i.Length; k++) i[k] = Currents[k].At(time);
        return i;
    }
}
