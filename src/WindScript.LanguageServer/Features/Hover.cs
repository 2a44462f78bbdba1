using System.Text;
using System.Text.Json.Nodes;
using WindScript.LanguageServer.Documents;
using WindScript.LanguageServer.Protocol;

namespace WindScript.LanguageServer.Features;

/// <summary>Hover: what the evaluator knows about the thing under the cursor, as Markdown (or plain text).</summary>
public static class Hover
{
    public static JsonNode? Handle(Document document, JsonObject parameters, ClientCapabilities client)
    {
        var c = document.Compilation;
        int offset = Positions.ToOffset(c.Source, parameters["position"]);
        if (HoverContent.At(c, () => document.Analysis, offset) is not { } content) return null;
        return new JsonObject
        {
            ["contents"] = new JsonObject
            {
                ["kind"] = client.Markdown ? "markdown" : "plaintext",
                ["value"] = client.Markdown ? Markdown(content) : PlainText(content),
            },
            ["range"] = Positions.Range(c.Source, content.Span),
        };
    }

    private static string Markdown(HoverContent content)
    {
        var text = new StringBuilder();
        text.Append("```windscript\n").Append(content.Title).Append("\n```\n");
        if (content.Lines.Count > 0) text.Append("\n---\n\n");
        foreach (var line in content.Lines) text.Append(EscapeMarkdown(line)).Append("  \n");
        return text.ToString().TrimEnd();
    }

    private static string PlainText(HoverContent content) =>
        string.Join("\n", [content.Title, .. content.Lines]);

    private static string EscapeMarkdown(string line)
    {
        var text = new StringBuilder(line.Length + 8);
        if (line.Length > 0 && line[0] is '-' or '+') text.Append('\\'); // not a list item
        foreach (char ch in line)
        {
            if (ch is '\\' or '*' or '_' or '`' or '<' or '>' or '[' or ']' or '#') text.Append('\\');
            text.Append(ch);
        }
        return text.ToString();
    }
}
