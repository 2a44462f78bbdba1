namespace WindScript.Diagnostics;

public enum Severity
{
    Info,
    Warning,
    Error,
}
