using System.Collections.Immutable;
using WindScript.Model;

namespace WindScript.Analysis;

/// <summary>
/// The facade: evaluates everything <c>eval</c> shows for a <see cref="WindingDesign"/>.
/// Each figure comes from the class named after it (winding factors, waves, leakage...);
/// this class only gathers them and records the assumptions and missing inputs.
/// </summary>
public static class MachineAnalysis
{
    /// <summary>Relative size below which an order is treated as absent (rounding noise).</summary>
    public const double Negligible = 1e-9;

    /// <summary>The modelling assumptions behind every figure, worded for the output.</summary>
    public static readonly ImmutableArray<string> Assumptions =
    [
        "ideal iron: infinite permeability, no saturation, no iron loss",
        "conductors concentrated at slot centres; slot openings act only through Carter's coefficient",
        "smooth rotor and uniform gap; no rotor currents or magnets",
        "MMF has zero mean (all gap flux returns through the rotor)",
        "gap field: thin gap B = mu0 F/(kC delta) with Carter's coefficient; exact 2-D field of the smooth annulus per harmonic, B_r = mu0 F (v/r) cosh(v ln(r/rr))/sinh(v |ln(rs/rr)|), summed over all orders for the staircase (at the bore read at the tooth centres); the flux-tube approximation mu0 F/(r |ln(rs/rr)|) shown beside it",
        "no rotor reaction: the gap field is the stator MMF alone, so a loaded drive's field can exceed what iron carries",
        "winding factors and back-EMF include skew; MMF amplitudes are per cross-section (no skew)",
        "differential leakage for balanced currents at the phase shift, exact over all orders, without skew",
        "inductances: air-gap part only (no slot, end-winding or skew leakage), winding functions with the flux-tube permeance mu0 rm l/(kC delta); for a thick gap (2-D working-wave permeance more than 1 % from it) the orders v <= Q/2 use the 2-D permeance mu0 l v coth(v |ln(rs/rr)|)/kC; the synchronous (air-gap) inductance includes the differential leakage",
        "flux per pole and back-EMF at the stator's gap surface (bore radius); inductances at the mean gap radius rm",
    ];

    /// <summary>Electrical order n = ν/p (0 for a design without poles, which the checker reports).</summary>
    public static double ElectricalOrder(int order, int polePairs) => polePairs <= 0 ? 0 : (double)order / polePairs;

    /// <summary>Evaluates every figure of a design (options: highest order and instant; defaults when null).</summary>
    public static AnalysisResult Evaluate(WindingDesign design, AnalysisOptions? options = null)
    {
        options ??= new AnalysisOptions();
        var notes = ImmutableArray.CreateBuilder<string>();
        var winding = WindingSpectrum.Of(design);
        var symmetry = WindingSymmetry.Of(design);
        var regular = RegularWinding.TryRecognise(design);
        int maxOrder = Math.Max(1, options.MaxElectricalOrder) * Math.Max(1, design.PolePairs);

        var gap = Gap(design, notes);
        double carter = gap.CarterCoefficient ?? 1;
        double leakage = DifferentialLeakage.Compute(design);
        var inductances = Inductances.Of(design, winding, carter);
        if (inductances is null) notes.Add("inductances need bore, stack length and gap");
        var phases = Phases(design, winding, regular, maxOrder);
        var backEmf = BackEmfOf(design, phases, notes);

        var machine = new MachineSummary(
            design.Name, design.Slots, design.Poles, design.PolePairs,
            [.. design.Phases.Select(p => p.Name)], design.PhaseShiftDegrees,
            design.SlotsPerPolePerPhase,
            symmetry.MachinePeriodicity, symmetry.WindingPeriodicity, symmetry.HalfPeriodReversal,
            symmetry.AdjacentOrders, symmetry.CoggingOrder);
        var summary = new WindingSummary(design.Winding.Name, design.Winding.Layers, design.Winding.Paths,
            design.Winding.Coils.Length, design.Geometry.SkewSlots, regular);
        var drives = design.Drives.Select(d => DriveOf(design, winding, d, options.Time, maxOrder, gap, backEmf)).ToImmutableArray();

        // Conductors and slots (#15): only when the file describes them.
        var conductors = Conductors.ConductorAnalysis.Evaluate(design, gap, inductances, double.IsFinite(leakage) ? leakage : null);
        return new AnalysisResult(machine, summary, phases, double.IsFinite(leakage) ? leakage : null,
            BalancedWaves(design, winding, maxOrder), gap, inductances, backEmf, drives, Assumptions, design.Defaults, notes.ToImmutable(), conductors);
    }

