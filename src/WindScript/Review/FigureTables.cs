using System.Collections.Immutable;
using WindScript.Analysis;
using WindScript.Model;

namespace WindScript.Review;

/// <summary>The numeric sections of a review: each figure of both sides side by side.</summary>
internal static class FigureTables
{
    /// <summary>Winding factors and MMF waves are listed up to this electrical order.</summary>
    public const int ListedElectricalOrder = 13;

    /// <summary>Winding factors below this (on both sides) are left out of the table.</summary>
    public const double ListedFactor = 0.005;

    /// <summary>MMF waves below this fraction of the working wave (on both sides) are left out.</summary>
    public const double ListedWave = 0.01;

    public static ImmutableArray<FigureRow> Machine(WindingDesign? a, WindingDesign? b)
    {
        static double? Mm(double? metres) => metres * 1000;
        return
        [
            Row("slots Q", a, b, d => d.Slots),
            Row("poles 2p", a, b, d => d.Poles),
            Row("phases m", a, b, d => d.Phases.Length),
            Row("phase shift", a, b, d => d.PhaseShiftDegrees, "deg el."),
            Row("layers", a, b, d => d.Winding.Layers),
            Row("parallel paths", a, b, d => d.Winding.Paths),
            Row("coils", a, b, d => d.Winding.Coils.Length),
            Row("bore diameter", a, b, d => Mm(d.Geometry.BoreDiameter), "mm"),
            Row("stack length", a, b, d => Mm(d.Geometry.StackLength), "mm"),
            Row("air gap", a, b, d => Mm(d.Geometry.Gap), "mm"),
            Row("slot opening", a, b, d => Mm(d.Geometry.SlotOpening), "mm"),
            Row("rotor radius", a, b, d => Mm(d.Geometry.RotorRadius), "mm"),
            Row("skew", a, b, d => d.Geometry.SkewSlots, "slot pitches"),
            Row("gap flux density", a, b, d => d.Geometry.GapFluxDensity, "T"),
        ];
    }

    /// <summary>Machine facts that are a choice among words, not a number (which side of the gap the rotor lies on).</summary>
    public static ImmutableArray<TextRow> MachineChoices(WindingDesign? a, WindingDesign? b) =>
    [
        new("rotor", RotorSide(a), RotorSide(b)),
    ];

    private static string? RotorSide(WindingDesign? d) => d is null ? null : d.Geometry.RotorOutside ? "outside" : "inside";

    public static ImmutableArray<FigureRow> SeriesTurns(WindingDesign? a, WindingDesign? b)
    {
        int phases = Math.Max(a?.Phases.Length ?? 0, b?.Phases.Length ?? 0);
        return [.. Enumerable.Range(0, phases).Select(k => new FigureRow(PhaseName(k, a, b),
            a is not null && k < a.Phases.Length ? a.SeriesTurns(k) : null,
            b is not null && k < b.Phases.Length ? b.SeriesTurns(k) : null))];
    }

    /// <summary>Per phase, the factors of every order up to electrical order 13 that either side has, plus each side's working order p.</summary>
    public static ImmutableArray<PhaseFactors> WindingFactors(ReviewSide old, ReviewSide @new)
    {
        var a = old.Analysis;
        var b = @new.Analysis;
        int phases = Math.Max(a?.Phases.Length ?? 0, b?.Phases.Length ?? 0);
        int maxOrder = ListedElectricalOrder * Math.Max(1, Math.Max(a?.Machine.PolePairs ?? 0, b?.Machine.PolePairs ?? 0));
        var result = ImmutableArray.CreateBuilder<PhaseFactors>(phases);
        for (int k = 0; k < phases; k++)
        {
            var before = Factors(a, k);
            var after = Factors(b, k);
            var rows = ImmutableArray.CreateBuilder<FactorRow>();
            for (int order = 1; order <= maxOrder; order++)
            {
                double? x = Lookup(before, order), y = Lookup(after, order);
                bool working = order == a?.Machine.PolePairs || order == b?.Machine.PolePairs;
                if (!working && Math.Max(x ?? 0, y ?? 0) < ListedFactor) continue;
                rows.Add(new FactorRow(order, Electrical(order, a), Electrical(order, b), x, y));
            }
            result.Add(new PhaseFactors(PhaseName(k, old.Design, @new.Design), rows.ToImmutable()));
        }
        return result.MoveToImmutable();
    }

