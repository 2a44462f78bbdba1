namespace WindScript.Diagnostics;

/// <summary>How serious a diagnostic is.</summary>
public enum Severity
{
    /// <summary>A fact worth knowing; never fails a check.</summary>
    Info,
    /// <summary>Probably a mistake; fails <c>check --warnings-as-errors</c>.</summary>
    Warning,
    /// <summary>The winding or file is wrong; fails <c>check</c>.</summary>
    Error,
}
