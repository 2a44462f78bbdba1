using System.Text.Json;
using Json.Schema;

namespace WindScript.Tests.Support;

/// <summary>
/// The JSON Schemas under schemas/, built once with JsonSchema.Net (the validator the SARIF tests
/// use) into one registry, so that "$ref": "diagnostic.schema.json" resolves between them.
/// </summary>
public static class Schemas
{
    public static string Folder => Path.Combine(Repo.Root, "schemas");

    private static readonly Lazy<IReadOnlyDictionary<string, JsonSchema>> All = new(Load);

    public static IEnumerable<string> Names() => Directory.EnumerateFiles(Folder, "*.schema.json").Select(Path.GetFileName).Order(StringComparer.Ordinal)!;

    /// <summary>Validates <paramref name="json"/> against schemas/<paramref name="name"/>; the list of problems is empty when valid.</summary>
    public static IReadOnlyList<string> Problems(string name, string json)
    {
        using var document = JsonDocument.Parse(json);
        return Problems(name, document.RootElement);
    }

    public static IReadOnlyList<string> Problems(string name, JsonElement value)
    {
        var result = All.Value[name].Evaluate(value, new EvaluationOptions { OutputFormat = OutputFormat.List });
        if (result.IsValid) return [];
        return [.. (result.Details ?? [])
            .Where(d => d.Errors is { Count: > 0 })
            .SelectMany(d => d.Errors!.Select(e => $"{d.InstanceLocation}: {e.Key}: {e.Value}"))
            .DefaultIfEmpty("invalid (no detail)")];
    }

    private static IReadOnlyDictionary<string, JsonSchema> Load()
    {
        var options = new BuildOptions { SchemaRegistry = new SchemaRegistry() };
        var schemas = new Dictionary<string, JsonSchema>();
        // Referenced schemas first, so that the referring ones find them in the registry.
        foreach (var name in Names().OrderBy(n => n == "diagnostic.schema.json" ? 0 : 1))
            schemas[name] = JsonSchema.FromFile(Path.Combine(Folder, name), options);
        return schemas;
    }
}
