using WindScript.Diagnostics;
using WindScript.Text;

namespace WindScript.Cli.Output;

/// <summary>Diagnostics as people read them: <c>file(line,col): severity CODE: message</c>.</summary>
public static class DiagnosticText
{
    public static string SeverityName(Severity s) => s switch
    {
        Severity.Error => "error",
        Severity.Warning => "warning",
        _ => "info",
    };

    public static void Write(TextWriter output, string file, SourceText source, IEnumerable<Diagnostic> diagnostics)
    {
        foreach (var d in diagnostics)
        {
            var pos = source.GetPosition(d.Span.Start);
            output.WriteLine($"{file}({pos.Line + 1},{pos.Character + 1}): {SeverityName(d.Severity)} {d.Code}: {d.Message}");
            // Related places, indented under their diagnostic in the form editors link.
            foreach (var related in d.Related)
            {
                var at = source.GetPosition(related.Span.Start);
                output.WriteLine($"  {file}({at.Line + 1},{at.Character + 1}): note: {related.Message}");
            }
        }
    }
}
