using FsCheck;
using FsCheck.Fluent;
using WindScript.Tests.Support;

namespace WindScript.Tests.Properties;

/// <summary>Generators of source text: random characters, and examples damaged in realistic ways.</summary>
public static class TextMutations
{
    private static readonly string[] ExampleTexts = Repo.ExampleFiles().Select(File.ReadAllText).ToArray();

    private static readonly string[] Fragments =
    [
        "{", "}", "(", ")", ":", "->", "..", "-", "+", "*", "/", "%", "=", "#", "\n", " ", "\t", "1", "36", "0.5", "1e9",
        "mm", "A", "Hz", "rad/s", "deg", "slots", "coil", "top:", "repeat", "for", "in", "let", "machine", "winding", "drive",
        "group", "sine", "dc", "peak", "rms", "at", "phase", "balanced", "sequence", "U", "-V", "é", "\u00a0", "\r\n", "wrap(",
    ];

    public static Gen<string> Example => Gen.Elements(ExampleTexts);

    /// <summary>One edit: delete a range, insert a fragment, duplicate a line, or swap two lines.</summary>
    private static Gen<Func<string, string>> Edit =>
        Gen.OneOf(
            Gen.Zip(Gen.Choose(0, 10_000), Gen.Choose(1, 40)).Select(t => (Func<string, string>)(s =>
            {
                if (s.Length == 0) return s;
                int at = t.Item1 % s.Length;
                return s.Remove(at, Math.Min(t.Item2, s.Length - at));
            })),
            Gen.Zip(Gen.Choose(0, 10_000), Gen.Elements(Fragments)).Select(t => (Func<string, string>)(s => s.Insert(s.Length == 0 ? 0 : t.Item1 % (s.Length + 1), t.Item2))),
            Gen.Zip(Gen.Choose(0, 10_000), Gen.Choose(0, 10_000)).Select(t => (Func<string, string>)(s =>
            {
                var lines = s.Split('\n').ToList();
                int a = t.Item1 % lines.Count, b = t.Item2 % lines.Count;
                (lines[a], lines[b]) = (lines[b], lines[a]);
                lines.Insert(a, lines[b]);
                return string.Join("\n", lines);
            })));

    public static Gen<string> MutatedExample =>
        from text in Example
        from edits in Gen.ListOf(Edit).Resize(6)
        select edits.Aggregate(text, (s, e) => e(s));

    public static Gen<string> RandomText =>
        Gen.OneOf(
            ArbMap.Default.GeneratorFor<string>().Select(s => s ?? ""),
            Gen.ListOf(Gen.Elements(Fragments)).Select(list => string.Concat(list)));
}