    /// <summary>Waves of balanced currents relative to the working wave, up to electrical order 13.</summary>
    public static ImmutableArray<MmfRow> MmfWaves(AnalysisResult? a, AnalysisResult? b)
    {
        int maxOrder = ListedElectricalOrder * Math.Max(1, Math.Max(a?.Machine.PolePairs ?? 0, b?.Machine.PolePairs ?? 0));
        var before = a?.Balanced.Waves.ToDictionary(w => w.Order);
        var after = b?.Balanced.Waves.ToDictionary(w => w.Order);
        var rows = ImmutableArray.CreateBuilder<MmfRow>();
        for (int order = 1; order <= maxOrder; order++)
        {
            BalancedWave? x = before?.GetValueOrDefault(order), y = after?.GetValueOrDefault(order);
            double largest = Math.Max(Math.Max(x?.Forward ?? 0, x?.Backward ?? 0), Math.Max(y?.Forward ?? 0, y?.Backward ?? 0));
            if (largest < ListedWave) continue;
            rows.Add(new MmfRow(order,
                before is null ? null : x?.Forward ?? 0, before is null ? null : x?.Backward ?? 0,
                after is null ? null : y?.Forward ?? 0, after is null ? null : y?.Backward ?? 0));
        }
        return rows.ToImmutable();
    }

    public static ImmutableArray<FigureRow> MmfFigures(AnalysisResult? a, AnalysisResult? b) =>
    [
        new("rotating working wave per ampere (all phases)", a?.Balanced.WorkingWave, b?.Balanced.WorkingWave, "A/A"),
        new("THD (orders to 25p)", Thd(a) * 100, Thd(b) * 100, "%"),
        new("differential leakage coefficient", a?.DifferentialLeakage, b?.DifferentialLeakage, ""),
        new("machine periodicity t", a?.Machine.Periodicity, b?.Machine.Periodicity),
        new("winding periodicity", a?.Machine.WindingPeriodicity, b?.Machine.WindingPeriodicity),
        new("cogging order", a?.Machine.CoggingOrder, b?.Machine.CoggingOrder),
    ];

    /// <summary>
    /// Total harmonic distortion of the MMF under balanced currents: the rms of every wave but the
    /// working one, relative to it, over the analysed orders. Over all orders its square is the
    /// differential leakage coefficient (Pyrhonen et al., ch. 4).
    /// </summary>
    public static double? Thd(AnalysisResult? analysis)
    {
        if (analysis is null || analysis.Balanced.WorkingWave <= 0) return null;
        double sum = analysis.Balanced.Waves.Sum(w => w.Forward * w.Forward + w.Backward * w.Backward);
        return Math.Sqrt(Math.Max(0, sum - 1));
    }

    /// <summary>The name of a drive's fundamental-field row.</summary>
    public static string FundamentalFieldRow(string drive) => $"drive {drive}: fundamental B at t = 0";

    public static ImmutableArray<FigureRow> FieldAndInductance(AnalysisResult? a, AnalysisResult? b)
    {
        var rows = ImmutableArray.CreateBuilder<FigureRow>();
        rows.Add(new("Carter coefficient", a?.Gap.CarterCoefficient, b?.Gap.CarterCoefficient));
        rows.Add(new("effective gap", a?.Gap.EffectiveGap * 1000, b?.Gap.EffectiveGap * 1000, "mm"));
        var la = a?.Inductances;
        var lb = b?.Inductances;
        int phases = Math.Max(a?.Phases.Length ?? 0, b?.Phases.Length ?? 0);
        string Name(int k) => (k < (b?.Phases.Length ?? 0) ? b!.Phases[k].Name : k < (a?.Phases.Length ?? 0) ? a!.Phases[k].Name : $"#{k + 1}");
        static double? At(InductanceMatrix? m, int k, int l) => m is not null && k < m.Matrix.Length && l < m.Matrix.Length ? m.Matrix[k][l] * 1000 : null;
        if (la is not null || lb is not null)
        {
            for (int k = 0; k < phases; k++) rows.Add(new($"self inductance {Name(k)}", At(la, k, k), At(lb, k, k), "mH"));
            for (int k = 0; k < phases; k++)
                for (int l = k + 1; l < phases; l++)
                    rows.Add(new($"mutual inductance {Name(k)}-{Name(l)}", At(la, k, l), At(lb, k, l), "mH"));
            rows.Add(new("synchronous (air-gap) inductance", la?.Synchronous * 1000, lb?.Synchronous * 1000, "mH"));
        }
        if (a?.BackEmf is not null || b?.BackEmf is not null)
            for (int k = 0; k < phases; k++)
                rows.Add(new($"back-EMF constant {Name(k)}", Emf(a, k), Emf(b, k), "V rms/Hz"));
        var drives = (a?.Drives.Select(d => d.Name) ?? []).Concat(b?.Drives.Select(d => d.Name) ?? []).Distinct();
        foreach (var drive in drives)
        {
            DriveAnalysis? x = a?.Drives.FirstOrDefault(d => d.Name == drive), y = b?.Drives.FirstOrDefault(d => d.Name == drive);
            rows.Add(new($"drive {drive}: peak MMF at t = 0", x?.PeakMmf, y?.PeakMmf, "A"));
            if (x?.FundamentalField is not null || y?.FundamentalField is not null)
                rows.Add(new(FundamentalFieldRow(drive), x?.FundamentalField?.FluxDensity, y?.FundamentalField?.FluxDensity, "T"));
        }
        return rows.ToImmutable();
    }

