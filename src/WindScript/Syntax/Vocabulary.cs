using WindScript.Units;
using static WindScript.Syntax.BlockKind;

namespace WindScript.Syntax;

/// <summary>
/// Every word of the language, defined once: block kinds, properties (which block takes which,
/// value kind, unit dimension, help), layer and amplitude words, functions, the other statement
/// and waveform words, and the units (<see cref="UnitTable"/>). The parser, the binders, the
/// formatter, the emitter, the language server (completion, hover, keyword help) and the tests
/// of grammar/windscript.ebnf and of the editor grammar all read this table.
/// To add a property: one entry in <see cref="Properties"/> (and its <see cref="PropertyName"/>),
/// then its meaning in the binder of its block (DEVELOPERS.md has the recipe).
/// </summary>
internal static class Vocabulary
{
    // ---- statement and waveform words (constants, so code can match on them) -------------------

    public const string Let = "let";
    public const string PhasesWord = "phases";
    public const string For = "for";
    public const string In = "in";
    public const string Step = "step";
    public const string Coil = "coil";
    public const string Layer = "layer";
    public const string Repeat = "repeat";
    public const string Balanced = "balanced";
    public const string Sequence = "sequence";
    public const string Sine = "sine";
    public const string Dc = "dc";
    public const string At = "at";
    public const string Phase = "phase";
    public const string Neutral = "neutral";
    /// <summary>An empty position of a slot pattern (not reserved: '_' alone is not a name anyone writes).</summary>
    public const string EmptySlot = "_";

    public static readonly IReadOnlyList<StatementWord> StatementWords =
    [
        new(Let, "let NAME = VALUE — a named value, visible below it"),
        new(PhasesWord, "phases U V W — the phase names, in order"),
        new(For, "for k in A .. B step S { ... } — repeat coils over an inclusive range"),
        new(In, "for k in A .. B — the range of a loop"),
        new(Step, "step S — the step of a loop range"),
        new(Coil, "coil PHASE: GO -> RETURN turns N layer top|bottom — one coil"),
        new(Layer, "layer top|bottom — the layer of a coil's go side"),
        new(Repeat, "repeat N — repeat a slot pattern line N times"),
        new(Balanced, "balanced sine ... sequence U V W — one current per phase, displaced by the phase shift"),
        new(Sequence, "sequence U V W — the order in which the phase currents peak"),
        new(Sine, "sine AMPLITUDE peak|rms at FREQUENCY phase ANGLE — i = Î·cos(ωt + φ)") { ValueDimension = Dimension.CurrentDim },
        new(Dc, "dc CURRENT — direct current") { ValueDimension = Dimension.CurrentDim },
        new(At, "at FREQUENCY — the frequency of a sinusoid (Hz or rad/s; a speed in rpm is refused: the synchronous frequency is n·p/60)") { ValueDimension = Dimension.AngularFrequency },
        new(Phase, "phase ANGLE — the time phase angle φ of a sinusoid, an electrical angle") { ValueDimension = Dimension.AngleDim },
        new(Neutral, "neutral — the star point is connected (zero-sequence current may flow)"),
    ];

    // ---- blocks -----------------------------------------------------------------------------------

    public static readonly IReadOnlyList<BlockWord> Blocks =
    [
        new(Machine, "machine", true, [PhasesWord, Let], "machine NAME { ... } — the core: slots, poles, phases and dimensions"),
        new(Winding, "winding", true, [Coil, "top:", "bottom:", "slots:", For, "group", Let], "winding NAME { ... } — the stator winding: layers, turns, pitch, paths and its coils"),
        new(Group, "group", false, [Coil, "top:", "bottom:", "slots:", For, Let], "group NAME { ... } — a named coil group inside the winding"),
        new(Drive, "drive", true, [Balanced, Neutral, Let], "drive NAME { ... } — an operating point: a current waveform per phase"),
        // ---- conductors and slots (#15) ----
        new(Slot, "slot", true, [Let], "slot NAME { ... } — the stator slot's cross-section: shape, dimensions, liner, separator and wedge"),
        new(Conductor, "conductor", true, [Let], "conductor NAME { ... } — the wire or strip of the winding, its material and temperature, and the end windings"),
    ];

