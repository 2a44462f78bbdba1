using WindScript.Analysis;
using WindScript.Reporting.Drawing;

namespace WindScript.Reporting.Plots;

/// <summary>The pictures <c>windscript plot</c> draws.</summary>
public enum PlotKind { Mmf, Spectrum, Layout, Star, Field }

/// <summary>Draws any plot kind for a design, an excitation and an instant.</summary>
public static class Plotter
{
    public static IReadOnlyList<string> Names { get; } = [.. Enum.GetNames<PlotKind>().Select(n => n.ToLowerInvariant())];

    public static PlotKind? Parse(string name) =>
        Enum.TryParse<PlotKind>(name, ignoreCase: true, out var kind) && Enum.IsDefined(kind) ? kind : null;

    public static Scene Draw(PlotKind kind, Excitation excitation, GapSummary gap, double time) => kind switch
    {
        PlotKind.Mmf => MmfPlot.Draw(excitation, time),
        PlotKind.Spectrum => SpectrumPlot.Draw(excitation),
        PlotKind.Layout => LayoutPlot.Draw(excitation.Design),
        PlotKind.Star => StarPlot.Draw(excitation.Design),
        PlotKind.Field => FieldPlot.Draw(excitation, gap, time),
        _ => throw new ArgumentOutOfRangeException(nameof(kind)),
    };
}
