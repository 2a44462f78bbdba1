namespace WindScript.Analysis;

/// <summary>
/// Where the ideal model misleads: the gap field is the stator MMF alone on iron that never
/// saturates. Electrical steel saturates at about 2 T (common practice), so a reported gap field
/// above <see cref="IronLimit"/> is a figure no machine can carry; eval, the report and hover say so
/// beside it, in these words.
/// </summary>
internal static class FieldCaution
{
    /// <summary>Flux density (T) above which a gap figure is flagged: about where electrical steel saturates.</summary>
    public const double IronLimit = 2.0;

    /// <summary>The caution for one flux density (T), or null when it is within what iron carries.</summary>
    public static string? ForFluxDensity(double fluxDensity) =>
        Math.Abs(fluxDensity) > IronLimit
            ? $"a peak gap field of {Math.Abs(fluxDensity).ToString("0.0#", System.Globalization.CultureInfo.InvariantCulture)} T is above what iron carries (about {IronLimit:0} T): the ideal model has no saturation and no rotor reaction, so a loaded drive's real gap field is much lower"
            : null;

    /// <summary>The caution for the largest figure of a field description, or null.</summary>
    public static string? For(GapField field) =>
        ForFluxDensity(new[] { field.FluxDensity, field.ExactFluxDensityAtRotor, field.ExactFluxDensityAtBore }.Max(Math.Abs));
}