    // ---- properties -------------------------------------------------------------------------------

    public static readonly IReadOnlyList<PropertyWord> Properties =
    [
        new(PropertyName.Slots, "slots", [Machine], ValueKind.WholeNumber, Dimension.None, "slots N — stator slot count Q; as 'slots:' a single-layer slot pattern"),
        new(PropertyName.Poles, "poles", [Machine], ValueKind.WholeNumber, Dimension.None, "poles N — pole count 2p (even)"),
        new(PropertyName.Bore, "bore", [Machine], ValueKind.Quantity, Dimension.LengthDim, "bore LENGTH — diameter of the stator's slotted surface at the gap: the bore (inner diameter), or the outer diameter when the rotor is outside"),
        new(PropertyName.Stack, "stack", [Machine], ValueKind.Quantity, Dimension.LengthDim, "stack LENGTH — axial core length"),
        new(PropertyName.Gap, "gap", [Machine], ValueKind.Quantity, Dimension.LengthDim, "gap LENGTH — radial mechanical air gap"),
        new(PropertyName.SlotOpening, "slot_opening", [Machine], ValueKind.Quantity, Dimension.LengthDim, "slot_opening LENGTH — slot opening width at the bore (for Carter's coefficient)"),
        new(PropertyName.RotorRadius, "rotor_radius", [Machine], ValueKind.Quantity, Dimension.LengthDim, "rotor_radius LENGTH — radius of the rotor's gap surface (for a thick gap)"),
        new(PropertyName.Rotor, "rotor", [Machine], ValueKind.Word, Dimension.None, "rotor inside|outside — where the rotor lies; outside for hub and fan motors (bore is then the stator's outer diameter at the gap)") { Words = ["inside", "outside"] },
        new(PropertyName.Skew, "skew", [Machine], ValueKind.Quantity, Dimension.SlotDim, "skew N slots | ANGLE — skew of the stator slots; an angle here is mechanical (around the bore): write electrical(ANGLE) to give it in electrical degrees") { AlsoAccepts = Dimension.AngleDim },
        new(PropertyName.PhaseShift, "phase_shift", [Machine], ValueKind.Quantity, Dimension.AngleDim, "phase_shift ANGLE — electrical angle between successive phase axes (default 360/m); write mechanical(ANGLE) to give it around the bore"),
        new(PropertyName.GapFluxDensity, "gap_flux_density", [Machine], ValueKind.Quantity, Dimension.FluxDensity, "gap_flux_density T — peak fundamental air-gap flux density (for back-EMF)"),
        new(PropertyName.Layers, "layers", [Winding], ValueKind.WholeNumber, Dimension.None, "layers 1|2 — coil sides per slot"),
        new(PropertyName.Turns, "turns", [Winding, Group], ValueKind.WholeNumber, Dimension.None, "turns N — turns per coil"),
        new(PropertyName.Pitch, "pitch", [Winding, Group], ValueKind.Quantity, Dimension.SlotDim, "pitch N slots — coil pitch, from go side to return side"),
        new(PropertyName.Paths, "paths", [Winding], ValueKind.WholeNumber, Dimension.None, "paths N — parallel paths per phase"),
        new(PropertyName.SeriesTurns, "series_turns", [Winding], ValueKind.WholeNumber, Dimension.None, "series_turns N — declared series turns per phase (checked against the coils)"),
        new(PropertyName.ConductorsPerSlot, "conductors_per_slot", [Winding], ValueKind.WholeNumber, Dimension.None, "conductors_per_slot N — declared conductors per slot (checked against the coils)"),

        // ---- conductors and slots (#15) ----
        new(PropertyName.BackDiameter, "back_diameter", [Machine], ValueKind.Quantity, Dimension.LengthDim, "back_diameter LENGTH — diameter of the core's back (yoke) surface: the outer diameter of the stator, or its inner diameter when the rotor is outside"),
        new(PropertyName.SlotShape, "shape", [Slot], ValueKind.Word, Dimension.None, "shape open|semi_closed|trapezoid|round_bottom — open: parallel sides, open full width; semi_closed: parallel sides under tooth tips; trapezoid: parallel teeth under tooth tips; round_bottom: parallel teeth with a semicircular bottom") { Words = ["open", "semi_closed", "trapezoid", "round_bottom"] },
        new(PropertyName.SlotWidth, "width", [Slot], ValueKind.Quantity, Dimension.LengthDim, "width LENGTH — slot width at the top of the conductor region (under the wedge)"),
        new(PropertyName.SlotBottomWidth, "bottom_width", [Slot], ValueKind.Quantity, Dimension.LengthDim, "bottom_width LENGTH — trapezoid: slot width at the slot bottom (default: parallel teeth)"),
        new(PropertyName.SlotDepth, "depth", [Slot], ValueKind.Quantity, Dimension.LengthDim, "depth LENGTH — slot depth from the gap surface to the slot bottom"),
        new(PropertyName.TipHeight, "tip_height", [Slot], ValueKind.Quantity, Dimension.LengthDim, "tip_height LENGTH — height of the tooth tips at the slot opening (the opening's own depth)"),
        new(PropertyName.TipTaper, "tip_taper", [Slot], ValueKind.Quantity, Dimension.LengthDim, "tip_taper LENGTH — height over which the slot widens from the opening to its full width"),
        new(PropertyName.SlotArea, "area", [Slot], ValueKind.Quantity, Dimension.Area, "area AREA — the slot's cross-section under the wedge, when its shape is not given (liner and separator not deducted)"),
        new(PropertyName.Liner, "liner", [Slot], ValueKind.Quantity, Dimension.LengthDim, "liner LENGTH — thickness of the slot liner (ground insulation)"),
        new(PropertyName.Separator, "separator", [Slot], ValueKind.Quantity, Dimension.LengthDim, "separator LENGTH — thickness of the separator between the two layers"),
        new(PropertyName.Wedge, "wedge", [Slot], ValueKind.Quantity, Dimension.LengthDim, "wedge LENGTH — thickness of the slot wedge (closure) above the conductors"),
        new(PropertyName.DrawnStrands, "drawn_strands", [Slot], ValueKind.WholeNumber, Dimension.None, "drawn_strands N — strands the slot drawing holds (checked against turns and strands in hand)"),
        new(PropertyName.BareDiameter, "bare_diameter", [Conductor], ValueKind.Quantity, Dimension.LengthDim, "bare_diameter LENGTH — round enamelled wire: copper diameter (with 'grade' for the enamel)"),
        new(PropertyName.Grade, "grade", [Conductor], ValueKind.WholeNumber, Dimension.None, "grade 1|2|3 — enamel grade of round wire (IEC 60317): the overall diameter follows from it"),
        new(PropertyName.OverallDiameter, "overall_diameter", [Conductor], ValueKind.Quantity, Dimension.LengthDim, "overall_diameter LENGTH — round wire: diameter over the enamel (instead of a grade)"),
        new(PropertyName.StripWidth, "strip_width", [Conductor], ValueKind.Quantity, Dimension.LengthDim, "strip_width LENGTH — rectangular strip: bare width (across the slot)"),
        new(PropertyName.StripHeight, "strip_height", [Conductor], ValueKind.Quantity, Dimension.LengthDim, "strip_height LENGTH — rectangular strip: bare height (along the slot depth)"),
        new(PropertyName.CornerRadius, "corner_radius", [Conductor], ValueKind.Quantity, Dimension.LengthDim, "corner_radius LENGTH — rectangular strip: radius of its rounded corners"),
        new(PropertyName.Insulation, "insulation", [Conductor], ValueKind.Quantity, Dimension.LengthDim, "insulation LENGTH — rectangular strip: insulation thickness on each side"),
        new(PropertyName.Strands, "strands", [Conductor], ValueKind.WholeNumber, Dimension.None, "strands N — strands in hand: parallel wires wound together as one turn (default 1)"),
        new(PropertyName.Material, "material", [Conductor], ValueKind.Word, Dimension.None, "material copper|aluminium — annealed copper (IEC 60028) or aluminium (IEC 60121)") { Words = ["copper", "aluminium"] },
        new(PropertyName.Temperature, "temperature", [Conductor], ValueKind.Quantity, Dimension.TemperatureDim, "temperature degC — operating temperature of the winding (resistance and losses; default 20 degC)"),
        new(PropertyName.EndExtension, "end_extension", [Conductor], ValueKind.Quantity, Dimension.LengthDim, "end_extension LENGTH — straight axial run of a coil side beyond the core, at each end"),
        new(PropertyName.EndShape, "end_shape", [Conductor], ValueKind.Word, Dimension.None, "end_shape lap|concentric|tooth_coil — the shape of a coil end, from which its length follows") { Words = ["lap", "concentric", "tooth_coil"] },
        new(PropertyName.EndOverhang, "end_overhang", [Conductor], ValueKind.Quantity, Dimension.LengthDim, "end_overhang LENGTH — lap ends: axial height of the end's apex beyond the straight run"),
        new(PropertyName.EndLength, "end_length", [Conductor], ValueKind.Quantity, Dimension.LengthDim, "end_length LENGTH — the conductor length of one coil end, slot to slot (instead of a shape)"),
        new(PropertyName.FillLimit, "fill_limit", [Conductor], ValueKind.Number, Dimension.None, "fill_limit X — highest net fill factor before a warning (default 0.75 for round wire, 0.9 for strip)"),
        new(PropertyName.DensityLimit, "density_limit", [Conductor], ValueKind.Quantity, Dimension.CurrentDensity, "density_limit A/mm2 — highest rms current density before a warning (default 6 A/mm2)"),
        new(PropertyName.CurrentAngle, "current_angle", [Drive], ValueKind.Quantity, Dimension.AngleDim, "current_angle ANGLE — electrical angle of the current ahead of the back-EMF, for the torque (default 0: all current on the torque axis)"),
    ];

