using WindScript.Cli.Output;
using WindScript.Tests.Support;

namespace WindScript.Tests.Cli;

/// <summary>Output formats are typed values with one name each; commands accept only their own.</summary>
public class OutputFormatTests
{
    [Fact]
    public void Every_format_has_one_name_that_reads_back()
    {
        var names = Enum.GetValues<OutputFormat>().Select(OutputFormats.Name).ToArray();
        Assert.Equal(names.Length, names.Distinct().Count());
        foreach (var format in Enum.GetValues<OutputFormat>()) Assert.Equal(format, OutputFormats.Parse(OutputFormats.Name(format)));
        Assert.Throws<ArgumentException>(() => OutputFormats.Parse("xml"));
    }

    [Theory]
    [InlineData("check", "csv")]
    [InlineData("eval", "sarif")]
    [InlineData("diff", "csv")]
    public void A_format_of_another_command_is_a_usage_error(string command, string format)
    {
        var file = Path.Combine(Repo.Examples, "scooter_hub_12s10p.wind");
        var r = command == "diff" ? CliRunner.Run(command, file, file, "--format", format) : CliRunner.Run(command, file, "--format", format);
        Assert.Equal(2, r.Exit);
        Assert.Contains(format, r.Err);
    }
}
