using WindScript.Model;

namespace WindScript.Tests.Support;

/// <summary>Small helpers to compile test snippets.</summary>
public static class Wind
{
    public const string Machine36 = """
        machine m {
          slots 36
          poles 4
          phases U V W
        }

        """;

    public static Compilation Compile(string text) => Compilation.Compile(text);

    /// <summary>Compiles and insists on no errors (warnings allowed), returning the design.</summary>
    public static WindingDesign Design(string text)
    {
        var c = Compilation.Compile(text);
        Assert.False(c.HasErrors, string.Join("\n", c.Diagnostics.Select(d => $"{c.Source.GetPosition(d.Span.Start)} {d.Code} {d.Message}")));
        return c.Design!;
    }

    /// <summary>
    /// Compiles a winding fragment (not a whole machine: phases may be left unwound) and insists
    /// that it reads and evaluates without errors; the winding checks' errors are allowed.
    /// </summary>
    public static WindingDesign Evaluated(string text)
    {
        var c = Compilation.Compile(text);
        var errors = c.Diagnostics.Where(d => d.Severity == WindScript.Diagnostics.Severity.Error && !d.Code.StartsWith("WS3", StringComparison.Ordinal)).ToArray();
        Assert.True(errors.Length == 0, string.Join("\n", errors.Select(d => $"{c.Source.GetPosition(d.Span.Start)} {d.Code} {d.Message}")));
        return c.Design!;
    }

    public static string[] Codes(string text) => Compilation.Compile(text).Diagnostics.Select(d => d.Code).ToArray();
}
