namespace WindScript.Reporting.Shop;

/// <summary>
/// Everything the winding shop's sheet shows, in the shop's terms: coils, coil groups, parallel
/// paths with their jumpers, leads with terminal marks, star/delta points and the direction of
/// rotation. The HTML page, the CSV tables and the developed diagram read only this, so where the
/// connection comes from (stated in the file or derived) is decided in one place,
/// <see cref="ShopSheetBuilder"/>. Slots are 1-based, layers 0 = top; coil, group and path
/// numbers are 1-based as the shop counts them.
/// </summary>
public sealed record ShopSheet
{
    public required string Machine { get; init; }
    public required string Winding { get; init; }
    /// <summary>The file the sheet was made from, as the user named it.</summary>
    public required string Source { get; init; }
    public required int Slots { get; init; }
    public required int Poles { get; init; }
    public required int Layers { get; init; }
    /// <summary>The conductor in words, when the file states one.</summary>
    public string? Wire { get; init; }
    public required IReadOnlyList<string> Phases { get; init; }
    public required IReadOnlyList<ShopCoil> Coils { get; init; }
    public required IReadOnlyList<ShopGroup> Groups { get; init; }
    public required IReadOnlyList<ShopPath> Paths { get; init; }
    public required IReadOnlyList<ShopJumper> Jumpers { get; init; }
    public required IReadOnlyList<ShopLead> Leads { get; init; }
    public required IReadOnlyList<ShopJoint> Joints { get; init; }
    public required ShopRotation Rotation { get; init; }
    /// <summary>Where the sheet's facts come from and what was assumed ("strands not stated: 1").</summary>
    public required IReadOnlyList<string> Notes { get; init; }

    /// <summary>Parallel paths of one phase.</summary>
    public IEnumerable<ShopPath> PathsOf(int phase) => Paths.Where(p => p.Phase == phase);
}

/// <summary>Which end of a coil group a lead or jumper is joined to: the first coil's start, or the last coil's finish.</summary>
public enum GroupEnd { Start, Finish }

/// <summary>
/// One coil as the shop winds it: it occupies two slots, written in shop notation as a pitch
/// "1-(1+span)" (span in slot pitches, the short way round), with its layers, turns and strands in hand.
/// </summary>
public sealed record ShopCoil
{
    public required int Number { get; init; }
    public required int Phase { get; init; }
    /// <summary>Slot and layer of the side where the coil's start lead leaves (the go side).</summary>
    public required int StartSlot { get; init; }
    public required int StartLayer { get; init; }
    /// <summary>Slot and layer of the side where the coil's finish lead leaves (the return side).</summary>
    public required int FinishSlot { get; init; }
    public required int FinishLayer { get; init; }
    public required int Turns { get; init; }
    public required int Strands { get; init; }
    /// <summary>The group the coil belongs to (1-based), 0 when it is in none.</summary>
    public required int Group { get; init; }
    /// <summary>Signed span in slot pitches from the start side to the finish side, the short way round (negative: towards lower slot numbers).</summary>
    public required int Span { get; init; }

    /// <summary>The pitch in shop notation: "1-6" for a coil that spans five slot pitches.</summary>
    public string Pitch => $"1-{1 + Math.Abs(Span)}";
}

/// <summary>
/// A coil group: coils wound in series one after another, with one start and one finish.
/// Polarity +1 means the path enters at the group's start; -1 that it is connected reversed
/// (entered at its finish), as alternate pole groups of a lap winding are.
/// </summary>
public sealed record ShopGroup
{
    public required int Number { get; init; }
    public required int Phase { get; init; }
    /// <summary>The group's number within its phase (1-based).</summary>
    public required int IndexInPhase { get; init; }
    /// <summary>The coil numbers, in the order they are wound.</summary>
    public required IReadOnlyList<int> Coils { get; init; }
    public required int Polarity { get; init; }
    /// <summary>The slot of the first coil's start side and of the last coil's finish side.</summary>
    public required int StartSlot { get; init; }
    public required int FinishSlot { get; init; }
    /// <summary>The parallel path (1-based within the phase) the group is in, 0 when it is in none.</summary>
    public required int Path { get; init; }

    /// <summary>The end where the path's current enters the group.</summary>
    public GroupEnd Entry => Polarity >= 0 ? GroupEnd.Start : GroupEnd.Finish;
    /// <summary>The end where the path's current leaves the group.</summary>
    public GroupEnd Exit => Polarity >= 0 ? GroupEnd.Finish : GroupEnd.Start;
    public int SlotAt(GroupEnd end) => end == GroupEnd.Start ? StartSlot : FinishSlot;
}

/// <summary>A parallel path of a phase: its groups in series, in order from the phase's start terminal.</summary>
public sealed record ShopPath(int Phase, int Number, IReadOnlyList<int> Groups);

/// <summary>A jumper of a path: from one group's end to the next group's end.</summary>
public sealed record ShopJumper(int Number, int Phase, int Path, int FromGroup, GroupEnd FromEnd, int FromSlot, int ToGroup, GroupEnd ToEnd, int ToSlot);

/// <summary>
/// A lead: the wire from a path's first or last group end out to a terminal. Several leads share
/// a mark where paths join at a terminal.
/// </summary>
public sealed record ShopLead(int Number, string Mark, int Phase, int Path, int Group, GroupEnd End, int Slot);

/// <summary>How terminals are joined inside the machine or on the board: a star (neutral) point or a delta corner.</summary>
public enum JointKind { Star, Delta }

/// <summary>A point where terminal marks are joined (a star point, or one corner of a delta).</summary>
public sealed record ShopJoint(string Name, JointKind Kind, IReadOnlyList<string> Marks, bool BroughtOut);

/// <summary>
/// The direction the field travels for the supply sequence L1 L2 L3 on U1 V1 W1: +1 towards
/// increasing slot numbers, -1 towards decreasing; the shaft direction when the file says from
/// which end the slots are numbered (null otherwise).
/// </summary>
public sealed record ShopRotation(int SlotDirection, string? ShaftDirection, string Supply);
