using WindScript.Text;

namespace WindScript.Diagnostics;

/// <summary>A second place in the source that matters to a diagnostic.</summary>
public sealed record RelatedSpan(TextSpan Span, string Message);

/// <summary>One finding: a catalogue entry instantiated at a span with a concrete message.</summary>
public sealed record Diagnostic(DiagnosticDescriptor Descriptor, TextSpan Span, string Message)
{
    public string Code => Descriptor.Code;

    public Severity Severity => Descriptor.Severity;

    public IReadOnlyList<RelatedSpan> Related { get; init; } = [];

    public CodeFix? Fix { get; init; }

    public override string ToString() => $"{Span} {Severity.ToString().ToLowerInvariant()} {Code}: {Message}";
}
