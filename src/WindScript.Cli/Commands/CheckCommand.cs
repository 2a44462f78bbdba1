using WindScript.Cli.Files;
using System.CommandLine;
using WindScript.Cli.Output;
using WindScript.Diagnostics;

namespace WindScript.Cli.Commands;

/// <summary><c>windscript check FILE...</c>: report every diagnostic; exit 1 if any is an error.</summary>
public static class CheckCommand
{
    public static Command Create(CliIO io)
    {
        var files = CommonOptions.Files("Winding files to check");
        var format = CommonOptions.Format(OutputFormat.Text, OutputFormat.Text, OutputFormat.Json, OutputFormat.Sarif);
        var warningsAsErrors = new Option<bool>("--warnings-as-errors") { Description = "Fail (exit 1) on warnings too" };
        var command = new Command("check", "Check winding files and report problems with their exact place") { files, format, warningsAsErrors };
        command.SetAction(parse => Run(io, parse.GetValue(files)!, OutputFormats.Parse(parse.GetValue(format)!), parse.GetValue(warningsAsErrors)));
        return command;
    }

    public static int Run(CliIO io, string[] paths, OutputFormat format, bool warningsAsErrors)
    {
        var results = new List<(InputFile File, Compilation Compilation)>();
        bool unreadable = false;
        foreach (var path in paths)
        {
            if (InputFile.Read(path, io.In, io.Err) is not { } file) { unreadable = true; continue; }
            results.Add((file, Compilation.Compile(file.Text, file.Path)));
        }

        if (format == OutputFormat.Sarif)
        {
            string version = typeof(CheckCommand).Assembly.GetName().Version?.ToString(3) ?? "0.0.0";
            io.Out.WriteLine(DiagnosticJson.ToText(json => SarifWriter.Write(json, results.Select(r => (r.File.DisplayName, r.Compilation)), version)));
        }
        else if (format == OutputFormat.Json)
        {
            io.Out.WriteLine(DiagnosticJson.ToText(json =>
            {
                json.WriteStartObject();
                json.WriteStartArray("diagnostics");
                foreach (var (file, c) in results)
                    foreach (var d in c.Diagnostics) DiagnosticJson.WriteOne(json, file.DisplayName, c.Source, d);
                json.WriteEndArray();
                json.WriteEndObject();
            }));
        }
        else
        {
            foreach (var (file, c) in results) DiagnosticText.Write(io.Out, file.DisplayName, c.Source, c.Diagnostics);
        }

        if (unreadable) return ExitCodes.Usage;
        bool failed = results.Any(r => r.Compilation.Diagnostics.Any(d =>
            d.Severity == Severity.Error || (warningsAsErrors && d.Severity == Severity.Warning)));
        return failed ? ExitCodes.Findings : ExitCodes.Ok;
    }
}
