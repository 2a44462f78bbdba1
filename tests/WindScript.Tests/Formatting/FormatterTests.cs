using WindScript.Formatting;
using WindScript.Tests.Support;

namespace WindScript.Tests.Formatting;

public class FormatterTests
{
    [Fact]
    public void Spacing_indentation_and_braces_become_canonical()
    {
        const string messy = "machine m{\n      slots 6\n poles 2\nphases U V W }\nwinding w {\nlayers 2\nturns 2*3\n  pitch 3slots\n top:U -W V -U W -V\n for k in 1..2 { coil -U: wrap( k+1 )->wrap(k+4) turns (1+2)*2 }\n}\n";
        const string expected = """
            machine m {
              slots 6
              poles 2
              phases U V W
            }
            winding w {
              layers 2
              turns 2 * 3
              pitch 3 slots
              top: U -W V -U W -V
              for k in 1 .. 2 {
                coil -U: wrap(k + 1) -> wrap(k + 4) turns (1 + 2) * 2
              }
            }

            """;
        Assert.Equal(expected.Replace("\r\n", "\n"), Formatter.Format(messy));
    }

    [Fact]
    public void Comments_survive_on_their_own_lines_and_at_line_ends()
    {
        const string text = "# head\n\n\n\nlet n = 1  # one\n# before machine\nmachine m {\n  # inside\n  slots 6  # six\n}\n# tail\n";
        var formatted = Formatter.Format(text)!;
        Assert.Equal("# head\n\nlet n = 1  # one\n# before machine\nmachine m {\n  # inside\n  slots 6  # six\n}\n# tail\n", formatted);
    }

    [Fact]
    public void Signs_stay_attached_and_binary_operators_get_spaces()
    {
        var formatted = Formatter.Format("drive d {\n  U = dc -4 A - sine 2 A peak at 50 Hz phase -30 deg\n}\nlet x = 3-1\n")!;
        Assert.Contains("U = dc -4 A - sine 2 A peak at 50 Hz phase -30 deg", formatted);
        Assert.Contains("let x = 3 - 1", formatted);
    }

    [Fact]
    public void A_file_with_syntax_errors_is_refused()
    {
        Assert.Null(Formatter.Format("machine m {\n  slots\n}\n"));
    }

    [Fact]
    public void Every_example_is_already_canonical()
    {
        foreach (var file in Repo.ExampleFiles())
        {
            var text = File.ReadAllText(file);
            Assert.True(Formatter.Format(text) == text, $"{Path.GetFileName(file)} is not in canonical form");
        }
    }
}