    // ---- layers, amplitudes, functions ------------------------------------------------------------

    public static readonly IReadOnlyList<LayerWord> Layers =
    [
        new(LayerName.Top, "top", "top: U U -W ... — the top-layer pattern, one entry per slot from slot 1"),
        new(LayerName.Bottom, "bottom", "bottom: ... — the bottom-layer pattern (else derived from the pitch)"),
        new(LayerName.Slots, "slots", "slots: U -V ... — the pattern of a single-layer winding"),
    ];

    public static readonly IReadOnlyList<MeasureWord> Measures =
    [
        new(AmplitudeMeasure.Peak, "peak", "peak — the amplitude is the peak value Î"),
        new(AmplitudeMeasure.Rms, "rms", "rms — the amplitude is the rms value (Î = √2·I)"),
    ];

    public static readonly IReadOnlyList<FunctionWord> Functions =
    [
        new("wrap", 1, "wrap(n): slot number brought into 1..Q"),
        new("abs", 1, "abs(x): magnitude"),
        new("min", 2, "min(a, b): the smaller of two quantities of one kind"),
        new("max", 2, "max(a, b): the larger of two quantities of one kind"),
        new("floor", 1, "floor(x): rounded down"),
        new("ceil", 1, "ceil(x): rounded up"),
        new("round", 1, "round(x): rounded to the nearest whole number (halves away from zero)"),
        new("sqrt", 1, "sqrt(x): square root of a plain non-negative number"),
        new("gcd", 2, "gcd(a, b): greatest common divisor of two whole numbers"),
        new("lcm", 2, "lcm(a, b): least common multiple of two whole numbers"),
        new("electrical", 1, "electrical(ANGLE): an electrical angle, in a property that expects a mechanical one (divided by the pole pairs)"),
        new("mechanical", 1, "mechanical(ANGLE): a mechanical angle, in a property that expects an electrical one (multiplied by the pole pairs)"),
    ];

