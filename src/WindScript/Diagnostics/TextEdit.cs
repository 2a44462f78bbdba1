using WindScript.Text;

namespace WindScript.Diagnostics;

/// <summary>Replace the text in <see cref="Span"/> with <see cref="NewText"/>.</summary>
public sealed record TextEdit(TextSpan Span, string NewText);

/// <summary>A machine-readable fix a diagnostic offers (an editor shows it as a quick fix).</summary>
public sealed record CodeFix(string Title, IReadOnlyList<TextEdit> Edits);
