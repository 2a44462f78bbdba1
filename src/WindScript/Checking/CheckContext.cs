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

    /// <summary>Coils a balance error has named as its cause (no second diagnostic points at them).</summary>
    public HashSet<Coil> Culprits { get; } = new(ReferenceEqualityComparer.Instance);

    /// <summary>Errors of the source outside the winding checks, computed once when a fix is verified.</summary>
    public HashSet<string>? OtherErrors { get; set; }

    public int PhaseCount => Design.Phases.Length;

    public string PhaseName(int phase) => Design.Phases[phase].Name;
}
