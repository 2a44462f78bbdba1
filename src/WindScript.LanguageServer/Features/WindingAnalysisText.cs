using WindScript.Model;

namespace WindScript.LanguageServer.Features;

/// <summary>The physics lines of a winding's hover (winding factors, harmonics) from the core analysis.</summary>
public static class WindingAnalysisText
{
    public static IEnumerable<string> Lines(WindingDesign design) => [];
}