    /// <summary>The units (their own table, with dimensions and factors to SI).</summary>
    public static IReadOnlyList<Unit> Units => UnitTable.All;

    // ---- look-ups ---------------------------------------------------------------------------------

    private static readonly Dictionary<string, BlockWord> BlockByWord = Blocks.ToDictionary(b => b.Word, StringComparer.Ordinal);
    private static readonly Dictionary<string, PropertyWord> PropertyByWord = Properties.ToDictionary(p => p.Word, StringComparer.Ordinal);
    private static readonly Dictionary<string, LayerWord> LayerByWord = Layers.ToDictionary(l => l.Word, StringComparer.Ordinal);
    private static readonly Dictionary<string, MeasureWord> MeasureByWord = Measures.ToDictionary(m => m.Word, StringComparer.Ordinal);
    private static readonly Dictionary<string, FunctionWord> FunctionByName = Functions.ToDictionary(f => f.Name, StringComparer.Ordinal);

    public static BlockWord? Block(string word) => BlockByWord.GetValueOrDefault(word);
    public static BlockWord Block(BlockKind kind) => Blocks.First(b => b.Kind == kind);
    public static PropertyWord? Property(string word) => PropertyByWord.GetValueOrDefault(word);
    public static PropertyWord Property(PropertyName name) => Properties.First(p => p.Name == name);
    public static LayerWord? LayerOf(string word) => LayerByWord.GetValueOrDefault(word);
    public static LayerWord LayerOf(LayerName name) => Layers.First(l => l.Name == name);
    public static MeasureWord? Measure(string word) => MeasureByWord.GetValueOrDefault(word);
    public static FunctionWord? Function(string name) => FunctionByName.GetValueOrDefault(name);

