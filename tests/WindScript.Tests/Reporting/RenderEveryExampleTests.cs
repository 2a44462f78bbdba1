using WindScript.Tests.Support;

namespace WindScript.Tests.Reporting;

/// <summary>
/// Every picture of every example renders to PNG (the pictures reviewers look at): a valid PNG
/// signature and a non-trivial size. The images are written to a temporary folder; set
/// WINDSCRIPT_KEEP_PLOTS to a folder to keep them for a look.
/// </summary>
public class RenderEveryExampleTests
{
    public static TheoryData<string, string> ExamplesAndKinds()
    {
        var data = new TheoryData<string, string>();
        foreach (var f in Repo.ExampleFiles())
            foreach (var kind in new[] { "mmf", "spectrum", "layout", "star", "field" })
                data.Add(Path.GetFileName(f), kind);
        return data;
    }

    [Theory]
    [MemberData(nameof(ExamplesAndKinds))]
    public void Every_example_renders_every_picture(string example, string kind)
    {
        string folder = Environment.GetEnvironmentVariable("WINDSCRIPT_KEEP_PLOTS") is { Length: > 0 } keep ? keep : Path.Combine(Path.GetTempPath(), "windscript-plots");
        Directory.CreateDirectory(folder);
        string output = Path.Combine(folder, $"{Path.GetFileNameWithoutExtension(example)}-{kind}.png");
        var r = CliRunner.Run("plot", Path.Combine(Repo.Examples, example), "--kind", kind, "-o", output);
        Assert.True(r.Exit == 0, r.Err);
        var bytes = File.ReadAllBytes(output);
        Assert.True(bytes.Length > 5000, $"{output}: {bytes.Length} bytes");
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47 }, bytes[..4]);
    }
}
