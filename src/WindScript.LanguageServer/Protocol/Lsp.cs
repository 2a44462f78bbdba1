namespace WindScript.LanguageServer.Protocol;

/// <summary>Numeric enumerations of LSP 3.17 that this server uses.</summary>
public static class Lsp
{
    public static class DiagnosticSeverity
    {
        public const int Error = 1, Warning = 2, Information = 3, Hint = 4;
    }

    public static class SymbolKind
    {
        public const int Module = 2, Namespace = 3, Class = 5, Field = 8, Function = 12, Variable = 13, Constant = 14,
            EnumMember = 22, Struct = 23, Event = 24;
    }

    public static class CompletionItemKind
    {
        public const int Function = 3, Variable = 6, Unit = 11, Value = 12, Keyword = 14, Snippet = 15, Constant = 21, EnumMember = 20;
    }

    public static class TextDocumentSyncKind
    {
        public const int Full = 1, Incremental = 2;
    }

    public static class InsertTextFormat
    {
        public const int PlainText = 1, Snippet = 2;
    }
}
