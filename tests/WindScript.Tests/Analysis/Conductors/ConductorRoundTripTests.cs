using WindScript.Emit;
using WindScript.Tests.Support;

namespace WindScript.Tests.Analysis.Conductors;

/// <summary>The emitter writes the slot and conductor blocks back: compiling its text gives the same slot, conductor and figures.</summary>
public class ConductorRoundTripTests
{
    public static TheoryData<string> Files() => Repo.ExamplesAndCases();

    [Theory]
    [MemberData(nameof(Files))]
    public void Slot_and_conductor_survive_emit_and_compile(string path)
    {
        var c = Compilation.Compile(File.ReadAllText(Path.Combine(Repo.Root, path)), path);
        if (c.HasErrors || c.Design is not { } d || (d.Slot is null && d.Conductor is null)) return;
        var again = Compilation.Compile(WindEmitter.Emit(d)).Design!;
        Assert.Equal(d.Slot is null, again.Slot is null);
        if (d.Slot is { } slot) Assert.Equal(slot with { Span = default, KeywordSpan = default }, again.Slot! with { Span = default, KeywordSpan = default });
        Assert.Equal(d.Conductor is null, again.Conductor is null);
        if (d.Conductor is { } wire) Assert.Equal(wire with { Span = default, KeywordSpan = default }, again.Conductor! with { Span = default, KeywordSpan = default });
        var a = WindScript.Analysis.MachineAnalysis.Evaluate(d).Conductors!;
        var b = WindScript.Analysis.MachineAnalysis.Evaluate(again).Conductors!;
        Assert.Equal(a.Resistance?.Phases[0].Resistance20, b.Resistance?.Phases[0].Resistance20);
        Assert.Equal(a.Fill?.NetFill, b.Fill?.NetFill);
    }
}
