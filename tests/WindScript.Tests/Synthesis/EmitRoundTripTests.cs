using WindScript.Diagnostics;
using WindScript.Emit;
using WindScript.Formatting;
using WindScript.Model;

namespace WindScript.Tests.Synthesis;

/// <summary>The canonical writer: its text is what the formatter produces, checks clean, and reads back to the same model.</summary>
public class EmitRoundTripTests
{
    internal static WindingDesign Reparse(WindingDesign design, out string text)
    {
        text = WindEmitter.Emit(design);
        var compilation = Compilation.Compile(text);
        Assert.True(ChecksClean(compilation), text + "\n" + string.Join("\n", Unexpected(compilation).Select(d => d.ToString())));
        return compilation.Design!;
    }

    /// <summary>
    /// Clean: nothing but the notes on harmonic content that the slot/pole choice itself implies
    /// (sub-harmonics, even harmonics, unbalanced pull), never an error.
    /// </summary>
    internal static bool ChecksClean(Compilation compilation) => compilation.Design is not null && !Unexpected(compilation).Any();

    private static IEnumerable<Diagnostic> Unexpected(Compilation compilation) =>
        compilation.Diagnostics.Where(d => d.Code is not ("WS3012" or "WS3013" or "WS3014"));

    internal static void AssertSameModel(WindingDesign expected, WindingDesign actual)
    {
        Assert.Equal(expected.Slots, actual.Slots);
        Assert.Equal(expected.Poles, actual.Poles);
        Assert.Equal(expected.Phases.Select(p => p.Name), actual.Phases.Select(p => p.Name));
        Assert.Equal(expected.PhaseShiftDegrees, actual.PhaseShiftDegrees, 9);
        Assert.Equal(expected.Winding.Layers, actual.Winding.Layers);
        Assert.Equal(expected.Winding.Paths, actual.Winding.Paths);
        var a = expected.Conductors;
        var b = actual.Conductors;
        Assert.Equal((a.Phases, a.Slots, a.Layers), (b.Phases, b.Slots, b.Layers));
        for (int k = 0; k < a.Phases; k++)
        {
            Assert.Equal(expected.SeriesTurns(k), actual.SeriesTurns(k));
            for (int s = 0; s < a.Slots; s++)
                for (int l = 0; l < a.Layers; l++)
                    Assert.True(a[k, s, l] == b[k, s, l], $"phase {k}, slot {s + 1}, layer {l}: {a[k, s, l]} written, {b[k, s, l]} read back");
        }
    }

    [Theory]
    [InlineData(12, 10, 2, null)]
    [InlineData(12, 10, 1, null)]
    [InlineData(36, 4, 2, 7)]
    [InlineData(24, 4, 1, null)]
    [InlineData(9, 8, 2, null)]
    [InlineData(120, 58, 2, null)]
    [InlineData(48, 4, 1, 11)]
    public void Synthesised_windings_are_canonical_clean_and_read_back_the_same(int slots, int poles, int layers, int? pitch)
    {
        var design = Synth.Design(slots, poles, layers, pitch, turns: 7, paths: 1);
        var back = Reparse(design, out var text);
        Assert.Equal(text, Formatter.Format(text));
        AssertSameModel(design, back);
    }

    [Fact]
    public void A_regular_double_layer_winding_is_written_as_one_repeated_top_pattern()
    {
        var text = WindEmitter.Emit(Synth.Design(36, 4, pitch: 7, turns: 11));
        Assert.Contains("  top: U U U -W -W -W V V V -U -U -U W W W -V -V -V repeat 2\n", text);
        Assert.Contains("  pitch 7 slots  # pole pitch 9 slots\n", text);
        Assert.Contains("  turns 11  # per coil\n", text);
    }

    [Fact]
    public void A_winding_with_reversed_single_layer_coils_is_written_as_explicit_coils()
    {
        var design = Synth.Design(12, 10, layers: 1);
        var text = WindEmitter.Emit(design);
        Assert.DoesNotContain("slots:", text);
        Assert.Contains("coil U: 1 -> 2\n", text);
        Assert.Contains("coil -V: 3 -> 4\n", text);
    }
}
