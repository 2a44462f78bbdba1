using System.Text.Json.Serialization;
using WindScript.Analysis;

namespace WindScript.Cli.Output.Json;

/// <summary>
/// The whole analysis part of <c>eval --format json</c> (everything but schemaVersion, file and
/// diagnostics, which <see cref="EvalJson"/> adds around it).
/// </summary>
public sealed record EvalAnalysisJson(
    [property: JsonPropertyName("machine")] MachineJson Machine,
    [property: JsonPropertyName("winding")] WindingJson Winding,
    [property: JsonPropertyName("phases")] IReadOnlyList<PhaseJson> Phases,
    [property: JsonPropertyName("differentialLeakage")] double? DifferentialLeakage,
    [property: JsonPropertyName("balanced")] BalancedJson Balanced,
    [property: JsonPropertyName("gap")] GapJson Gap,
    [property: JsonPropertyName("inductances")] InductancesJson? Inductances,
    [property: JsonPropertyName("backEmf")] BackEmfJson? BackEmf,
    [property: JsonPropertyName("drives")] IReadOnlyList<DriveJson> Drives,
    [property: JsonPropertyName("assumptions")] IReadOnlyList<string> Assumptions,
    [property: JsonPropertyName("defaults")] IReadOnlyList<string> Defaults,
    [property: JsonPropertyName("notes")] IReadOnlyList<string> Notes,
    [property: JsonPropertyName("conductors")] ConductorsJson? Conductors)
{
    public static EvalAnalysisJson From(AnalysisResult r) => new(
        MachineJson.From(r.Machine), WindingJson.From(r.Winding), [.. r.Phases.Select(PhaseJson.From)],
        r.DifferentialLeakage, BalancedJson.From(r.Balanced), GapJson.From(r.Gap), InductancesJson.From(r.Inductances),
        BackEmfJson.From(r.BackEmf), [.. r.Drives.Select(DriveJson.From)], r.Assumptions, r.Defaults, r.Notes,
        ConductorsJson.From(r.Conductors));
}

// Property names come from the attributes above, never from a naming policy: a renamed C#
// property cannot rename a field. Named floating-point literals stay allowed only so that a
// stray non-finite value is visible rather than an exception (the core promises none).
[JsonSourceGenerationOptions(NumberHandling = JsonNumberHandling.AllowNamedFloatingPointLiterals)]
[JsonSerializable(typeof(EvalAnalysisJson))]
internal sealed partial class EvalJsonContext : JsonSerializerContext;
