namespace WindScript.Tests.LanguageServer;

/// <summary>Fictional machines for the language-server tests (demo data, not reference values).</summary>
public static class Samples
{
    public const string Uri = "file:///work/fan_motor.wind";

    /// <summary>A clean file: 36 slots, 4 poles, a double-layer 7/9 short-pitch pattern winding, two drives.</summary>
    public const string FanMotor = """
        # Fictional test machine: a small fan motor, proposal A.
        let n = 11  # turns per coil
        let bore_d = 150 mm

        machine fan_motor {
          slots 36
          poles 4
          phases U V W
          bore bore_d
          stack 120 mm
          gap 0.5 mm
          slot_opening 2.8 mm
        }

        winding main {
          layers 2
          turns n
          pitch 7 slots
          paths 2
          top: U U U -W -W -W V V V -U -U -U W W W -V -V -V repeat 2
        }

        drive rated {
          balanced sine 12 A rms at 50 Hz sequence U V W
        }

        drive standstill {
          U = dc 8 A
          V = dc -4 A
          W = dc -4 A
        }

        """;

    /// <summary>The zero-based line of the first line containing <paramref name="text"/> and the column where it starts.</summary>
    public static (int Line, int Character) Find(string source, string text, int occurrence = 0)
    {
        var lines = source.Split('\n');
        for (int i = 0; i < lines.Length; i++)
        {
            int at = -1;
            for (int k = 0; k <= occurrence; k++)
            {
                at = lines[i].IndexOf(text, at + 1, StringComparison.Ordinal);
                if (at < 0) break;
            }
            if (at >= 0) return (i, at);
        }
        throw new ArgumentException($"'{text}' is not in the sample");
    }
}
