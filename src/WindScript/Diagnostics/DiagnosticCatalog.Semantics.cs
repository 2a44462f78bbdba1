namespace WindScript.Diagnostics;

internal static partial class DiagnosticCatalog
{
    public static readonly DiagnosticDescriptor RepeatedCoilOption = new(
        "WS2020", Severity.Error, "Coil option given twice",
        "A coil states the same option twice, as in 'coil U: 1 -> 7 turns 5 turns 60'. A coil has one turn count and one layer for its go side; with two, one of them is a mistake and no rule can tell which the designer meant, so neither is guessed: remove the one that is wrong. The first is marked as related.");

    public static readonly DiagnosticDescriptor UndefinedName = new(
        "WS2001", Severity.Error, "Undefined name",
        "A name is used that no 'let', loop or declaration defines. A block is read in passes, so its 'let' values are visible to every other statement of the block and of the blocks nested in it, wherever they stand; a 'let' itself may use only the values defined above it (so no value can depend on itself). Check the spelling or add a 'let'.");

    public static readonly DiagnosticDescriptor DuplicateName = new(
        "WS2002", Severity.Error, "Duplicate name",
        "The same name is defined twice in one scope (two 'let's, two phases, two groups, two drives, or a phase driven twice). Diagnostics, hover and diff refer to things by name, so names must be unique. Rename or remove one.");

    public static readonly DiagnosticDescriptor UnusedName = new(
        "WS2003", Severity.Warning, "Unused name",
        "A 'let' value is defined but never used. It may be a leftover from an edit, or a value that was meant to be used (a turns count typed as a number instead of the name). Use it or remove it.");

    public static readonly DiagnosticDescriptor UnknownPhase = new(
        "WS2004", Severity.Error, "Unknown phase",
        "A coil, pattern or drive names a phase that the machine's 'phases' statement does not declare. Phase names are case-sensitive.");

    public static readonly DiagnosticDescriptor MisplacedStatement = new(
        "WS2005", Severity.Error, "Statement not allowed here",
        "Each block takes its own statements: 'machine' holds the core (slots, poles, phases, dimensions); 'winding' and 'group' hold layers, turns, pitch, paths and coils; 'drive' holds phase currents. A file holds one machine, one winding and any number of drives at top level.");

    public static readonly DiagnosticDescriptor MissingDeclaration = new(
        "WS2006", Severity.Error, "Required declaration missing",
        "Something the analysis cannot do without is missing: a file needs one machine block with 'slots', 'poles' and 'phases', and one winding block with 'layers'.");

    public static readonly DiagnosticDescriptor RepeatedProperty = new(
        "WS2007", Severity.Error, "Property given twice",
        "A property (such as 'slots' or 'turns') is stated twice in one block. One fact per line, stated once, keeps a diff unambiguous. Remove one of them.");

    public static readonly DiagnosticDescriptor MoreThanOne = new(
        "WS2008", Severity.Error, "More than one machine or winding",
        "A file describes one machine with one winding, which checks, eval and diff treat as one unit. Split alternatives into separate files (and compare them with 'windscript diff').");

    public static readonly DiagnosticDescriptor MissingUnit = new(
        "WS2010", Severity.Error, "Missing unit",
        "Every dimensioned number carries its unit (mm, cm, m, A, Hz, rad/s, rpm, deg, rad, slots, s, ms, T, Wb). A bare number is ambiguous: '150' could be millimetres or metres, '30' degrees or radians. Write the unit right after the number on the same line.");

    public static readonly DiagnosticDescriptor WrongDimension = new(
        "WS2011", Severity.Error, "Wrong kind of quantity",
        "The value has a different dimension from what the statement needs: a bore is a length, a drive amplitude a current, a frequency in Hz or rad/s, a phase angle in deg or rad, a pitch in slots.");

    public static readonly DiagnosticDescriptor InvalidCount = new(
        "WS2012", Severity.Error, "Invalid count",
        "Slot numbers, turns, layers, paths, slots and poles are whole numbers in a valid range: slots >= 1, poles even and >= 2, layers 1 or 2, turns and paths >= 1. Slot numbers count from 1.");

    public static readonly DiagnosticDescriptor CoilWithoutTurns = new(
        "WS2013", Severity.Error, "Coil without turns",
        "A coil's turns come from its own 'turns', or else from its group's or winding's 'turns' statement. None was given, so the coil's conductor count is unknown.");

    public static readonly DiagnosticDescriptor ExpansionLimit = new(
        "WS2014", Severity.Error, "Expansion too large",
        "Loops and pattern repeats are bounded so that evaluation always ends quickly: at most 1,000,000 loop iterations and pattern positions in one file. A winding that needs more is almost certainly a mistake in a range or step.");

    public static readonly DiagnosticDescriptor PatternLength = new(
        "WS2015", Severity.Error, "Slot pattern does not cover the slots",
        "A slot pattern lists one entry per slot, from slot 1 in order; all lines for the same layer of a group, with their repeats, must add up to exactly the machine's slot count.");

    public static readonly DiagnosticDescriptor InvalidArithmetic = new(
        "WS2016", Severity.Error, "Invalid arithmetic",
        "The expression cannot be evaluated: a division by zero, quantities of different dimensions added, a remainder of non-integers, or a function given the wrong arguments.");

    public static readonly DiagnosticDescriptor PatternMismatch = new(
        "WS2017", Severity.Error, "Slot pattern does not pair into coils",
        "With a coil pitch y, the coil side in slot s (go) returns in slot s + y with the opposite sign. In a single-layer pattern the entry at s + y must be the same phase with opposite sign; when both layers are written out, the bottom layer must be the top layer shifted by y and negated. The marked entry breaks that rule.");

    public static readonly DiagnosticDescriptor InvalidSequence = new(
        "WS2018", Severity.Error, "Invalid phase sequence",
        "A balanced drive's 'sequence' names every phase exactly once, in the order their currents peak.");

    public static readonly DiagnosticDescriptor UnknownFunction = new(
        "WS2019", Severity.Error, "Unknown function",
        "The built-in functions are wrap(n) (a slot number brought into 1..Q), abs, min, max, floor, ceil, round, sqrt, gcd and lcm, and electrical(angle) and mechanical(angle), which state the kind of an angle inside an angle property.");

    public static readonly DiagnosticDescriptor AngleKindOutOfPlace = new(
        "WS2030", Severity.Error, "electrical() or mechanical() outside an angle property",
        "Each angle property means one kind of angle: 'phase_shift' and a sine's 'phase' are electrical angles, 'skew' (when given as an angle) is a mechanical angle around the bore. electrical(x) and mechanical(x) state the kind of x where the property expects the other one, and convert it through the pole pairs: theta_electrical = p * theta_mechanical. So 'skew electrical(30 deg)' on a 4-pole machine is a 15 deg mechanical skew, and 'phase_shift mechanical(60 deg)' there is 120 deg electrical. They need a property that expects an angle (not a 'let', where the kind is not yet known) and the machine's pole count. Sources: Pyrhonen et al. 2014, ch. 2 (electrical and mechanical angles).");
}
