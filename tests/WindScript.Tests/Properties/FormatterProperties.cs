using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using WindScript.Formatting;
using WindScript.Syntax;
using WindScript.Tests.Support;

namespace WindScript.Tests.Properties;

/// <summary>
/// The formatter is idempotent and never changes meaning. Inputs are examples re-spaced at
/// random (the formatter must undo that) and damaged examples that still parse.
/// </summary>
public class FormatterProperties
{
    // Re-space an example: random extra spaces and tabs between tokens, random indentation,
    // blank lines, while keeping the token sequence (and so the meaning) intact.
    private static Gen<string> Respaced => RespacedWith(blankLines: true);

    private static Gen<string> RespacedWith(bool blankLines) =>
        from text in TextMutations.Example
        from seed in Gen.Choose(0, int.MaxValue)
        select Respace(text, seed, blankLines);

    private static string Respace(string text, int seed, bool blankLines)
    {
        var rng = new Random(seed);
        var sb = new System.Text.StringBuilder();
        foreach (var line in text.Split('\n'))
        {
            sb.Append(new string(rng.Next(3) == 0 ? '\t' : ' ', rng.Next(0, 6)));
            bool inComment = false; // comment text is kept verbatim, so leave it alone
            foreach (char ch in line.Trim())
            {
                inComment |= ch == '#';
                sb.Append(ch);
                if (ch == ' ' && !inComment) sb.Append(' ', rng.Next(0, 3));
            }
            sb.Append(blankLines && rng.Next(8) == 0 ? "\n\n\n" : "\n");
        }
        return sb.ToString();
    }

    private static Gen<string> Parsable =>
        Gen.OneOf(Respaced, TextMutations.MutatedExample.Where(t => !SyntaxTree.Parse(t).HasErrors));

    [Property(MaxTest = 1000)]
    public Property Formatting_is_idempotent() =>
        Prop.ForAll(Parsable.ToArbitrary(), text =>
        {
            var once = Formatter.Format(text);
            return once is not null && Formatter.Format(once) == once;
        });

    [Property(MaxTest = 1000)]
    public Property Formatting_never_changes_the_evaluated_model_or_loses_a_comment() =>
        Prop.ForAll(Parsable.ToArbitrary(), text =>
        {
            var before = Compilation.Compile(text);
            var formatted = Formatter.Format(text)!;
            var after = Compilation.Compile(formatted);
            bool sameModel = (before.Design, after.Design) switch
            {
                (null, null) => true,
                ({ } a, { } b) => ModelText.Describe(a) == ModelText.Describe(b),
                _ => false,
            };
            var commentsBefore = before.Syntax.Comments.Select(c => c.Text);
            var commentsAfter = after.Syntax.Comments.Select(c => c.Text);
            var codesBefore = before.Diagnostics.Select(d => d.Code).Order();
            var codesAfter = after.Diagnostics.Select(d => d.Code).Order();
            return sameModel && commentsBefore.SequenceEqual(commentsAfter) && codesBefore.SequenceEqual(codesAfter);
        });

    private static readonly HashSet<string> Examples = Repo.ExampleFiles().Select(File.ReadAllText).ToHashSet();

    [Property(MaxTest = 200)]
    public Property Formatting_undoes_any_respacing() =>
        Prop.ForAll(RespacedWith(blankLines: false).ToArbitrary(), text =>
        {
            var formatted = Formatter.Format(text)!;
            return Examples.Contains(formatted);
        });
}