    private static ImmutableArray<PhaseAnalysis> Phases(WindingDesign design, WindingSpectrum winding, RegularWinding? regular, int maxOrder)
    {
        var result = ImmutableArray.CreateBuilder<PhaseAnalysis>(design.Phases.Length);
        double skew = design.Geometry.SkewSlots;
        foreach (var phase in design.Phases)
        {
            int k = phase.Index;
            var conductors = winding.SlotConductors[k];
            var harmonics = ImmutableArray.CreateBuilder<PhaseHarmonic>();
            for (int order = 1; order <= maxOrder; order++)
            {
                if (winding.WindingFactor(k, order) <= Negligible) continue;
                double sk = ClosedFormFactors.Skew(order, skew, design.Slots);
                harmonics.Add(new PhaseHarmonic(order, ElectricalOrder(order, design.PolePairs), design.WindingFactor(k, order), sk,
                    regular is null ? null : ClosedFormFactors.Distribution(order, regular.SlotsPerPolePerPhase, design.Slots),
                    regular is null ? null : ClosedFormFactors.Pitch(order, regular.CoilPitch, design.Slots),
                    winding.MmfPerAmpere(k, order)));
            }
            result.Add(new PhaseAnalysis(phase.Name, k, design.SeriesTurns(k), [.. conductors],
                WindingFactors.AxisElectricalDegrees(conductors, design.PolePairs), harmonics.ToImmutable()));
        }
        return result.MoveToImmutable();
    }

    /// <summary>
    /// The waves balanced unit currents make, orders 1..<paramref name="maxOrder"/> (mechanical),
    /// relative to the working wave, with the sub-, even and inter-harmonic orders among them.
    /// </summary>
    internal static BalancedMmfWaves BalancedWaves(WindingDesign design, WindingSpectrum winding, int maxOrder)
    {
        var unit = CurrentPhasors.Balanced(design.Phases.Length, design.PhaseShiftDegrees * Math.PI / 180);
        var (f, b) = TravellingWaves.At(winding, unit.Phasors.AsSpan(), design.PolePairs);
        double working = Math.Max(f.Magnitude, b.Magnitude);
        double conductors = winding.SlotConductors.Sum(c => c.Sum(Math.Abs)) / winding.Paths;
        if (working * 2 * Math.PI * design.PolePairs <= DifferentialLeakage.NoWorkingWave * conductors) working = 0;
        var waves = ImmutableArray.CreateBuilder<BalancedWave>();
        var sub = ImmutableArray.CreateBuilder<int>();
        var even = ImmutableArray.CreateBuilder<int>();
        var inter = ImmutableArray.CreateBuilder<int>();
        if (working > 0)
            for (int order = 1; order <= maxOrder; order++)
            {
                var (fw, bw) = TravellingWaves.At(winding, unit.Phasors.AsSpan(), order);
                double forward = fw.Magnitude / working, backward = bw.Magnitude / working;
                if (Math.Max(forward, backward) <= Negligible) continue;
                waves.Add(new BalancedWave(order, ElectricalOrder(order, design.PolePairs), forward, backward));
                int p = design.PolePairs;
                if (order < p) sub.Add(order);
                else if (order % p == 0 && order / p % 2 == 0) even.Add(order);
                else if (order % p != 0) inter.Add(order);
            }
        return new BalancedMmfWaves(working, waves.ToImmutable(), sub.ToImmutable(), even.ToImmutable(), inter.ToImmutable());
    }

    private static GapSummary Gap(WindingDesign design, ImmutableArray<string>.Builder notes)
    {
        var g = design.Geometry;
        double? gap = g.EffectiveMechanicalGap, bore = g.BoreRadius, rotor = g.RotorOuterRadius;
        if (g.RotorRadius is null && rotor is not null) notes.Add(g.RotorOutside ? "rotor radius taken as bore radius plus gap (rotor outside)" : "rotor radius taken as bore radius minus gap");
        double? carter = null;
        if (gap is > 0 && g.SlotPitch(design.Slots) is { } pitch)
        {
            double opening = g.SlotOpening ?? 0;
            if (g.SlotOpening is null) notes.Add("no slot opening: Carter's coefficient 1 (smooth bore)");
            if (opening >= 0 && opening < pitch) carter = CarterCoefficient.Compute(pitch, opening, gap.Value);
            else notes.Add("slot opening not narrower than the slot pitch: Carter's coefficient not computed");
        }
        else notes.Add("Carter's coefficient and field need bore diameter and gap");
        return new GapSummary(carter, gap, carter is { } k && gap is { } d ? k * d : null, bore, rotor, g.RotorOutside);
    }

