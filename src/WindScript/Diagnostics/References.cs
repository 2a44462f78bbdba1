namespace WindScript.Diagnostics;

/// <summary>
/// The published works that catalogue explanations cite. An explanation cites them in one style:
/// its last sentence is "Sources: " followed by items separated by "; ", each item a short name
/// from this table with an optional locator and topic ("Pyrhonen et al. 2014, ch. 2 (pitch factor)"), or "common practice"
/// for a fact of the trade with no single source. `explain` prints the full entry of every work cited.
/// </summary>
internal static class References
{
    /// <summary>The marker that opens the sources sentence of an explanation.</summary>
    public const string SourcesMarker = "Sources: ";

    /// <summary>Short name to full reference.</summary>
    public static readonly IReadOnlyDictionary<string, string> Works = new Dictionary<string, string>(StringComparer.Ordinal)
    {
        ["Pyrhonen et al. 2014"] = "J. Pyrhonen, T. Jokinen, V. Hrabovcova, Design of Rotating Electrical Machines, 2nd ed., Wiley, 2014.",
        ["Fitzgerald et al. 2003"] = "A. E. Fitzgerald, C. Kingsley Jr., S. D. Umans, Electric Machinery, 6th ed., McGraw-Hill, 2003.",
        ["Bianchi and Dai Pre 2006"] = "N. Bianchi, M. Dai Pre, \"Use of the star of slots in designing fractional-slot single-layer synchronous motors\", IEE Proc. Electric Power Applications 153(3), 2006.",
        ["IEC 60317-0-1"] = "IEC 60317-0-1, Specifications for particular types of winding wires, Part 0-1: General requirements, Enamelled round copper wire (the overall diameters used here are from memory).",
        ["Carter 1901"] = "F. W. Carter, \"Air-gap induction\", Electrical World and Engineer 38, 1901 (from memory).",
    };

    /// <summary>A source item that names no work.</summary>
    public const string CommonPractice = "common practice";

    /// <summary>The sources sentence of <paramref name="explanation"/> split into items, or empty when it cites none.</summary>
    public static IReadOnlyList<string> ItemsOf(string explanation)
    {
        int at = explanation.LastIndexOf(SourcesMarker, StringComparison.Ordinal);
        if (at < 0) return [];
        var sentence = explanation[(at + SourcesMarker.Length)..].TrimEnd();
        if (sentence.EndsWith('.')) sentence = sentence[..^1];
        return sentence.Split("; ", StringSplitOptions.TrimEntries);
    }

    /// <summary>The work an item names (its short name, before any ", locator"), or null for common practice or an unknown name.</summary>
    public static string? WorkOf(string item) =>
        Works.Keys.FirstOrDefault(k => item == k || item.StartsWith(k + ",", StringComparison.Ordinal) || item.StartsWith(k + " (", StringComparison.Ordinal));

    /// <summary>The full references of the works <paramref name="explanation"/> cites, in order of citation.</summary>
    public static IReadOnlyList<string> Cited(string explanation) =>
        [.. ItemsOf(explanation).Select(WorkOf).OfType<string>().Distinct().Select(k => Works[k])];
}
