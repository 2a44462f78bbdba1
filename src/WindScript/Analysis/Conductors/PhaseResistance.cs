using WindScript.Model;

namespace WindScript.Analysis.Conductors;

/// <summary>
/// DC phase resistance from the conductor length: R = ρ(T)·L_ph/(a²·A), L_ph = Σ N_c·MLT_c over the
/// phase's coils, a parallel paths (each path carries L_ph/a, the a paths in parallel), A the copper
/// of one turn (strands in hand × strand area); ρ(T) = ρ20·(1 + α(T − 20 degC)) (IEC 60028, IEC 60121).
/// No skin or proximity effect (DC resistance).
/// </summary>
internal static class PhaseResistance
{
    /// <summary>Total conductor length (m) of each phase: Σ turns × MLT of its coils.</summary>
    public static double[] ConductorLength(WindingDesign design, Func<Coil, double> meanTurnLength)
    {
        var length = new double[design.Phases.Length];
        foreach (var coil in design.Winding.Coils)
            if (coil.Phase >= 0 && coil.Phase < length.Length) length[coil.Phase] += coil.Turns * meanTurnLength(coil);
        return length;
    }

    public static double Of(double conductorLength, double resistivity, int paths, double turnArea) =>
        resistivity * conductorLength / ((double)paths * paths * turnArea);
}
