using WindScript.Diagnostics;

namespace WindScript.Checking;

/// <summary>
/// A declared 'pitch' that the winding's own coils contradict: the declaration is what a reader
/// (and the closed-form pitch factor) takes for the winding, so it must say what the coils do.
/// A coil's span is counted the short way round (1 -> 8 and 8 -> 1 both span 7 slots of 48...).
/// Coils of a group are judged by the group's own pitch, so only the winding's direct coils count.
/// </summary>
internal static class DeclaredPitchCheck
{
    private const int Listed = 6;

    public static void Run(CheckContext c)
    {
        var w = c.Design.Winding;
        int q = c.Design.Slots;
        if (w.DeclaredPitch is not { } declared || w.PitchSpan == default || q < 2) return;
        int Short(int y) => Math.Min(y, q - y);
        var differing = w.Coils.Where(coil => coil.Group == "" && coil.GoSlot != coil.ReturnSlot && Short(coil.PitchSlots(q)) != Short(declared))
            .DistinctBy(coil => coil.Span == default ? (object)coil : coil.Span).ToArray();
        if (differing.Length == 0) return;
        string Line(Model.Coil coil) => c.Syntax is { } tree && coil.Span != default ? $" (line {tree.Source.GetPosition(coil.Span.Start).Line + 1})" : "";
        var listed = differing.Take(Listed).Select(coil => $"{coil.GoSlot} -> {coil.ReturnSlot} spans {Short(coil.PitchSlots(q))}{Line(coil)}");
        string more = differing.Length > Listed ? $" and {differing.Length - Listed} more" : "";
        c.Diagnostics.Add(DiagnosticCatalog.DeclaredPitchContradicted.At(w.PitchSpan,
                $"pitch {declared} slots is declared, but {differing.Length} coil{(differing.Length == 1 ? "" : "s")} span{(differing.Length == 1 ? "s" : "")} a different number of slots: {string.Join(", ", listed)}{more}")
            with { Related = [.. differing.Take(Listed).Where(coil => coil.Span != default).Select(coil => new RelatedSpan(coil.Span, $"spans {Short(coil.PitchSlots(q))} slots"))] });
    }
}
