using System.Text;

namespace WindScript.Benchmarks.LanguageServer;

/// <summary>
/// A fictional large generator (6 m bore, q = 3, 8/9 pitch) written out coil by coil: about <c>lines</c> lines, with comments,
/// values, explicit coils in groups, and two drives. Clean (no diagnostics) as generated.
/// </summary>
public static class LargeWinding
{
    public static string Generate(int lines)
    {
        // q = 3 slots per pole and phase, 3 phases: slots = 18 per pole pair; one coil per slot (double layer).
        // Each slot takes a coil line, every tenth slot a comment line too: about 1.1 lines per slot.
        int slots = Math.Max(1, (lines - 40) * 10 / 11 / 18) * 18;
        int poles = slots / 9;
        var text = new StringBuilder();
        text.Append("# Benchmark machine: a fictional large generator, written out coil by coil.\n");
        text.Append("let n = 4  # turns per coil\n\n");
        text.Append("machine big_generator {\n");
        text.Append($"  slots {slots}\n  poles {poles}\n  phases U V W\n  bore 6000 mm\n  stack 1500 mm\n  gap 12 mm\n  slot_opening 4 mm\n}}\n\n");
        text.Append("winding stator {\n  layers 2\n  turns n\n");
        string[] belts = ["U", "-W", "V", "-U", "W", "-V"];
        for (int s = 1; s <= slots; s++)
        {
            if ((s - 1) % 90 == 0)
            {
                if (s > 1) text.Append("  }\n");
                text.Append($"  group sector_{(s - 1) / 90 + 1} {{\n");
            }
            string belt = belts[(s - 1) / 3 % 6];
            int ret = (s - 1 + 8) % slots + 1;
            text.Append($"    coil {belt}: {s} -> {ret}\n");
            if (s % 10 == 0) text.Append($"    # slots {s - 9}..{s}\n");
        }
        text.Append("  }\n}\n\n");
        text.Append("drive rated {\n  balanced sine 850 A rms at 50 Hz sequence U V W\n}\n\n");
        text.Append("drive test_dc {\n  U = dc 100 A\n  V = dc -50 A\n  W = dc -50 A\n}\n");
        return text.ToString();
    }
}
