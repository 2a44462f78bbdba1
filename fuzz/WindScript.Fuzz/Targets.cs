using System.Text;
using WindScript.Formatting;
using WindScript.LanguageServer.Rpc;
using WindScript.Review;
using WindScript.Syntax;

namespace WindScript.Fuzz;

/// <summary>
/// The fuzz targets. Each takes raw bytes and throws (a crash, for AFL) when a property fails:
/// any exception from the code under test, or a violated invariant.
/// </summary>
public static class Targets
{
    public static readonly IReadOnlyDictionary<string, Action<byte[]>> All = new Dictionary<string, Action<byte[]>>
    {
        ["syntax"] = Syntax,
        ["semantics"] = Semantics,
        ["format"] = Format,
        ["lsp"] = Lsp,
    };

    private static string Text(byte[] bytes) => Encoding.UTF8.GetString(bytes);

    /// <summary>Lexer and parser: parsing never fails, and every diagnostic lies inside the text.</summary>
    public static void Syntax(byte[] bytes)
    {
        string text = Text(bytes);
        var tree = SyntaxTree.Parse(text);
        foreach (var d in tree.Diagnostics)
            if (d.Span.Start < 0 || d.Span.End > text.Length) throw new InvalidOperationException($"diagnostic span {d.Span} outside the text");
    }

    /// <summary>Binder, checker and analysis: the whole pipeline and the physical summary never throw, and no figure is NaN or infinite.</summary>
    public static void Semantics(byte[] bytes)
    {
        string text = Text(bytes);
        var compilation = Compilation.Compile(text);
        foreach (var d in compilation.Diagnostics)
            if (d.Span.Start < 0 || d.Span.End > text.Length) throw new InvalidOperationException($"diagnostic span {d.Span} outside the text");
        foreach (var line in PhysicalFacts.Of(ReviewSide.FromText(text, "fuzz")))
            if (line.Contains("NaN", StringComparison.Ordinal) || line.Contains("Infinity", StringComparison.Ordinal) || line.Contains('∞'))
                throw new InvalidOperationException("a non-finite figure reached the output: " + line);
    }

    /// <summary>Formatter: idempotent, and the formatted file means the same (the same physical facts).</summary>
    public static void Format(byte[] bytes)
    {
        string text = Text(bytes);
        if (Formatter.Format(text) is not { } once) return;   // files with syntax errors are refused, by design
        if (Formatter.Format(once) is not { } twice) throw new InvalidOperationException("the formatted text does not parse");
        if (twice != once) throw new InvalidOperationException("formatting is not idempotent");
        var before = string.Join("\n", PhysicalFacts.Of(ReviewSide.FromText(text, "fuzz")));
        var after = string.Join("\n", PhysicalFacts.Of(ReviewSide.FromText(once, "fuzz")));
        if (before != after) throw new InvalidOperationException("formatting changed the meaning");
    }

    /// <summary>The language server's message reader: any byte stream gives frames or frame errors, never an exception, and ends.</summary>
    public static void Lsp(byte[] bytes)
    {
        var reader = new MessageReader(new MemoryStream(bytes));
        for (int frames = 0; ; frames++)
        {
            if (frames > bytes.Length + 1) throw new InvalidOperationException("the reader does not make progress");
            var frame = reader.ReadAsync().AsTask().GetAwaiter().GetResult();
            if (frame is null) return;
            if (frame.Value.Body is null && frame.Value.Error is null) throw new InvalidOperationException("a frame with neither body nor error");
        }
    }
}
