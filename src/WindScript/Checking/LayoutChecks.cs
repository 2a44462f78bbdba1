using WindScript.Diagnostics;
using WindScript.Model;

namespace WindScript.Checking;

/// <summary>Coil sides that cannot share a place: more sides in a slot layer than it holds.</summary>
internal static class LayoutChecks
{
    public static void Run(CheckContext c)
    {
        var d = c.Design;
        int layers = d.Winding.Layers;
        var first = new Coil?[d.Slots, Math.Max(1, layers)];
        var reported = new HashSet<Coil>();
        // In source order, so the later line is the one reported.
        foreach (var coil in d.Winding.Coils.OrderBy(x => x.Span.Start))
        {
            Place(coil, coil.GoSlot, coil.GoLayer);
            if (coil.ReturnSlot != coil.GoSlot || coil.ReturnLayer != coil.GoLayer) Place(coil, coil.ReturnSlot, coil.ReturnLayer);
        }

        void Place(Coil coil, int slot, int layer)
        {
            if (slot < 1 || slot > d.Slots || layer < 0 || layer >= first.GetLength(1)) return;
            if (first[slot - 1, layer] is not { } earlier)
            {
                first[slot - 1, layer] = coil;
                return;
            }
            if (!reported.Add(coil)) return;
            string where = layers == 1 ? $"slot {slot}" : $"the {Syntax.Vocabulary.Word(layer == 0 ? Syntax.LayerName.Top : Syntax.LayerName.Bottom)} layer of slot {slot}";
            c.Diagnostics.Add(DiagnosticCatalog.LayerOverfilled.At(coil.Span,
                    $"{where} already holds a coil side of phase {c.PhaseName(earlier.Phase)}; a {layers}-layer slot holds {layers} side{(layers == 1 ? "" : "s")}")
                with { Related = earlier.Span != default ? [new RelatedSpan(earlier.Span, "the coil already there")] : [] });
        }
    }
}
