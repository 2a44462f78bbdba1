using WindScript.Diagnostics;
using WindScript.Model;
using WindScript.Semantics;
using WindScript.Syntax;
using WindScript.Text;

namespace WindScript;

/// <summary>
/// The whole pipeline for one file: text -> syntax -> semantic model -> winding design ->
/// diagnostics. This is the entry point for the CLI, the language server and library users.
/// </summary>
public sealed class Compilation
{
    private Compilation(SyntaxTree syntax, SemanticBinder.Result semantics, IReadOnlyList<Diagnostic> diagnostics)
    {
        Syntax = syntax;
        Design = semantics.Design;
        Semantics = semantics.Model;
        Diagnostics = diagnostics;
    }

    internal SyntaxTree Syntax { get; }

    /// <summary>The source text, with line starts for offset and line/column conversion.</summary>
    public SourceText Source => Syntax.Source;

    /// <summary>The evaluated machine and winding, or null if the file lacks what one needs.</summary>
    public WindingDesign? Design { get; }

    internal SemanticModel Semantics { get; }

    /// <summary>Every diagnostic, in source order.</summary>
    public IReadOnlyList<Diagnostic> Diagnostics { get; }

    /// <summary>True if any diagnostic is an error.</summary>
    public bool HasErrors => Diagnostics.Any(d => d.Severity == Severity.Error);

    /// <summary>Compiles source text; <paramref name="path"/> names the file in diagnostics.</summary>
    public static Compilation Compile(string text, string path = "") => Compile(new SourceText(text, path));

    /// <summary>Compiles a source text: parse, bind, evaluate and check.</summary>
    public static Compilation Compile(SourceText source)
    {
        var syntax = SyntaxTree.Parse(source);
        // A refused file has nothing to evaluate: its one diagnostic says why.
        var semantics = syntax.Refused ? new SemanticBinder.Result(null, new SemanticModel(), []) : SemanticBinder.Bind(syntax);
        var all = new List<Diagnostic>(syntax.Diagnostics);
        all.AddRange(semantics.Diagnostics);
        if (semantics.Design is { } design)
            // An error inside a drive cannot change the winding: it does not hold the winding checks back.
            all.AddRange(Checking.Checker.Check(design, syntax,
                sourceHasErrors: all.Any(d => d.Severity == Severity.Error && !design.Drives.Any(drive => drive.Span.Contains(d.Span)))));
        all = DiagnosticFlood.Collapse(all);
        all.Sort((a, b) => a.Span.Start != b.Span.Start ? a.Span.Start.CompareTo(b.Span.Start) : string.CompareOrdinal(a.Code, b.Code));
        return new Compilation(syntax, semantics, all);
    }
}
