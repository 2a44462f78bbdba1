using WindScript.Review;
using WindScript.Tests.Support;

namespace WindScript.Tests.Review;

/// <summary>diff and show put the conductor figures side by side: a change of wire changes fill, resistance and loss, not inductance.</summary>
public class ConductorReviewTests
{
    private static readonly string Round = File.ReadAllText(Path.Combine(Repo.Cases, "conductors_clean_round.wind"));

    [Fact]
    public void More_strands_in_hand_change_fill_resistance_and_loss_but_not_inductance()
    {
        var diff = WindingComparison.Compare(Round, "a", Round.Replace("strands 2", "strands 3"), "b");
        Assert.Contains("conductors", diff.ChangedSections);
        FigureRow Row(string name) => diff.Conductors.First(r => r.Name == name);
        Assert.True(Row("strands per slot").Changed);
        Assert.Equal(60, Row("strands per slot").New);
        // R = rho L / (a^2 A): 3 strands instead of 2 is 2/3 of the resistance (common practice).
        Assert.Equal(2.0 / 3, Row("phase resistance at 20 degC U").New!.Value / Row("phase resistance at 20 degC U").Old!.Value, 12);
        Assert.True(Row("drive rated: copper loss").Changed);
        Assert.False(Row("complete synchronous inductance").Changed);
    }

    [Fact]
    public void Files_without_slots_and_conductors_have_no_conductor_rows()
    {
        var plain = "machine m {\n  slots 12\n  poles 2\n  phases U V W\n}\nwinding w {\n  layers 2\n  turns 5\n  pitch 5 slots\n  top: U U -W -W V V -U -U W W -V -V\n}\n";
        Assert.Empty(WindingComparison.Compare(plain, "a", plain, "b").Conductors);
    }
}
