using WindScript.Tests.Support;

namespace WindScript.Tests.Api;

/// <summary>
/// The core's public surface is deliberate: what a pipeline needs (compile text, build a design
/// in code, synthesise, evaluate, read every figure, emit text, compare two designs). The list
/// of public types is kept in public-api.txt; a type that becomes public (or stops being public)
/// fails this test until the list is updated on purpose.
/// </summary>
public class PublicApiTests
{
    private static string ApprovedPath => Path.Combine(Repo.Root, "tests", "WindScript.Tests", "Api", "public-api.txt");

    public static IReadOnlyList<string> PublicTypes() =>
        [.. typeof(Compilation).Assembly.GetExportedTypes().Select(t => t.FullName!.Replace('+', '.')).Order(StringComparer.Ordinal)];

    [Fact]
    public void The_public_types_of_the_core_are_the_approved_list()
    {
        var approved = File.ReadAllLines(ApprovedPath).Where(l => l.Length > 0 && !l.StartsWith('#')).ToArray();
        var actual = PublicTypes();
        var added = actual.Except(approved).ToArray();
        var removed = approved.Except(actual).ToArray();
        Assert.True(added.Length == 0 && removed.Length == 0,
            $"public API changed; update {ApprovedPath} if intended.\nnewly public: {string.Join(", ", added)}\nno longer public: {string.Join(", ", removed)}");
    }

    [Fact]
    public void The_pipeline_example_reaches_the_core_through_its_public_api_only()
    {
        // examples/pipeline has no InternalsVisibleTo from the core: it builds in the solution,
        // so every core member it uses is public. Guard that it stays that way.
        var project = File.ReadAllText(Path.Combine(Repo.Root, "examples", "pipeline", "Pipeline.csproj"));
        var core = File.ReadAllText(Path.Combine(Repo.Root, "src", "WindScript", "WindScript.csproj"));
        Assert.DoesNotContain("InternalsVisibleTo", project);
        Assert.DoesNotContain("WindScript.Examples.Pipeline", core);
        Assert.Contains("<GenerateDocumentationFile>true</GenerateDocumentationFile>", core);
    }

    [Theory]
    [InlineData("WindScript.Compilation")]
    [InlineData("WindScript.Model.WindingDesign")]
    [InlineData("WindScript.Model.Coil")]
    [InlineData("WindScript.Synthesis.WindingSynthesizer")]
    [InlineData("WindScript.Analysis.MachineAnalysis")]
    [InlineData("WindScript.Analysis.AnalysisResult")]
    [InlineData("WindScript.Emit.WindEmitter")]
    [InlineData("WindScript.Review.WindingComparison")]
    [InlineData("WindScript.Sweep.LayoutSweep")]
    public void What_a_pipeline_needs_is_public(string type) => Assert.Contains(type, PublicTypes());

    [Theory]
    [InlineData("WindScript.Syntax.Parser")]
    [InlineData("WindScript.Syntax.Lexer")]
    [InlineData("WindScript.Checking.Checker")]
    [InlineData("WindScript.Analysis.SlotFourier")]
    [InlineData("WindScript.Diagnostics.DiagnosticBag")]
    public void Machinery_is_internal(string type) => Assert.DoesNotContain(type, PublicTypes());
}
