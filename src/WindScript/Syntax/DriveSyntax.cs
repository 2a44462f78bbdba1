using WindScript.Text;

namespace WindScript.Syntax;

/// <summary>One term of a current waveform.</summary>
internal abstract record WaveTermSyntax(TextSpan Span) : SyntaxNode(Span);

/// <summary><c>dc 8 A</c>.</summary>
internal sealed record DcTermSyntax(KeywordSyntax Keyword, ExpressionSyntax Current, TextSpan Span) : WaveTermSyntax(Span);

/// <summary><c>sine 12 A rms at 50 Hz phase -30 deg</c>: i = Î·cos(ωt + φ).</summary>
internal sealed record SineTermSyntax(KeywordSyntax Keyword, ExpressionSyntax Amplitude, KeywordSyntax Measure, ExpressionSyntax Frequency, ExpressionSyntax? Phase, TextSpan Span)
    : WaveTermSyntax(Span)
{
    public AmplitudeMeasure MeasureKind => Vocabulary.Measure(Measure.Text)!.Measure;
}

/// <summary>A term with the sign it is added with.</summary>
internal sealed record SignedTermSyntax(bool Negated, WaveTermSyntax Term, TextSpan Span) : SyntaxNode(Span);

/// <summary><c>U = sine 70 A peak at 50 Hz + sine 4 A peak at 250 Hz</c>.</summary>
internal sealed record PhaseCurrentSyntax(NameSyntax Phase, IReadOnlyList<SignedTermSyntax> Terms, TextSpan Span) : StatementSyntax(Span);

/// <summary><c>balanced sine 12 A rms at 50 Hz sequence U V W</c>: one current per phase, displaced in time by 360/m.</summary>
internal sealed record BalancedSyntax(KeywordSyntax Keyword, SineTermSyntax Wave, KeywordSyntax SequenceKeyword, IReadOnlyList<NameSyntax> Sequence, TextSpan Span)
    : StatementSyntax(Span);
