using WindScript.Syntax;
using WindScript.Tests.Support;

namespace WindScript.Tests.Semantics;

/// <summary>
/// Statement order never changes meaning: each block is read in passes (values, then the counts
/// other properties depend on, then the rest), so a property may stand anywhere in its block.
/// Only the lines of one slot-pattern layer keep their order (they continue one another), and
/// a 'let' may use only the lets above it.
/// </summary>
public class StatementOrderTests
{
    [Fact]
    public void Skew_in_degrees_before_the_slot_count_is_the_same_as_after()
    {
        var before = Wind.Design("machine m {\n  skew 10 deg\n  slots 36\n  poles 4\n  phases U V W\n}\n" + Winding36);
        var after = Wind.Design("machine m {\n  slots 36\n  poles 4\n  phases U V W\n  skew 10 deg\n}\n" + Winding36);
        Assert.Equal(1.0, before.Geometry.SkewSlots, 12); // 10° of a 36-slot stator is one slot pitch
        Assert.Equal(ModelText.Describe(after), ModelText.Describe(before));
    }

    [Fact]
    public void A_property_may_use_a_value_defined_below_it()
    {
        var d = Wind.Design("machine m {\n  bore d\n  let d = 150 mm\n  slots 36\n  poles 4\n  phases U V W\n}\n" + Winding36);
        Assert.Equal(0.150, d.Geometry.BoreDiameter!.Value, 12);
    }

    [Fact]
    public void Winding_and_group_settings_apply_wherever_they_stand()
    {
        const string machine = "machine m {\n  slots 12\n  poles 2\n  phases U V W\n}\n";
        var first = Wind.Design(machine + "winding w {\n  layers 2\n  turns 5\n  pitch 5 slots\n  top: U U -W -W V V -U -U W W -V -V\n}\n");
        var last = Wind.Design(machine + "winding w {\n  top: U U -W -W V V -U -U W W -V -V\n  pitch 5 slots\n  turns 5\n  layers 2\n}\n");
        Assert.Equal(ModelText.Describe(first), ModelText.Describe(last));
        var group = Wind.Compile(machine + "winding w {\n  layers 2\n  group g {\n    coil U: 1 -> 6\n    turns n\n    let n = 4\n  }\n}\n");
        Assert.DoesNotContain(group.Diagnostics, d => d.Code is "WS2001" or "WS2013");
        Assert.Equal(4, Assert.Single(group.Design!.Winding.Coils).Turns);
    }

    [Fact]
    public void A_drive_current_may_use_a_value_defined_below_it()
    {
        var d = Wind.Design("machine m {\n  slots 36\n  poles 4\n  phases U V W\n}\n" + Winding36 +
                            "drive rated {\n  balanced sine i peak at 50 Hz sequence U V W\n  let i = 10 A\n}\n");
        Assert.Equal(10, Assert.Single(d.Drives).Currents[0].Components[0].Peak, 12);
    }

    [Fact]
    public void A_let_may_still_use_only_the_lets_above_it()
    {
        var codes = Wind.Codes("machine m {\n  let a = b\n  let b = 2\n  slots a\n  poles 2\n  phases U\n}\n");
        Assert.Contains("WS2001", codes);
    }

    public static TheoryData<string> Examples()
    {
        var data = new TheoryData<string>();
        foreach (var f in Repo.ExampleFiles()) data.Add(Path.GetFileName(f));
        return data;
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Reversing_the_statements_of_every_block_of_an_example_gives_the_same_design(string file)
    {
        var text = File.ReadAllText(Path.Combine(Repo.Examples, file));
        var tree = SyntaxTree.Parse(text);
        var reversed = string.Concat(tree.Root.Statements.Select(s => Reversed(tree, s, "")));
        var original = Wind.Design(text);
        var shuffled = Wind.Design(reversed);
        Assert.Equal(Canonical(original), Canonical(shuffled));
    }

    // A block with its statements in reverse order, except that the lines of one pattern layer
    // keep their order among themselves and the lets stay first (in order).
    private static string Reversed(SyntaxTree tree, StatementSyntax statement, string indent)
    {
        if (statement is not BlockSyntax block) return indent + tree.Source.Slice(statement.Span).Trim() + "\n";
        var lets = block.Body.OfType<LetSyntax>().Cast<StatementSyntax>().ToList();
        var others = block.Body.Where(s => s is not LetSyntax).Reverse().ToList();
        foreach (var layer in others.OfType<PatternSyntax>().GroupBy(p => p.LayerKind))
        {
            var inOrder = layer.OrderBy(p => p.Span.Start).ToList();
            var slots = others.Select((s, i) => (s, i)).Where(x => x.s is PatternSyntax p && p.LayerKind == layer.Key).Select(x => x.i).ToList();
            for (int k = 0; k < slots.Count; k++) others[slots[k]] = inOrder[k];
        }
        var body = string.Concat(lets.Concat(others).Select(s => Reversed(tree, s, indent + "  ")));
        return $"{indent}{block.Keyword.Text} {block.Name.Text} {{\n{body}{indent}}}\n";
    }

    // The design with coils in a fixed order: reordering statements may reorder the coil list,
    // never the coils themselves.
    private static string Canonical(WindScript.Model.WindingDesign d)
    {
        var lines = ModelText.Describe(d).Split('\n');
        return string.Join("\n", lines.Where(l => !l.StartsWith("coil ", StringComparison.Ordinal)))
               + string.Join("\n", lines.Where(l => l.StartsWith("coil ", StringComparison.Ordinal)).Order(StringComparer.Ordinal));
    }

    private const string Winding36 = "winding w {\n  layers 2\n  turns 3\n  pitch 8 slots\n  top: U U U -W -W -W V V V -U -U -U W W W -V -V -V repeat 2\n}\n";
}
