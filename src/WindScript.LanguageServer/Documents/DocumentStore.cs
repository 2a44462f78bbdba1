namespace WindScript.LanguageServer.Documents;

/// <summary>The documents the client has opened, by URI.</summary>
public sealed class DocumentStore
{
    private readonly Dictionary<string, Document> _documents = new(StringComparer.Ordinal);

    public IEnumerable<Document> All => _documents.Values;

    public Document Open(string uri, int version, string text)
    {
        var document = new Document(uri, version, text);
        _documents[uri] = document;
        return document;
    }

    public Document? Find(string uri) => _documents.GetValueOrDefault(uri);

    public bool Close(string uri) => _documents.Remove(uri);
}
