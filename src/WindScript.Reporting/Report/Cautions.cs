namespace WindScript.Reporting.Report;

/// <summary>The cautions every report carries, worded as in the README.</summary>
public static class Cautions
{
    public const string Text =
        "Results are an analysis aid under idealised assumptions (ideal iron of infinite permeability, no saturation, " +
        "conductors concentrated at slot centres). Windings run at hazardous voltages and temperatures: insulation, " +
        "creepage, thermal class and protection follow IEC 60034 / NEMA MG 1 as applicable, local electrical codes and " +
        "licensed engineering practice. Verify designs by finite-element analysis and by test before build.";
}
