using WindScript.Units;

namespace WindScript.Syntax;

/// <summary>The kinds of block. The words that introduce them are in <see cref="Vocabulary.Blocks"/>.</summary>
internal enum BlockKind
{
    Machine, Winding, Group, Drive,
    // ---- conductors and slots (#15) ----
    Slot, Conductor,
}

/// <summary>Every <c>keyword value</c> property. The words, owners and meanings are in <see cref="Vocabulary.Properties"/>.</summary>
internal enum PropertyName
{
    Slots, Poles, Bore, Stack, Gap, SlotOpening, RotorRadius, Rotor, Skew, PhaseShift, GapFluxDensity,
    Layers, Turns, Pitch, Paths, SeriesTurns, ConductorsPerSlot,
    // ---- conductors and slots (#15): machine, slot, conductor and drive properties ----
    BackDiameter,
    SlotShape, SlotWidth, SlotBottomWidth, SlotDepth, TipHeight, TipTaper, SlotArea, Liner, Separator, Wedge, DrawnStrands,
    BareDiameter, Grade, OverallDiameter, StripWidth, StripHeight, CornerRadius, Insulation, Strands, Material, Temperature,
    EndExtension, EndShape, EndOverhang, EndLength, FillLimit, DensityLimit,
    CurrentAngle,
}

/// <summary>A layer word: <c>top</c> and <c>bottom</c> of a double-layer winding, <c>slots</c> for the one layer of a single-layer pattern.</summary>
internal enum LayerName { Top, Bottom, Slots }

/// <summary>How a sinusoid's amplitude is stated: its peak, or its rms value (peak = √2·rms).</summary>
internal enum AmplitudeMeasure { Peak, Rms }

/// <summary>What a property's value is.</summary>
internal enum ValueKind
{
    /// <summary>A plain whole number (a count).</summary>
    WholeNumber,
    /// <summary>A number with a unit of <see cref="PropertyWord.Dimension"/> (or <see cref="PropertyWord.AlsoAccepts"/>).</summary>
    Quantity,
    /// <summary>One of the words in <see cref="PropertyWord.Words"/> (<c>rotor outside</c>).</summary>
    Word,
    /// <summary>A plain number that need not be whole (a fraction such as a fill-factor limit).</summary>
    Number,
}

/// <summary>A block word: its kind, whether it stands at the top of a file, and the other statements it takes besides its properties.</summary>
internal sealed record BlockWord(BlockKind Kind, string Word, bool TopLevel, IReadOnlyList<string> OtherStatements, string Help);

/// <summary>
/// A property: its word, the blocks that take it, its value kind and unit dimension, and one
/// line of help (shown on hover and in completion).
/// </summary>
internal sealed record PropertyWord(PropertyName Name, string Word, IReadOnlyList<BlockKind> Blocks, ValueKind Value, Dimension Dimension, string Help)
{
    /// <summary>A second dimension the value may have (skew: slot pitches or an angle).</summary>
    public Dimension? AlsoAccepts { get; init; }

    /// <summary>The words a <see cref="ValueKind.Word"/> property takes (not reserved: they mean something only here).</summary>
    public IReadOnlyList<string> Words { get; init; } = [];

    public bool In(BlockKind block) => Blocks.Contains(block);
}

/// <summary>A layer word of a slot pattern or a coil's <c>layer</c> option.</summary>
internal sealed record LayerWord(LayerName Name, string Word, string Help);

/// <summary>An amplitude word of a sinusoid.</summary>
internal sealed record MeasureWord(AmplitudeMeasure Measure, string Word, string Help);

/// <summary>A built-in function of expressions.</summary>
internal sealed record FunctionWord(string Name, int Arity, string Help);

/// <summary>
/// Any other reserved word (statement and waveform words). <see cref="ValueDimension"/> is the
/// dimension of the value that follows it, where one does (<c>at</c> takes a frequency).
/// </summary>
internal sealed record StatementWord(string Word, string Help)
{
    public Dimension? ValueDimension { get; init; }
}