    private static BackEmfSummary? BackEmfOf(WindingDesign design, ImmutableArray<PhaseAnalysis> phases, ImmutableArray<string>.Builder notes)
    {
        var g = design.Geometry;
        if (g.GapFluxDensity is not { } b || g.BoreRadius is not { } r || g.StackLength is not { } l || design.PolePairs == 0)
        {
            notes.Add("back-EMF needs gap flux density, bore and stack length");
            return null;
        }
        double flux = BackEmf.FluxPerPole(b, r, l, design.PolePairs);
        var emf = phases.Select(ph =>
        {
            double kw = ph.Harmonics.FirstOrDefault(h => h.Order == design.PolePairs)?.WindingFactor ?? 0;
            double perHz = BackEmf.Rms(1, kw, ph.SeriesTurns, flux);
            return new PhaseEmf(ph.Name, kw, perHz, perHz * design.PolePairs * 1000 / 60.0);
        }).ToImmutableArray();
        return new BackEmfSummary(b, flux, emf);
    }

    /// <summary>Σ_k conductors_k(s)/paths · i_k: the ampere-conductors in each slot at the instant.</summary>
    internal static double[] SlotAmpereConductors(WindingSpectrum winding, ReadOnlySpan<double> currents)
    {
        var total = new double[winding.Slots];
        for (int k = 0; k < winding.Phases && k < currents.Length; k++)
            for (int s = 0; s < total.Length; s++) total[s] += winding.SlotConductors[k][s] / winding.Paths * currents[k];
        return total;
    }

    private static DriveAnalysis DriveOf(WindingDesign design, WindingSpectrum winding, Drive drive, double time, int maxOrder,
        GapSummary gap, BackEmfSummary? backEmf)
    {
        var waves = ImmutableArray.CreateBuilder<TravellingWave>();
        var groups = CurrentPhasors.Of(drive, winding.Phases);
        var all = new List<TravellingWave>();
        foreach (var group in groups)
            for (int order = 1; order <= maxOrder; order++)
                all.Add(TravellingWaves.Describe(winding, group, order));
        double largest = all.Count == 0 ? 0 : all.Max(w => Math.Max(w.Standing, Math.Max(w.Forward, w.Backward)));
        waves.AddRange(all.Where(w => Math.Max(w.Standing, Math.Max(w.Forward, w.Backward)) > Negligible * largest && largest > 0));

        var currents = new double[winding.Phases];
        foreach (var c in drive.Currents)
            if (c.Phase >= 0 && c.Phase < currents.Length) currents[c.Phase] += c.At(time);
        var mmf = MmfStaircase.FromCurrents(winding, currents, time);
        var instant = ImmutableArray.CreateBuilder<MmfHarmonic>();
        double fundamental = 0;
        for (int order = 1; order <= maxOrder; order++)
        {
            double amplitude = MmfStaircase.HarmonicAmplitude(winding, currents, order);
            if (order == design.PolePairs) fundamental = amplitude;
            instant.Add(new MmfHarmonic(order, ElectricalOrder(order, design.PolePairs), amplitude));
        }
        double instantLargest = instant.Count == 0 ? 0 : instant.Max(h => h.Amplitude);
        var shown = instant.Where(h => h.Amplitude > Negligible * instantLargest && instantLargest > 0).ToImmutableArray();

        GapField? peakField = null, fundamentalField = null;
        if (gap.BoreRadius is { } rs && gap.RotorRadius is { } rr && rs > 0 && rr > 0 && rs != rr)
        {
            double carter = gap.CarterCoefficient ?? 1;
            var exact = new StaircaseGapField(SlotAmpereConductors(winding, currents), rs, rr);
            peakField = AirGapField.Describe(mmf.Peak, rr, rs, carter, exact.PeakAtRotor(), exact.PeakAtStatorTeeth());
            if (design.PolePairs > 0) fundamentalField = AirGapField.OfHarmonic(fundamental, design.PolePairs, rr, rs, carter);
        }

        // Back-EMF at the drive's strongest AC frequency.
        var ac = groups.Where(g => !g.IsDirect).OrderByDescending(g => g.Phasors.Sum(p => p.Magnitude)).FirstOrDefault();
        double? frequency = ac?.FrequencyHz;
        var emf = backEmf is not null && frequency is { } f
            ? backEmf.Phases.Select(p => p.VoltsPerHertz * f).ToImmutableArray()
            : [];

        return new DriveAnalysis(drive.Name, time, [.. currents], waves.ToImmutable(), [.. mmf.Levels.ToArray()], mmf.Peak,
            shown, peakField, fundamentalField, backEmf is null ? null : frequency, emf);
    }
}
