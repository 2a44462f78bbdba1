using WindScript.Cli.Files;
using System.CommandLine;
using System.Globalization;
using WindScript.Reporting.Plots;
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
        var format = CommonOptions.Format(OutputFormat.Text, OutputFormat.Text, OutputFormat.Json, OutputFormat.Csv);
        var orders = new Option<int>("--orders")
        {
            Description = "Highest electrical order shown (harmonics n = v/p up to N)",
            DefaultValueFactory = _ => 25,
        };
        UsageMessages.InRange(orders, 1, InputLimits.MaxOrders);
        var at = new Option<string>("--at")
        {
            Description = "Instant for the MMF and field, as plot --at takes it: seconds, or with a unit (2.5 ms, 250 us, or 90 deg of the first drive's period)",
            DefaultValueFactory = _ => "0",
        };
        at.Validators.Add(r =>
        {
            // An angle needs the file's drive (its period) and is read in Run; anything else is checked here.
            string text = r.GetValueOrDefault<string>() ?? "";
            if (!TimeValue.TryParse(text, 1, out _, out string error)) r.AddError($"--at: {error}");
        });
        var command = new Command("eval", "Evaluate a winding: winding factors, MMF harmonics and rotating waves, air-gap field, leakage, inductances")
        {
            file, format, orders, at,
        };
        command.SetAction(parse => Run(io, parse.GetValue(file)!, OutputFormats.Parse(parse.GetValue(format)!), parse.GetValue(orders), parse.GetValue(at)!));
        return command;
    }

    public static int Run(CliIO io, string path, OutputFormat format = OutputFormat.Text, int orders = 25, string at = "0")
    {
        if (InputFile.Read(path, io.In, io.Err) is not { } input) return ExitCodes.Usage;
        var compilation = Compilation.Compile(input.Text, input.Path);
        if (format == OutputFormat.Text) DiagnosticText.Write(io.Err, input.DisplayName, compilation.Source, compilation.Diagnostics);
        if (compilation.Design is not { } design)
        {
            if (format != OutputFormat.Text) DiagnosticText.Write(io.Err, input.DisplayName, compilation.Source, compilation.Diagnostics);
            // A JSON consumer still gets a document: the diagnostics that say why there is nothing to evaluate.
            if (format == OutputFormat.Json)
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
        // The same reading of --at as plot's: an angle is taken within the first drive's period.
        if (!TimeValue.TryParse(at, Excitation.Resolve(design, null)?.PeriodSeconds, out double time, out string atError))
        {
            io.Err.WriteLine($"windscript eval: --at: {atError}");
            return ExitCodes.Usage;
        }
        var result = MachineAnalysis.Evaluate(design, new AnalysisOptions { MaxElectricalOrder = orders, Time = time });
        switch (format)
        {
            case OutputFormat.Json:
                io.Out.WriteLine(EvalJson.Write(input.DisplayName, compilation.Source, compilation.Diagnostics, result));
                break;
            case OutputFormat.Csv:
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
}
