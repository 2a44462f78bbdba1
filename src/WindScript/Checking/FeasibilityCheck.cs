namespace WindScript.Checking;

/// <summary>Whether the slot, pole and phase counts admit a balanced winding at all (star of slots).</summary>
internal static class FeasibilityCheck
{
    public static void Run(CheckContext c)
    {
        // Wired to the star-of-slots feasibility rule when synthesis lands (see Synthesis/Feasibility).
    }
}
