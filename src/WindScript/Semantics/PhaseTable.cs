using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Syntax;

namespace WindScript.Semantics;

/// <summary>Resolves phase names written in coils, patterns and drives, recording each reference.</summary>
internal sealed class PhaseTable(IReadOnlyList<Phase> phases, SemanticModel model, DiagnosticBag diagnostics)
{
    public IReadOnlyList<Phase> Phases { get; } = phases;

    public int? Resolve(NameSyntax name)
    {
        foreach (var phase in Phases)
        {
            if (phase.Name != name.Text) continue;
            model.Define(phase.Name, SymbolKind.Phase, phase.Span).AddReference(name.Span);
            return phase.Index;
        }
        // Without a phases statement, the missing declaration is the one error to report.
        if (Phases.Count > 0)
            diagnostics.Add(DiagnosticCatalog.UnknownPhase, name.Span,
                $"'{name.Text}' is not a phase of this machine (phases: {string.Join(" ", Phases.Select(p => p.Name))})");
        return null;
    }
}
