using WindScript.Analysis;
using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Syntax;

namespace WindScript.Checking;

/// <summary>What every check reads: the design, its source tree, and the analyses computed once.</summary>
internal sealed class CheckContext(WindingDesign design, SyntaxTree? syntax)
{
    private WindingSpectrum? _spectrum;
    private WindingSymmetry? _symmetry;

    public WindingDesign Design { get; } = design;

    /// <summary>The source, when the design came from text (null for designs built in code).</summary>
    public SyntaxTree? Syntax { get; } = syntax;

    public DiagnosticBag Diagnostics { get; } = new();

    public WindingSpectrum Spectrum => _spectrum ??= WindingSpectrum.Of(Design);

    public WindingSymmetry Symmetry => _symmetry ??= WindingSymmetry.Of(Design);

    public int PhaseCount => Design.Phases.Length;

    /// <summary>True if every phase has at least one coil: the balance checks mean nothing before that.</summary>
    public bool EveryPhaseWound => Enumerable.Range(0, PhaseCount).All(p => Design.Winding.Coils.Any(c => c.Phase == p));

    public string PhaseName(int phase) => Design.Phases[phase].Name;
}
