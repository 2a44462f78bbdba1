using WindScript.Syntax;
using WindScript.Tests.Support;
using WindScript.Units;

namespace WindScript.Tests.Syntax;

/// <summary>The vocabulary table is complete and the binders follow it: a property is taken exactly where the table says.</summary>
public class VocabularyTests
{
    [Fact]
    public void Every_block_kind_property_layer_and_measure_has_exactly_one_entry()
    {
        Assert.Equal(Enum.GetValues<BlockKind>().Order(), Vocabulary.Blocks.Select(b => b.Kind).Order());
        Assert.Equal(Enum.GetValues<PropertyName>().Order(), Vocabulary.Properties.Select(p => p.Name).Order());
        Assert.Equal(Enum.GetValues<LayerName>().Order(), Vocabulary.Layers.Select(l => l.Name).Order());
        Assert.Equal(Enum.GetValues<AmplitudeMeasure>().Order(), Vocabulary.Measures.Select(m => m.Measure).Order());
        Assert.Equal(Vocabulary.Properties.Count, Vocabulary.PropertyWords.Count);
    }

    [Fact]
    public void Every_reserved_word_has_help()
    {
        foreach (var word in Vocabulary.Reserved)
            Assert.False(string.IsNullOrWhiteSpace(Vocabulary.Help(word)), $"'{word}' has no help line");
    }

    [Fact]
    public void A_quantity_property_has_a_dimension_with_units_and_a_count_has_none()
    {
        foreach (var p in Vocabulary.Properties)
        {
            if (p.Value == ValueKind.WholeNumber) Assert.True(p.Dimension.IsNone, p.Word);
            else if (p.Value == ValueKind.Word) Assert.True(p.Dimension.IsNone && p.Words.Count > 0, p.Word);
            else if (p.Value == ValueKind.Number) Assert.True(p.Dimension.IsNone, p.Word);
            else Assert.NotEmpty(Vocabulary.UnitsFor(p.Dimension));
        }
    }

    public static TheoryData<string, string> PropertiesAndBlocks()
    {
        var data = new TheoryData<string, string>();
        foreach (var p in Vocabulary.Properties)
            foreach (var b in Vocabulary.Blocks)
                data.Add(p.Word, b.Word);
        return data;
    }

    [Theory]
    [MemberData(nameof(PropertiesAndBlocks))]
    public void A_property_is_taken_exactly_in_the_blocks_the_table_gives(string word, string blockWord)
    {
        var property = Vocabulary.Property(word)!;
        var block = Vocabulary.Block(blockWord)!;
        string value = property.Value switch
        {
            ValueKind.WholeNumber => "2",
            ValueKind.Word => property.Words[0],
            ValueKind.Number => "0.5",
            _ => $"1 {Vocabulary.UnitsFor(property.Dimension).First()}",
        };
        string statement = $"{word} {value}";
        string text = block.Kind switch
        {
            BlockKind.Machine => $"machine m {{\n  {statement}\n}}\n",
            BlockKind.Winding => $"winding w {{\n  {statement}\n}}\n",
            BlockKind.Group => $"winding w {{\n  layers 2\n  group g {{\n    {statement}\n  }}\n}}\n",
            BlockKind.Slot => $"slot s {{\n  {statement}\n}}\n",
            BlockKind.Conductor => $"conductor c {{\n  {statement}\n}}\n",
            _ => $"drive d {{\n  {statement}\n}}\n",
        };
        var c = Wind.Compile(text);
        Assert.DoesNotContain(c.Diagnostics, d => d.Code == "WS1001");
        bool misplaced = c.Diagnostics.Any(d => d.Code == "WS2005" && c.Source.Slice(d.Span) == word);
        Assert.Equal(!property.In(block.Kind), misplaced);
    }

    [Fact]
    public void Units_offered_for_a_dimension_are_units_of_that_dimension()
    {
        foreach (var p in Vocabulary.Properties.Where(p => p.Value == ValueKind.Quantity))
            foreach (var symbol in Vocabulary.UnitsFor(p.Dimension))
                Assert.Equal(p.Dimension, UnitTable.Find(symbol)!.Dimension);
    }
}
