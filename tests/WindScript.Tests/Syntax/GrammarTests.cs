using WindScript.Syntax;
using WindScript.Tests.Support;
using WindScript.Units;

namespace WindScript.Tests.Syntax;

/// <summary>The normative grammar names every keyword and unit the parser knows, and no others.</summary>
public class GrammarTests
{
    private static readonly string Grammar = File.ReadAllText(Path.Combine(Repo.Root, "grammar", "windscript.ebnf"));

    [Fact]
    public void Every_reserved_word_appears_in_the_grammar()
    {
        foreach (var word in Keywords.All)
            Assert.True(Grammar.Contains($"'{word}'"), $"grammar/windscript.ebnf does not mention '{word}'");
    }

    [Fact]
    public void Every_unit_appears_in_the_grammar()
    {
        foreach (var unit in UnitTable.All)
            Assert.True(Grammar.Contains($"'{unit.Symbol}'"), $"grammar/windscript.ebnf does not list the unit '{unit.Symbol}'");
    }

    [Fact]
    public void Every_quoted_word_in_the_grammar_is_a_keyword_or_unit()
    {
        var quoted = System.Text.RegularExpressions.Regex.Matches(Grammar, @"'([A-Za-z_][A-Za-z_/]*)'").Select(m => m.Groups[1].Value);
        foreach (var word in quoted.Distinct())
            Assert.True(Keywords.All.Contains(word) || UnitTable.Find(word) is not null || word is "e" or "E" or "_",
                $"the grammar mentions '{word}', which the parser does not know");
    }
}
