namespace WindScript.Diagnostics;

/// <summary>
/// A catalogue entry: a stable code, a fixed severity, a title, and a long explanation
/// (the physics and, where physics is involved, a published source).
/// </summary>
public sealed record DiagnosticDescriptor(string Code, Severity Severity, string Title, string Explanation)
{
    /// <summary>A diagnostic of this kind at <paramref name="span"/> with its message.</summary>
    public Diagnostic At(Text.TextSpan span, string message) => new(this, span, message);
}
