using System.Text.RegularExpressions;
using WindScript.Diagnostics;
using WindScript.Tests.Support;

namespace WindScript.Tests.Diagnostics;

/// <summary>
/// Every explanation cites in one style: a last sentence "Sources: a; b." whose items are works of
/// <see cref="References"/> (with an optional locator) or "common practice", and no citation elsewhere.
/// </summary>
public class CitationStyleTests
{
    private const string HowTo =
        "cite as a last sentence 'Sources: <short name>[, locator]; common practice.' with the short name from " +
        "src/WindScript/Diagnostics/References.cs (add the work there), and no citation inside the text";

    // What a citation looks like when written inline: an author's name, "et al.", a publisher or journal, an edition.
    private static readonly Regex InlineCitation = new(@"et al\.|Pyrhonen|Fitzgerald|Bianchi|Umans|Wiley|McGraw|IEE Proc|IEEE Trans|\d(st|nd|rd|th) ed\.|Source:|\(common practice|common practice\)", RegexOptions.Compiled);

    [Fact]
    public void No_explanation_cites_outside_its_sources_sentence()
    {
        foreach (var d in DiagnosticCatalog.All)
        {
            int at = d.Explanation.LastIndexOf(References.SourcesMarker, StringComparison.Ordinal);
            var body = at < 0 ? d.Explanation : d.Explanation[..at];
            var m = InlineCitation.Match(body);
            Assert.False(m.Success, $"{d.Code} cites '{m.Value}' inline: {HowTo}");
            Assert.Equal(at, d.Explanation.IndexOf(References.SourcesMarker, StringComparison.Ordinal));
        }
    }

    [Fact]
    public void Every_source_item_is_a_known_work_or_common_practice_and_the_sentence_ends_the_text()
    {
        int citing = 0;
        foreach (var d in DiagnosticCatalog.All)
        {
            var items = References.ItemsOf(d.Explanation);
            if (items.Count == 0) continue;
            citing++;
            Assert.EndsWith(".", d.Explanation.TrimEnd());
            // Nothing follows the sources sentence: no further sentence starts after it.
            Assert.DoesNotMatch(@"\. [A-Z]", d.Explanation[(d.Explanation.LastIndexOf(References.SourcesMarker, StringComparison.Ordinal) + References.SourcesMarker.Length)..]);
            foreach (var item in items)
                Assert.True(References.WorkOf(item) is not null || item.StartsWith(References.CommonPractice, StringComparison.Ordinal),
                    $"{d.Code}: '{item}' is neither a work of References nor common practice: {HowTo}");
        }
        Assert.True(citing >= 15, $"only {citing} explanations cite a source");
    }

    [Fact]
    public void Every_work_in_the_table_is_cited_and_explain_prints_its_full_entry()
    {
        foreach (var (shortName, full) in References.Works)
        {
            var citing = DiagnosticCatalog.All.FirstOrDefault(d => References.ItemsOf(d.Explanation).Any(i => References.WorkOf(i) == shortName));
            Assert.True(citing is not null, $"no explanation cites {shortName}");
            var r = CliRunner.Run("explain", citing!.Code);
            Assert.Equal(0, r.Exit);
            Assert.Contains("References:", r.Out);
            // The full entry is printed, wrapped: compare without line breaks and indentation.
            Assert.Contains(full, Regex.Replace(r.Out, @"\s*\n\s+", " "));
        }
    }
}
