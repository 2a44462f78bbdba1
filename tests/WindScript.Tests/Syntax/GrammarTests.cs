using System.Text.Json;
using System.Text.RegularExpressions;
using WindScript.Syntax;
using WindScript.Tests.Support;
using WindScript.Units;

namespace WindScript.Tests.Syntax;

/// <summary>
/// The normative grammar and the editor grammar name every word of the vocabulary table
/// (<see cref="Vocabulary"/>) and unit the parser knows, and no others.
/// </summary>
public class GrammarTests
{
    private static readonly string Grammar = File.ReadAllText(Path.Combine(Repo.Root, "grammar", "windscript.ebnf"));

    private static readonly string TextMate = File.ReadAllText(Path.Combine(Repo.Root, "editors", "vscode", "syntaxes", "windscript.tmLanguage.json"));

    [Fact]
    public void Every_reserved_word_appears_in_the_grammar()
    {
        foreach (var word in Vocabulary.Reserved)
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
        var quoted = Regex.Matches(Grammar, @"'([A-Za-z_][A-Za-z_/]*)'").Select(m => m.Groups[1].Value);
        foreach (var word in quoted.Distinct())
            Assert.True(Vocabulary.IsReserved(word) || UnitTable.Find(word) is not null || word is "e" or "E" || word == Vocabulary.EmptySlot,
                $"the grammar mentions '{word}', which the parser does not know");
    }

    [Fact]
    public void The_grammar_lists_exactly_the_properties_and_blocks_of_the_table()
    {
        Assert.Equal(Vocabulary.PropertyWords.Order(), QuotedWordsOfRule("property_keyword").Order());
        Assert.Equal(Vocabulary.BlockWords.Order(), QuotedWordsOfRule("block").Order());
        Assert.Equal(Vocabulary.LayerWords.Order(), QuotedWordsOfRule("pattern").Where(Vocabulary.LayerWords.Contains).Order());
    }

    [Fact]
    public void The_editor_grammar_highlights_every_reserved_word_function_and_unit()
    {
        var words = TextMateWords();
        foreach (var word in Vocabulary.Reserved)
            Assert.True(words.Contains(word), $"editors/vscode/syntaxes/windscript.tmLanguage.json does not highlight '{word}'");
        foreach (var f in Vocabulary.Functions)
            Assert.True(words.Contains(f.Name), $"the editor grammar does not highlight the function '{f.Name}'");
        foreach (var unit in UnitTable.All)
            Assert.True(words.Contains(unit.Symbol), $"the editor grammar does not highlight the unit '{unit.Symbol}'");
    }

    [Fact]
    public void Every_word_the_editor_grammar_highlights_is_in_the_table()
    {
        foreach (var word in TextMateWords())
            Assert.True(Vocabulary.IsReserved(word) || Vocabulary.Function(word) is not null || UnitTable.Find(word) is not null,
                $"the editor grammar highlights '{word}', which the language does not know");
    }

    // The quoted words on the right-hand side of one EBNF rule (up to its ';').
    private static IEnumerable<string> QuotedWordsOfRule(string rule)
    {
        var m = Regex.Match(Grammar, $@"^{rule}\s*=(?<body>[^;]*);", RegexOptions.Multiline);
        Assert.True(m.Success, $"grammar/windscript.ebnf has no rule '{rule}'");
        var body = Regex.Replace(m.Groups["body"].Value, @"\(\*.*?\*\)", "", RegexOptions.Singleline);
        return Regex.Matches(body, @"'([A-Za-z_][A-Za-z_/]*)'").Select(x => x.Groups[1].Value).Distinct();
    }

    // Every word of a "(a|b|c)" alternation in the TextMate grammar's match patterns.
    private static HashSet<string> TextMateWords()
    {
        using var doc = JsonDocument.Parse(TextMate);
        var patterns = new List<string>();
        void Walk(JsonElement e)
        {
            if (e.ValueKind == JsonValueKind.Object)
                foreach (var p in e.EnumerateObject())
                {
                    if (p.Name is "match" or "begin" && p.Value.ValueKind == JsonValueKind.String) patterns.Add(p.Value.GetString()!);
                    else Walk(p.Value);
                }
            else if (e.ValueKind == JsonValueKind.Array)
                foreach (var item in e.EnumerateArray()) Walk(item);
        }
        Walk(doc.RootElement);
        var words = new HashSet<string>(StringComparer.Ordinal);
        foreach (var pattern in patterns)
            foreach (Match group in Regex.Matches(pattern, @"\((?:\?:)?([A-Za-z0-9_/|]+)\)"))
                foreach (var w in group.Groups[1].Value.Split('|'))
                    if (w.Length > 0) words.Add(w.Replace(@"\/", "/"));
        return words;
    }
}
