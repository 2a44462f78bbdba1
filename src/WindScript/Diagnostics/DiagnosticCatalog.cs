using System.Reflection;

namespace WindScript.Diagnostics;

/// <summary>
/// The one catalogue of diagnostic codes. Entries live in partial files by area:
/// WS1xxx syntax, WS2xxx names, units and evaluation, WS3xxx winding consistency,
/// WS4xxx drives, WS5xxx geometry, WS6xxx synthesis. Codes are never reused or renumbered.
/// </summary>
internal static partial class DiagnosticCatalog
{
    private static readonly Lazy<IReadOnlyList<DiagnosticDescriptor>> _all = new(() => Collect(typeof(DiagnosticCatalog)));

    // The annotation keeps the fields' metadata when the CLI is trimmed or compiled ahead of time.
    private static IReadOnlyList<DiagnosticDescriptor> Collect(
        [System.Diagnostics.CodeAnalysis.DynamicallyAccessedMembers(System.Diagnostics.CodeAnalysis.DynamicallyAccessedMemberTypes.PublicFields)] Type catalog) =>
        catalog
            .GetFields(BindingFlags.Public | BindingFlags.Static)
            .Where(f => f.FieldType == typeof(DiagnosticDescriptor))
            .Select(f => (DiagnosticDescriptor)f.GetValue(null)!)
            .OrderBy(d => d.Code, StringComparer.Ordinal)
            .ToArray();

    /// <summary>Every entry, ordered by code.</summary>
    public static IReadOnlyList<DiagnosticDescriptor> All => _all.Value;

    public static DiagnosticDescriptor? Find(string code) =>
        All.FirstOrDefault(d => string.Equals(d.Code, code, StringComparison.OrdinalIgnoreCase));
}
