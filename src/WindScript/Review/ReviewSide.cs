using WindScript.Analysis;
using WindScript.Model;

namespace WindScript.Review;

/// <summary>
/// One side of a review: a compiled file and its analysis. <see cref="Compilation"/> is null
/// for an absent file (git's /dev/null for an added or deleted file); <see cref="Analysis"/> is
/// null when the file does not describe a complete machine and winding.
/// </summary>
public sealed record ReviewSide(string Label, Compilation? Compilation, AnalysisResult? Analysis)
{
    /// <summary>Orders up to this electrical order are analysed for a review.</summary>
    public const int MaxElectricalOrder = 25;

    /// <summary>The design of this side, or null.</summary>
    public WindingDesign? Design => Compilation?.Design;

    /// <summary>True if this side does not exist (a file added or deleted in git).</summary>
    public bool IsAbsent => Compilation is null;

    /// <summary>Compiles and analyses a source text.</summary>
    public static ReviewSide FromText(string text, string label) => Of(Compilation.Compile(text, label), label);

    /// <summary>A side from a compilation, evaluated once.</summary>
    public static ReviewSide Of(Compilation compilation, string label)
    {
        var analysis = compilation.Design is { } design
            ? MachineAnalysis.Evaluate(design, new AnalysisOptions { MaxElectricalOrder = MaxElectricalOrder })
            : null;
        return new ReviewSide(label, compilation, analysis);
    }

    /// <summary>A side with no file at all.</summary>
    public static ReviewSide Absent(string label) => new(label, null, null);
}
