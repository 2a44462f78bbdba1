using WindScript.Text;

namespace WindScript.Diagnostics;

/// <summary>A second place in the source that matters to a diagnostic.</summary>
public sealed record RelatedSpan(TextSpan Span, string Message);

/// <summary>One finding: a catalogue entry instantiated at a span with a concrete message.</summary>
public sealed record Diagnostic(DiagnosticDescriptor Descriptor, TextSpan Span, string Message)
{
    /// <summary>The stable code (WS1001...), as listed by <c>windscript explain</c>.</summary>
    public string Code => Descriptor.Code;

    /// <summary>Error, warning or info.</summary>
    public Severity Severity => Descriptor.Severity;

    /// <summary>Other places the message refers to (e.g. the coil that explains an imbalance).</summary>
    public IReadOnlyList<RelatedSpan> Related { get; init; } = [];

    /// <summary>A quick fix that repairs the problem, if one is known.</summary>
    public CodeFix? Fix { get; init; }

    /// <summary>"[start..end) severity CODE: message", for logs and tests.</summary>
    public override string ToString() => $"{Span} {Severity.ToString().ToLowerInvariant()} {Code}: {Message}";
}
