using System.Text;
using System.Text.Json.Nodes;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using WindScript.LanguageServer.Documents;
using WindScript.LanguageServer.Features;

namespace WindScript.Tests.LanguageServer;

/// <summary>
/// Incremental sync and the minimal formatting edit, against an independent reading of LSP 3.17
/// ("Text Documents": lines end at \n, \r\n or \r; characters count UTF-16 code units): for any
/// text with tabs, non-ASCII letters, surrogate pairs and every kind of line break, replacing a
/// range given as LSP positions is the same as splicing the string at those offsets.
/// </summary>
public class TextSyncProperties
{
    // Pieces chosen to stress positions: BMP non-ASCII, a surrogate pair, tabs and all line breaks.
    private static readonly string[] Pieces = ["a", "coil U: 1 -> 7", " ", "\t", "ö", "ß", "😀", "\n", "\r\n", "\r", "# ü", "{", "}"];

    private static Gen<string> Texts =>
        Gen.Elements(Pieces).ListOf().Select(parts => string.Concat(parts));

    /// <summary>Offsets on code-point boundaries (an editor never splits a surrogate pair), as an ordered pair.</summary>
    private static Gen<(string Text, int Start, int End, string Insert)> Edits =>
        from text in Texts
        from a in Gen.Choose(0, text.Length)
        from b in Gen.Choose(0, text.Length)
        from insert in Texts
        let start = Boundary(text, Math.Min(a, b))
        let end = Boundary(text, Math.Max(a, b))
        select (text, start, end, insert);

    private static int Boundary(string text, int offset) =>
        offset > 0 && offset < text.Length && char.IsLowSurrogate(text[offset]) ? offset - 1 : offset;

    /// <summary>Line and UTF-16 column of an offset, written independently of SourceText.</summary>
    private static (int Line, int Character) Position(string text, int offset)
    {
        int line = 0, lineStart = 0;
        for (int i = 0; i < offset; i++)
        {
            if (text[i] == '\r' && i + 1 < text.Length && text[i + 1] == '\n') continue; // the \n ends this break
            if (text[i] is '\n' or '\r') { line++; lineStart = i + 1; }
        }
        return (line, offset - lineStart);
    }

    private static JsonObject Range(string text, int start, int end)
    {
        var (sl, sc) = Position(text, start);
        var (el, ec) = Position(text, end);
        return LspTestClient.Range(sl, sc, el, ec);
    }

    [Property(MaxTest = 2000)]
    public Property An_incremental_change_splices_exactly_the_range_it_names() =>
        Prop.ForAll(Edits.ToArbitrary(), e =>
        {
            // A range that would start between \r and \n names no real position; editors never send one.
            if (e.Start > 0 && e.Start < e.Text.Length && e.Text[e.Start - 1] == '\r' && e.Text[e.Start] == '\n') return true;
            if (e.End > 0 && e.End < e.Text.Length && e.Text[e.End - 1] == '\r' && e.Text[e.End] == '\n') return true;
            var change = new JsonObject { ["range"] = Range(e.Text, e.Start, e.End), ["text"] = e.Insert };
            var applied = TextChanges.Apply(e.Text, new JsonArray(change));
            return applied == e.Text[..e.Start] + e.Insert + e.Text[e.End..];
        });

    [Property(MaxTest = 2000)]
    public Property The_minimal_formatting_edit_turns_the_old_text_into_the_new() =>
        Prop.ForAll(Texts.ToArbitrary(), Texts.ToArbitrary(), (before, after) =>
        {
            var (span, replacement) = DocumentFormatting.MinimalEdit(before, after);
            var result = new StringBuilder(before).Remove(span.Start, span.Length).Insert(span.Start, replacement).ToString();
            bool splitsPair = span.Start > 0 && span.Start < before.Length && char.IsLowSurrogate(before[span.Start]);
            return result == after && !splitsPair;
        });
}
