using WindScript.Model;

namespace WindScript.Analysis.Conductors;

/// <summary>
/// Resistivity at 20 degC (Ω·m), its linear temperature coefficient (1/K) and density (kg/m³) of a
/// conductor material, with the standard each comes from.
/// </summary>
public sealed record MaterialConstants(string Name, double Resistivity20, double TemperatureCoefficient, double Density, string Source)
{
    /// <summary>ρ(T) = ρ20·(1 + α·(T − 20 degC)), the linear law of the standards (valid roughly −60..300 degC).</summary>
    public double ResistivityAt(double celsius) => Resistivity20 * (1 + TemperatureCoefficient * (celsius - 20));
}

/// <summary>The standard constants of copper and aluminium.</summary>
public static class ConductorMaterials
{
    /// <summary>
    /// Annealed copper, IEC 60028 (International Annealed Copper Standard): 1/58 Ω·mm²/m at 20 degC,
    /// α = 0.00393 /K, density 8.89 g/cm³.
    /// </summary>
    public static readonly MaterialConstants Copper = new("copper", 1.0 / 58 * 1e-6, 0.00393, 8890, "IEC 60028 (annealed copper)");

    /// <summary>
    /// Hard-drawn aluminium for electrical purposes, IEC 60121: 0.028264 Ω·mm²/m at 20 degC
    /// (61 % IACS), α = 0.00403 /K, density 2.703 g/cm³.
    /// </summary>
    public static readonly MaterialConstants Aluminium = new("aluminium", 0.028264e-6, 0.00403, 2703, "IEC 60121 (aluminium)");

    /// <summary>The constants of a material.</summary>
    public static MaterialConstants Of(ConductorMaterial material) => material == ConductorMaterial.Aluminium ? Aluminium : Copper;
}
