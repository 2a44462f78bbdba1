namespace WindScript.Cli;

/// <summary>Stable exit codes, documented in README.</summary>
public static class ExitCodes
{
    /// <summary>Clean: no errors (warnings allowed unless --warnings-as-errors).</summary>
    public const int Ok = 0;

    /// <summary>Errors found in the input (or, for fmt --check, a file not in canonical form; for diff, a difference).</summary>
    public const int Findings = 1;

    /// <summary>The command line was wrong: unknown option, missing file.</summary>
    public const int Usage = 2;

    /// <summary>A bug in WindScript: please report it.</summary>
    public const int Internal = 3;
}
