namespace WindScript.Diagnostics;

internal static partial class DiagnosticCatalog
{
    public static readonly DiagnosticDescriptor SyntaxError = new(
        "WS1001", Severity.Error, "Syntax error",
        """
        The line does not follow the grammar of WindScript (grammar/windscript.ebnf). The message
        says what was expected at the marked place. Each statement stands on its own line; the
        checker skips the rest of a broken line (or the whole braced body it opened) and carries
        on, so every other line is still checked.
        """);

    public static readonly DiagnosticDescriptor UnclosedBlock = new(
        "WS1002", Severity.Error, "Block not closed",
        """
        A block (machine, winding, group, drive or a for loop) was opened with '{' but the file
        ended before its closing '}'. Everything after the opening brace was read as part of the
        block. Add the missing '}' where the block should end.
        """);

    public static readonly DiagnosticDescriptor NestingTooDeep = new(
        "WS1003", Severity.Error, "Brackets nested too deeply",
        """
        The file nests parentheses or braces more deeply than any winding description needs
        (the limit is in the message). Reading it would need unbounded recursion, so the file is
        not read at all; the marked bracket is the first one past the limit. Flatten the
        expression or the blocks.
        """);

    public static readonly DiagnosticDescriptor MissingBlockName = new(
        "WS1004", Severity.Error, "Block without a name",
        """
        Every machine, winding, group and drive block is named (`winding main {`), so that
        diagnostics, the review diff, hover and go-to-definition can refer to it and so that
        two drives of one file can be told apart. The marked place is where the name belongs.
        The block is still read and checked as if it had a name, so this is the only problem
        the missing name causes; add a name to clear it.
        """);
}
