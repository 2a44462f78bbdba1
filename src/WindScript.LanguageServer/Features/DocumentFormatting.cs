using System.Text.Json.Nodes;
using WindScript.LanguageServer.Documents;
using WindScript.LanguageServer.Protocol;
using WindScript.Text;

namespace WindScript.LanguageServer.Features;

/// <summary>
/// Whole-document formatting with the canonical formatter, sent as one edit covering only the
/// part that changes (common start and end left alone, so the editor keeps its place). A file
/// with syntax errors gets no edits: the formatter leaves broken text alone.
/// </summary>
public static class DocumentFormatting
{
    public static JsonNode? Handle(Document document)
    {
        var c = document.Compilation;
        if (WindScript.Formatting.Formatter.Format(c.Syntax) is not { } formatted || formatted == document.Text) return new JsonArray();
        var (span, replacement) = MinimalEdit(document.Text, formatted);
        return new JsonArray(new JsonObject { ["range"] = Positions.Range(c.Source, span), ["newText"] = replacement });
    }

    /// <summary>The smallest single replacement that turns <paramref name="before"/> into <paramref name="after"/>.</summary>
    public static (TextSpan Span, string NewText) MinimalEdit(string before, string after)
    {
        int prefix = 0, max = Math.Min(before.Length, after.Length);
        while (prefix < max && before[prefix] == after[prefix]) prefix++;
        int suffix = 0;
        while (suffix < max - prefix && before[before.Length - 1 - suffix] == after[after.Length - 1 - suffix]) suffix++;
        // Never split a surrogate pair or a CRLF between the kept and the replaced text.
        while (prefix > 0 && (char.IsHighSurrogate(before[prefix - 1]) || before[prefix - 1] == '\r')) prefix--;
        while (suffix > 0 && (char.IsLowSurrogate(before[before.Length - suffix]) || before[before.Length - suffix] == '\n')) suffix--;
        return (TextSpan.FromBounds(prefix, before.Length - suffix), after.Substring(prefix, after.Length - suffix - prefix));
    }
}
