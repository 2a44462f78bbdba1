using System.CommandLine;
using WindScript.Cli.Output;
using WindScript.Diagnostics;

namespace WindScript.Cli.Commands;

/// <summary><c>windscript explain [CODE]</c>: the catalogue of diagnostics, or one entry's long explanation.</summary>
public static class ExplainCommand
{
    public static Command Create(CliIO io)
    {
        var code = new Argument<string?>("code") { Description = "A diagnostic code such as WS3008 (omit to list them all)", Arity = ArgumentArity.ZeroOrOne };
        var command = new Command("explain", "Explain a diagnostic code, or list every code") { code };
        command.SetAction(parse => Run(io, parse.GetValue(code)));
        return command;
    }

    public static int Run(CliIO io, string? code)
    {
        if (string.IsNullOrEmpty(code))
        {
            foreach (var d in DiagnosticCatalog.All)
                io.Out.WriteLine($"{d.Code}  {DiagnosticText.SeverityName(d.Severity),-7}  {d.Title}");
            return ExitCodes.Ok;
        }
        if (DiagnosticCatalog.Find(code) is not { } entry)
        {
            io.Err.WriteLine($"windscript: there is no diagnostic '{code}'; 'windscript explain' lists them all");
            return ExitCodes.Usage;
        }
        io.Out.WriteLine($"{entry.Code}: {entry.Title} ({DiagnosticText.SeverityName(entry.Severity)})");
        io.Out.WriteLine();
        foreach (var line in Wrap(string.Join(" ", entry.Explanation.Split('\n').Select(l => l.Trim())), 92)) io.Out.WriteLine(line);
        var cited = References.Cited(entry.Explanation);
        if (cited.Count > 0)
        {
            io.Out.WriteLine();
            io.Out.WriteLine("References:");
            foreach (var work in cited)
                foreach (var (line, first) in Wrap(work, 88).Select((l, i) => (l, i == 0))) io.Out.WriteLine((first ? "  - " : "    ") + line);
        }
        return ExitCodes.Ok;
    }

    private static IEnumerable<string> Wrap(string text, int width)
    {
        var line = new System.Text.StringBuilder();
        foreach (var word in text.Split(' ', StringSplitOptions.RemoveEmptyEntries))
        {
            if (line.Length > 0 && line.Length + 1 + word.Length > width)
            {
                yield return line.ToString();
                line.Clear();
            }
            if (line.Length > 0) line.Append(' ');
            line.Append(word);
        }
        if (line.Length > 0) yield return line.ToString();
    }
}
