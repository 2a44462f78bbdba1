using System.Text;
using System.Text.Json.Nodes;
using WindScript.LanguageServer.Protocol;
using WindScript.Text;

namespace WindScript.LanguageServer.Documents;

/// <summary>
/// Applies the content changes of a didChange notification in order: a change with a range
/// replaces that range of the text as it stands after the previous change; one without a range
/// replaces the whole text.
/// </summary>
public static class TextChanges
{
    public static string Apply(string text, JsonArray changes)
    {
        foreach (var node in changes)
        {
            var change = Json.Object(node, "a content change");
            string newText = Json.String(change, "text");
            if (change["range"] is null)
            {
                text = newText;
                continue;
            }
            var source = new SourceText(text);
            var span = Positions.ToSpan(source, change["range"]);
            text = new StringBuilder(text.Length - span.Length + newText.Length)
                .Append(text, 0, span.Start)
                .Append(newText)
                .Append(text, span.End, text.Length - span.End)
                .ToString();
        }
        return text;
    }
}