    /// <summary>
    /// Conductors and slots (#15): fill, turn length, resistance, mass, the complete per-phase
    /// inductances and per drive the current density, loss, reactance and torque; a row only where a side has it.
    /// </summary>
    public static ImmutableArray<FigureRow> Conductors(AnalysisResult? a, AnalysisResult? b)
    {
        var x = a?.Conductors;
        var y = b?.Conductors;
        var rows = ImmutableArray.CreateBuilder<FigureRow>();
        void Add(string name, Func<Analysis.Conductors.ConductorFigures, double?> value, string unit)
        {
            double? old = x is null ? null : value(x), @new = y is null ? null : value(y);
            if (old is not null || @new is not null) rows.Add(new(name, old, @new, unit));
        }
        Add("slot area, net", c => c.Fill?.NetArea * 1e6, "mm2");
        Add("strands per slot", c => c.Fill?.StrandsPerSlot, "");
        Add("fill factor, gross (copper)", c => c.Fill?.GrossFill, "");
        Add("fill factor, net (insulated)", c => c.Fill?.NetFill, "");
        Add("operating temperature", c => c.Resistance?.Temperature, "degC");
        Add("conductor mass", c => c.Resistance?.Mass, "kg");
        int phases = Math.Max(x?.Resistance?.Phases.Length ?? 0, y?.Resistance?.Phases.Length ?? 0);
        for (int k = 0; k < phases; k++)
        {
            string phase = (k < (y?.Resistance?.Phases.Length ?? 0) ? y!.Resistance!.Phases[k] : x!.Resistance!.Phases[k]).Name;
            int i = k;
            Add($"mean length of turn {phase}", c => c.Resistance is { } r && i < r.Phases.Length ? r.Phases[i].MeanTurnLength * 1000 : null, "mm");
            Add($"phase resistance at 20 degC {phase}", c => c.Resistance is { } r && i < r.Phases.Length ? r.Phases[i].Resistance20 : null, "ohm");
            Add($"phase resistance at operating temperature {phase}", c => c.Resistance is { } r && i < r.Phases.Length ? r.Phases[i].ResistanceHot : null, "ohm");
        }
        Add("magnetising inductance", c => c.Inductances?.Magnetising * 1000, "mH");
        Add("slot leakage inductance", c => c.Inductances?.SlotLeakage * 1000, "mH");
        Add("tooth-tip leakage inductance", c => c.Inductances?.ToothTipLeakage * 1000, "mH");
        Add("end-winding leakage inductance", c => c.Inductances?.EndWindingLeakage * 1000, "mH");
        Add("skew leakage inductance", c => c.Inductances?.SkewLeakage * 1000, "mH");
        Add("differential leakage inductance", c => c.Inductances?.DifferentialLeakageInductance * 1000, "mH");
        Add("total leakage inductance", c => c.Inductances?.TotalLeakage * 1000, "mH");
        Add("complete synchronous inductance", c => c.Inductances?.CompleteSynchronous * 1000, "mH");
        Add("torque constant", c => c.TorqueConstant, "N m/A");
        var drives = (x?.Drives.Select(d => d.Name) ?? []).Concat(y?.Drives.Select(d => d.Name) ?? []).Distinct();
        foreach (var drive in drives)
        {
            Analysis.Conductors.DriveConductorFigures? D(Analysis.Conductors.ConductorFigures c) => c.Drives.FirstOrDefault(d => d.Name == drive);
            Add($"drive {drive}: current density", c => D(c)?.CurrentDensity / 1e6, "A/mm2");
            Add($"drive {drive}: copper loss", c => D(c)?.CopperLoss, "W");
            Add($"drive {drive}: synchronous reactance", c => D(c)?.SynchronousReactance, "ohm");
            Add($"drive {drive}: torque", c => D(c)?.Torque, "N m");
        }
        return rows.ToImmutable();
    }

    private static double? Emf(AnalysisResult? analysis, int k) =>
        analysis?.BackEmf is { } e && k < e.Phases.Length ? e.Phases[k].VoltsPerHertz : null;

    private static Dictionary<int, double>? Factors(AnalysisResult? analysis, int phase) =>
        analysis is null || phase >= analysis.Phases.Length ? null : analysis.Phases[phase].Harmonics.ToDictionary(h => h.Order, h => h.WindingFactor);

    private static double? Lookup(Dictionary<int, double>? factors, int order) => factors is null ? null : factors.GetValueOrDefault(order);

    private static double? Electrical(int order, AnalysisResult? analysis) =>
        analysis is null || analysis.Machine.PolePairs == 0 ? null : (double)order / analysis.Machine.PolePairs;

    private static FigureRow Row(string name, WindingDesign? a, WindingDesign? b, Func<WindingDesign, double?> value, string unit = "") =>
        new(name, a is null ? null : value(a), b is null ? null : value(b), unit);

    private static string PhaseName(int k, WindingDesign? a, WindingDesign? b) =>
        b is not null && k < b.Phases.Length ? b.Phases[k].Name : a is not null && k < a.Phases.Length ? a.Phases[k].Name : $"#{k + 1}";
}
