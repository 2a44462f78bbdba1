namespace WindScript.LanguageServer.Documents;

/// <summary>
/// An open document: its current text and version, and the compilation of that text, built on
/// first use and reused until the next change (files are small: every change re-parses it all).
/// </summary>
public sealed class Document(string uri, int version, string text)
{
    private Compilation? _compilation;

    public string Uri { get; } = uri;

    public int Version { get; private set; } = version;

    public string Text { get; private set; } = text;

    /// <summary>The version whose diagnostics the client last received, or null.</summary>
    public int? PublishedVersion { get; set; }

    public Compilation Compilation => _compilation ??= WindScript.Compilation.Compile(Text, Uri);

    public void Update(int version, string text)
    {
        Version = version;
        Text = text;
        _compilation = null;
    }
}
