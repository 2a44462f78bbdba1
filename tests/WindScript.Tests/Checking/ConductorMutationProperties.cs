using System.Globalization;
using System.Text.RegularExpressions;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using WindScript.Tests.Support;

namespace WindScript.Tests.Checking;

/// <summary>A correct conductor case with one of the mistakes designers make with wire and slot.</summary>
public sealed record ConductorMutant(string Seed, string Mistake, string Text, string[] Expected)
{
    public override string ToString() => $"{Seed}: {Mistake} (expects {string.Join(" or ", Expected)})\n{Text}";
}

public static class ConductorMutations
{
    private static string Seed(string name) => File.ReadAllText(Path.Combine(Repo.Cases, name + ".wind"));

    private static string Set(string text, string property, string value)
    {
        var line = new Regex($@"^(\s*){Regex.Escape(property)} .*$", RegexOptions.Multiline);
        Assert.Matches(line, text);
        return line.Replace(text, m => $"{m.Groups[1].Value}{property} {value}", 1);
    }

    private static string Mm(double v) => v.ToString("0.###", CultureInfo.InvariantCulture) + " mm";

    // Each mistake as it happens, with the size of the mistake drawn by FsCheck, and the codes that must catch it.
    public static Arbitrary<ConductorMutant> Mutants()
    {
        string round = Seed("conductors_clean_round"), strip = Seed("conductors_clean_strip");
        var gens = new[]
        {
            // Thicker wire: 1.5..2.5 x the bare diameter (0.9 mm) in the same slot.
            Gen.Choose(150, 250).Select(k => new ConductorMutant("round", $"bare diameter x {k / 100.0}", Set(round, "bare_diameter", Mm(0.9 * k / 100)), ["WS5030", "WS5032"])),
            // More strands in hand: 5..12 instead of 2.
            Gen.Choose(5, 12).Select(n => new ConductorMutant("round", $"{n} strands", Set(round, "strands", n.ToString(CultureInfo.InvariantCulture)), ["WS5030"])),
            // More turns per coil: 16..40 instead of 10 (a fill above the limit at least).
            Gen.Choose(16, 40).Select(n => new ConductorMutant("round", $"{n} turns", Set(round, "turns", n.ToString(CultureInfo.InvariantCulture)), ["WS5030", "WS5031"])),
            // A deeper slot than the core allows (back diameter 160 mm, bore 100 mm: 30 mm of core).
            Gen.Choose(30, 45).Select(d => new ConductorMutant("round", $"depth {d} mm", Set(round, "depth", Mm(d)), ["WS5035"])),
            // A narrower opening than the 0.989 mm wire.
            Gen.Choose(30, 98).Select(o => new ConductorMutant("round", $"opening {o / 100.0} mm", Set(round, "slot_opening", Mm(o / 100.0)), ["WS5032"])),
            // A larger current for the same wire: 1.3..4 x the 6 A rms (4.7 A/mm2).
            Gen.Choose(130, 400).Select(k => new ConductorMutant("round", $"current x {k / 100.0}", Set(round, "balanced", $"sine {6 * k / 100.0} A rms at 50 Hz sequence U V W"), ["WS5033"])),
            // A wider strip than the open slot takes (6.3 mm inside the liner).
            Gen.Choose(62, 120).Select(w => new ConductorMutant("strip", $"strip width {w / 10.0} mm", Set(strip, "strip_width", Mm(w / 10.0)), ["WS5030"])),
            // More turns than the slot drawing holds.
            Gen.Choose(5, 9).Select(n => new ConductorMutant("strip", $"{n} turns", Set(strip, "turns", n.ToString(CultureInfo.InvariantCulture)), ["WS5037"])),
            // A slot as wide as the slot pitch leaves no tooth (pitch 15.7 mm at the bore of 180 mm, 36 slots).
            Gen.Choose(160, 220).Select(w => new ConductorMutant("strip", $"slot width {w / 10.0} mm", Set(strip, "width", Mm(w / 10.0)), ["WS5034"])),
        };
        return Gen.OneOf(gens).ToArbitrary();
    }
}

public class ConductorMutationProperties
{
    [Theory]
    [InlineData("conductors_clean_round")]
    [InlineData("conductors_clean_strip")]
    public void The_seeds_are_clean(string name)
    {
        var c = Wind.Compile(File.ReadAllText(Path.Combine(Repo.Cases, name + ".wind")));
        Assert.Empty(c.Diagnostics);
    }

    [Property(MaxTest = 300, Arbitrary = [typeof(ConductorMutations)])]
    public void Check_catches_wire_and_slot_mistakes(ConductorMutant mutant)
    {
        var codes = Wind.Compile(mutant.Text).Diagnostics.Select(d => d.Code).ToHashSet();
        Assert.True(mutant.Expected.Any(codes.Contains), $"got [{string.Join(", ", codes)}] for {mutant}");
    }
}
