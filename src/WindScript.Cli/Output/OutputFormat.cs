namespace WindScript.Cli.Output;

/// <summary>The output formats of the commands; each command accepts its own subset.</summary>
public enum OutputFormat
{
    /// <summary>Text for people.</summary>
    Text,
    /// <summary>One JSON document (schemas/).</summary>
    Json,
    /// <summary>Comma-separated values with a header line.</summary>
    Csv,
    /// <summary>SARIF 2.1.0 for code scanning.</summary>
    Sarif,
    /// <summary>JSON Lines: one JSON object per line.</summary>
    JsonLines,
    /// <summary>Apache Parquet (columnar, for data tools).</summary>
    Parquet,
}

/// <summary>The one place an output format meets its command-line name.</summary>
public static class OutputFormats
{
    private static readonly (OutputFormat Format, string Name)[] Names =
    [
        (OutputFormat.Text, "text"),
        (OutputFormat.Json, "json"),
        (OutputFormat.Csv, "csv"),
        (OutputFormat.Sarif, "sarif"),
        (OutputFormat.JsonLines, "jsonl"),
        (OutputFormat.Parquet, "parquet"),
    ];

    /// <summary>The name written after <c>--format</c>.</summary>
    public static string Name(OutputFormat format) => Names.First(n => n.Format == format).Name;

    /// <summary>The format a name stands for (the option only lets through names of its own formats).</summary>
    public static OutputFormat Parse(string name) =>
        Names.FirstOrDefault(n => n.Name == name) is { Name: not null } found ? found.Format
            : throw new ArgumentException($"unknown output format '{name}'", nameof(name));
}
