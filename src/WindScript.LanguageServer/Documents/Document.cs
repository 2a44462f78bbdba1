using WindScript.Analysis;
using WindScript.LanguageServer.Rpc;

namespace WindScript.LanguageServer.Documents;

/// <summary>
/// An open document: its current text and version, and the compilation of that text, built on
/// first use and reused until the next change (files are small: every change re-parses it all).
/// </summary>
public sealed class Document(string uri, int version, string text)
{
    private Compilation? _compilation;
    private (bool Done, AnalysisResult? Result) _analysis;

    public string Uri { get; } = uri;

    public int Version { get; private set; } = version;

    public string Text { get; private set; } = text;

    /// <summary>The version whose diagnostics the client last received, or null.</summary>
    public int? PublishedVersion { get; set; }

    public Compilation Compilation => _compilation ??= Compile();

    /// <summary>The physics of the current design (winding factors, spectra), or null without a complete design.</summary>
    public AnalysisResult? Analysis
    {
        get
        {
            if (!_analysis.Done) _analysis = (true, Compilation.Design is { } design ? MachineAnalysis.Evaluate(design, HoverAnalysis) : null);
            return _analysis.Result;
        }
    }

    /// <summary>Hover shows the main harmonics, so orders up to the 25th electrical are plenty.</summary>
    private static readonly AnalysisOptions HoverAnalysis = new() { MaxElectricalOrder = 25 };

    // The core refuses absurdly deep nesting with a diagnostic (SyntaxTree.MaxNesting), so any text is safe to compile.
    private Compilation Compile() => WindScript.Compilation.Compile(Text, Uri);

    public void Update(int version, string text)
    {
        Version = version;
        Text = text;
        _compilation = null;
        _analysis = default;
    }
}
