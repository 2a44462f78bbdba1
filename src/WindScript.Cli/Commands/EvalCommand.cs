using WindScript.Cli.Files;
using System.CommandLine;
using System.Globalization;
using WindScript.Analysis;
using WindScript.Cli.Output;
using WindScript.Diagnostics;

namespace WindScript.Cli.Commands;

/// <summary><c>windscript eval FILE</c>: evaluate a winding and print its figures.</summary>
public static class EvalCommand
{
    public static Command Create(CliIO io)
    {
        var file = CommonOptions.File("Winding file to evaluate");
        var format = CommonOptions.Format("text", "text", "json", "csv");
        var orders = new Option<int>("--orders")
        {
            Description = "Highest electrical order shown (harmonics n = v/p up to N)",
            DefaultValueFactory = _ => 25,
        };
        UsageMessages.InRange(orders, 1, InputLimits.MaxOrders);
        var at = new Option<string>("--at")
        {
            Description = "Instant for the MMF and field: seconds, or with a unit (s, ms, us), e.g. 2.5ms",
            DefaultValueFactory = _ => "0",
        };
        at.Validators.Add(r =>
        {
            if (ParseTime(r.GetValueOrDefault<string>()) is null) r.AddError($"--at: '{r.GetValueOrDefault<string>()}' is not a time within ±1e6 s (e.g. 0, 0.004, 2.5ms)");
        });
        var command = new Command("eval", "Evaluate a winding: winding factors, MMF harmonics and rotating waves, air-gap field, leakage, inductances")
        {
            file, format, orders, at,
        };
        command.SetAction(parse => Run(io, parse.GetValue(file)!, parse.GetValue(format)!, parse.GetValue(orders), ParseTime(parse.GetValue(at)!) ?? 0));
        return command;
    }

    public static int Run(CliIO io, string path, string format = "text", int orders = 25, double time = 0)
    {
        if (InputFile.Read(path, io.In, io.Err) is not { } input) return ExitCodes.Usage;
        var compilation = Compilation.Compile(input.Text, input.Path);
        if (format == "text") DiagnosticText.Write(io.Err, input.DisplayName, compilation.Source, compilation.Diagnostics);
        if (compilation.Design is not { } design)
        {
            if (format != "text") DiagnosticText.Write(io.Err, input.DisplayName, compilation.Source, compilation.Diagnostics);
            // A JSON consumer still gets a document: the diagnostics that say why there is nothing to evaluate.
            if (format == "json")
                io.Out.WriteLine(DiagnosticJson.ToText(json =>
                {
                    json.WriteStartObject();
                    json.WritePropertyName("diagnostics");
                    DiagnosticJson.WriteArray(json, input.DisplayName, compilation.Source, compilation.Diagnostics);
                    json.WriteEndObject();
                }));
            io.Err.WriteLine($"{input.DisplayName}: cannot evaluate: the file does not describe a complete machine and winding");
            return ExitCodes.Findings;
        }
        if ((long)orders * design.PolePairs > InputLimits.MaxMechanicalOrders)
        {
            io.Err.WriteLine($"windscript eval: --orders {orders} at {design.Poles} poles asks for {(long)orders * design.PolePairs:N0} mechanical orders, more than the limit of {InputLimits.MaxMechanicalOrders:N0} (--orders {Math.Max(1, InputLimits.MaxMechanicalOrders / design.PolePairs)} at most for this file)");
            return ExitCodes.Usage;
        }
        var result = MachineAnalysis.Evaluate(design, new AnalysisOptions { MaxElectricalOrder = orders, Time = time });
        switch (format)
        {
            case "json":
                io.Out.WriteLine(EvalJson.Write(input.DisplayName, compilation.Source, compilation.Diagnostics, result));
                break;
            case "csv":
                DiagnosticText.Write(io.Err, input.DisplayName, compilation.Source, compilation.Diagnostics);
                EvalCsv.Write(io.Out, result);
                break;
            default:
                EvalText.WriteSummary(io.Out, design);
                EvalAnalysisText.Write(io.Out, result);
                break;
        }
        return compilation.Diagnostics.Any(d => d.Severity == Severity.Error) ? ExitCodes.Findings : ExitCodes.Ok;
    }

    /// <summary>The largest |--at| accepted, in seconds.</summary>
    public const double MaxTimeSeconds = 1e6;

    /// <summary>A time in seconds from "0.004", "4ms", "2.5 ms", "250us" or "1s"; null if it is not one.</summary>
    public static double? ParseTime(string? text)
    {
        if (string.IsNullOrWhiteSpace(text)) return null;
        text = text.Trim();
        (string Suffix, double Scale)[] units = [("ms", 1e-3), ("us", 1e-6), ("s", 1)];
        double scale = 1;
        foreach (var (suffix, factor) in units)
            if (text.EndsWith(suffix, StringComparison.OrdinalIgnoreCase)) { text = text[..^suffix.Length].TrimEnd(); scale = factor; break; }
        // Beyond a million seconds the phase angle w*t has no digits left (and overflows at 1e308).
        return double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) && Math.Abs(v * scale) <= MaxTimeSeconds ? v * scale : null;
    }
}
