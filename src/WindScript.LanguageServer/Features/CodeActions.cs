using System.Text.Json.Nodes;
using WindScript.LanguageServer.Documents;
using WindScript.LanguageServer.Protocol;

namespace WindScript.LanguageServer.Features;

/// <summary>Quick fixes: every diagnostic touching the requested range that carries a fix becomes a code action.</summary>
public static class CodeActions
{
    public static JsonNode? Handle(Document document, JsonObject parameters)
    {
        var c = document.Compilation;
        var range = Positions.ToSpan(c.Source, parameters["range"]);
        var actions = new JsonArray();
        foreach (var d in c.Diagnostics)
        {
            if (d.Fix is not { } fix) continue;
            bool touches = d.Span.Start <= range.End && range.Start <= d.Span.End;
            if (!touches) continue;
            var edits = new JsonArray();
            foreach (var edit in fix.Edits)
                edits.Add((JsonNode)new JsonObject { ["range"] = Positions.Range(c.Source, edit.Span), ["newText"] = edit.NewText });
            actions.Add((JsonNode)new JsonObject
            {
                ["title"] = fix.Title,
                ["kind"] = "quickfix",
                ["diagnostics"] = new JsonArray(DiagnosticConverter.ToLsp(document.Uri, c.Source, d)),
                ["isPreferred"] = true,
                ["edit"] = new JsonObject { ["changes"] = new JsonObject { [document.Uri] = edits } },
            });
        }
        return actions;
    }
}