    /// <summary>The word that writes a block kind, a property or a layer.</summary>
    public static string Word(BlockKind kind) => Block(kind).Word;
    public static string Word(PropertyName name) => Property(name).Word;
    public static string Word(LayerName name) => LayerOf(name).Word;
    public static string Word(AmplitudeMeasure measure) => Measures.First(m => m.Measure == measure).Word;

    /// <summary>The properties a block takes, in table order.</summary>
    public static IEnumerable<PropertyWord> PropertiesOf(BlockKind block) => Properties.Where(p => p.In(block));

    public static readonly IReadOnlySet<string> BlockWords = Blocks.Select(b => b.Word).ToHashSet(StringComparer.Ordinal);
    public static readonly IReadOnlySet<string> PropertyWords = Properties.Select(p => p.Word).ToHashSet(StringComparer.Ordinal);
    public static readonly IReadOnlySet<string> LayerWords = Layers.Select(l => l.Word).ToHashSet(StringComparer.Ordinal);
    public static readonly IReadOnlySet<string> MeasureWords = Measures.Select(m => m.Word).ToHashSet(StringComparer.Ordinal);
    public static readonly IReadOnlySet<string> FlagWords = new HashSet<string>(StringComparer.Ordinal) { Neutral };

    /// <summary>Every reserved word: none of them can name anything.</summary>
    public static readonly IReadOnlySet<string> Reserved =
        BlockWords.Concat(PropertyWords).Concat(LayerWords).Concat(MeasureWords).Concat(StatementWords.Select(w => w.Word))
            .ToHashSet(StringComparer.Ordinal);

    public static bool IsReserved(string word) => Reserved.Contains(word);

    private static readonly Dictionary<string, string> HelpByWord = BuildHelp();

    private static Dictionary<string, string> BuildHelp()
    {
        var help = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var w in StatementWords) help[w.Word] = w.Help;
        foreach (var l in Layers) help.TryAdd(l.Word, l.Help);
        foreach (var m in Measures) help[m.Word] = m.Help;
        foreach (var b in Blocks) help[b.Word] = b.Help;
        foreach (var p in Properties) help[p.Word] = p.Help; // "slots" the property explains 'slots:' too
        return help;
    }

    /// <summary>One line of help for a reserved word (hover, completion), or null.</summary>
    public static string? Help(string word) => HelpByWord.GetValueOrDefault(word);

    /// <summary>The units a designer would pick for a dimension, for completion after a number (no aliases such as 'slot').</summary>
    public static IEnumerable<string> UnitsFor(Dimension dimension) =>
        UnitTable.All.Where(u => u.Dimension == dimension && !u.IsAlias).Select(u => u.Symbol);
}
