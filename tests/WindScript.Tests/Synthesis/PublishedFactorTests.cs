namespace WindScript.Tests.Synthesis;

/// <summary>
/// Fundamental winding factors of synthesised windings against published values.
/// Concentrated (tooth-coil) windings: J. Cros, P. Viarouge, "Synthesis of high performance PM
/// motors with concentrated windings", IEEE Trans. Energy Conversion 17(2), 2002, and
/// F. Magnussen, C. Sadarangani, "Winding factors and Joule losses of permanent magnet machines
/// with concentrated windings", IEMDC 2003 — the table values below are from memory, to the
/// three decimals the tables print.
/// </summary>
public class PublishedFactorTests
{
    [Theory]
    // slots, poles, layers, published fundamental winding factor (from memory)
    [InlineData(12, 10, 2, 0.933)]
    [InlineData(12, 14, 2, 0.933)]
    [InlineData(12, 10, 1, 0.966)]
    [InlineData(9, 8, 2, 0.945)]
    [InlineData(9, 10, 2, 0.945)]
    [InlineData(12, 8, 2, 0.866)]
    [InlineData(6, 4, 2, 0.866)]
    [InlineData(24, 22, 2, 0.949)]
    public void Concentrated_windings_match_the_published_tables(int slots, int poles, int layers, double published)
    {
        var design = Synth.Design(slots, poles, layers, pitch: 1);
        Assert.Equal(published, Synth.Fundamental(design), 3);
    }

    [Theory]
    [InlineData(12, 10)]
    [InlineData(9, 8)]
    [InlineData(24, 22)]
    public void The_default_pitch_of_a_tooth_coil_combination_is_one_slot(int slots, int poles)
    {
        var design = Synth.Design(slots, poles);
        Assert.All(design.Winding.Coils, c => Assert.Equal(1, c.PitchSlots(slots)));
    }
}
