namespace WindScript.Diagnostics;

/// <summary>The limits that keep every run bounded (see <see cref="InputLimits"/>, README "Limits").</summary>
internal static partial class DiagnosticCatalog
{
    /// <summary>WS1020: the file is larger than <see cref="InputLimits.MaxFileBytes"/>.</summary>
    public static readonly DiagnosticDescriptor FileTooLarge = new(
        "WS1020", Severity.Error, "File too large",
        """
        A winding file may hold at most 1,048,576 characters (1 MiB); this one is larger and is
        not read. Within the limit every command finishes in well under a second. Even a winding
        of 100,000 coils written out one per line fits; a larger file is almost certainly not a
        winding description (or was generated with a loop unrolled that a 'for' would express).
        """);

    /// <summary>WS1021: a line with more operators than <see cref="InputLimits.MaxOperatorsPerLine"/>.</summary>
    public static readonly DiagnosticDescriptor ExpressionTooLong = new(
        "WS1021", Severity.Error, "Expression too long",
        """
        One line holds more than 1,000 arithmetic operators (+ - * / %). Evaluating and analysing
        such a chain would recurse once per operand, which for a long enough chain exhausts the
        stack, so the file is not read; the marked operator is the first one past the limit.
        Real expressions have a handful of operators: use a named 'let' value or a 'for' loop.
        """);

    /// <summary>WS2040: a count or value beyond the limits.</summary>
    public static readonly DiagnosticDescriptor BeyondLimit = new(
        "WS2040", Severity.Error, "Beyond the limits",
        """
        The value is larger than WindScript evaluates, so that every check and analysis stays
        exact (no count or product of counts can overflow) and finishes in well under a second.
        The limits: at most 1,000 slots, 1,000 poles, 64 phases, 10,000 turns per coil, 1,000
        parallel paths, 100,000 coils in one winding, 1,000,000 loop iterations and pattern
        positions per file; electrical orders up to 1,000 (eval --orders). Real machines lie far
        inside them (the largest hydro generators have some hundreds of slots and poles).
        """);

    /// <summary>WS2041: more coils than <see cref="InputLimits.MaxCoils"/>.</summary>
    public static readonly DiagnosticDescriptor TooManyCoils = new(
        "WS2041", Severity.Error, "Too many coils",
        """
        A winding may have at most 100,000 coils; the marked coil is the first one past the limit
        and it and the rest are not read. With at most 10,000 turns per coil no sum of turns can
        overflow, and the analysis of the winding stays well under a second.
        """);

    /// <summary>WS2042: a number or result too large to represent (it would be infinite or undefined).</summary>
    public static readonly DiagnosticDescriptor NumberOutOfRange = new(
        "WS2042", Severity.Error, "Number out of range",
        """
        The number, or the result of the marked arithmetic, lies beyond what a 64-bit floating
        point number holds (about 1.8e308) or is undefined, so it would reach the outputs as
        infinity or NaN. No figure WindScript reports is ever infinite or undefined: write a
        value of a sensible size. Whole-number functions (gcd, lcm) take whole numbers up to
        2^53 = 9,007,199,254,740,992, below which every whole number is exact.
        """);
}
