using System.Collections.Immutable;
using System.Numerics;
using WindScript.Model;

namespace WindScript.Analysis.Conductors;

/// <summary>
/// Gathers the conductor and slot figures of a design: fill, resistance, mass, losses, the complete
/// per-phase inductances, reactances and torque. Each figure comes from the class named after it; this
/// class only joins them and records what is missing.
/// </summary>
internal static class ConductorAnalysis
{
    public static readonly ImmutableArray<string> Sources =
    [
        "resistivity and temperature coefficient: IEC 60028 (annealed copper, 1/58 ohm mm2/m at 20 degC, 0.00393 /K), IEC 60121 (aluminium, 0.028264 ohm mm2/m, 0.00403 /K)",
        "overall diameter of enamelled round wire by grade: after IEC 60317-0-1, from memory (approximate)",
        "packing limit of equal round strands pi/(2 sqrt 3) (hexagonal packing, geometry)",
        "slot and tooth-tip leakage permeances: Pyrhonen, Jokinen, Hrabovcova, Design of Rotating Electrical Machines, ch. 4 (1-D slot field of ideal iron; lambda_d = 5(delta/b1)/(5 + 4 delta/b1)), summed over the actual layer contents of every slot",
        "end-winding leakage: Pyrhonen et al. ch. 4 empirical form L_w = (4m/Q) q N^2 mu0 l_w lambda_w, lambda_w = 0.3 (assumed, from memory)",
        "skew leakage sigma_sq = 1/k_sq^2 - 1 (Pyrhonen et al. ch. 4); magnetising inductance of the working wave (Fitzgerald, Kingsley, Umans, Electric Machinery)",
        "torque: non-salient machine, sinusoidal excitation of the stated peak gap flux density, T = m E I cos(gamma) / Omega (power balance; no reluctance torque, no saturation)",
        "resistance is DC (no skin or proximity effect); copper loss = sum over phases of I_rms^2 R at the operating temperature",
    ];

    public static ConductorFigures? Evaluate(WindingDesign design, GapSummary gap, InductanceMatrix? airGap, double? differential)
    {
        if (design.Slot is null && design.Conductor is null) return null;
        var notes = ImmutableArray.CreateBuilder<string>();
        var section = design.Slot is null ? null : SlotSection.Of(design);
        var strand = design.Conductor is null ? null : Strand.Of(design.Conductor);
        if (design.Slot is null) notes.Add("slot fill and slot leakage need a slot block");
        if (design.Conductor is null) notes.Add("fill, resistance and losses need a conductor block");
        if (strand is { BareEstimated: true }) notes.Add("bare diameter taken as overall diameter / 1.06 (a grade-2 enamel build, common practice): give 'bare_diameter' for the copper area");

        var fill = section is not null && strand is not null && design.Conductor is { } c0 ? Fill(design, section, strand, c0) : null;
        var resistance = strand is not null ? Resistance(design, section, strand, notes) : null;
        var inductances = Inductances(design, section, gap, airGap, differential, resistance, notes);
        double? torqueConstant = TorqueConstant(design, notes);
        var drives = design.Drives.Select(d => DriveOf(design, d, strand, resistance, inductances, torqueConstant)).ToImmutableArray();
        return new ConductorFigures(fill, resistance, inductances, torqueConstant, drives, Sources, notes.ToImmutable());
    }

    /// <summary>Strands in each slot: Σ over phases and layers of |conductors| × strands in hand.</summary>
    public static int[] StrandsPerSlot(WindingDesign design)
    {
        var matrix = design.Conductors;
        int strands = design.Conductor?.Strands ?? 1;
        var count = new int[design.Slots];
        for (int s = 0; s < design.Slots; s++)
            for (int k = 0; k < matrix.Phases; k++)
                for (int layer = 0; layer < matrix.Layers; layer++) count[s] += Math.Abs(matrix[k, s, layer]) * strands;
        return count;
    }

    /// <summary>The fill of the fullest slot; null when the slot leaves no area (its dimensions contradict: a check reports it).</summary>
    public static SlotFill? Fill(WindingDesign design, SlotSection section, Strand strand, ConductorSpec c)
    {
        int most = StrandsPerSlot(design).DefaultIfEmpty(0).Max();
        double gross = section.GrossArea, net = section.NetArea;
        if (!(gross > 0) || !(net > 0)) return null;
        double copper = most * strand.BareArea, insulated = most * strand.InsulatedArea;
        return new SlotFill(ShapeWord(section.Shape), gross, net, most, strand.BareArea, strand.InsulatedArea, copper, insulated,
            copper / gross, insulated / net, strand.PackingLimit, c.FillLimit ?? strand.DefaultFillLimit, section.Opening is { } b1 && section.Shape == SlotShape.Open ? b1 - 2 * section.Liner : section.Opening, strand.NarrowestWidth);
    }

    public static string ShapeWord(SlotShape shape) => shape switch
    {
        SlotShape.Open => "open",
        SlotShape.SemiClosed => "semi_closed",
        SlotShape.Trapezoid => "trapezoid",
        SlotShape.RoundBottom => "round_bottom",
        _ => "area",
    };

    private static WindingResistance? Resistance(WindingDesign design, SlotSection? section, Strand strand, ImmutableArray<string>.Builder notes)
    {
        var c = design.Conductor!;
        if (design.Geometry.StackLength is not { } stack)
        {
            notes.Add("resistance needs the stack length");
            return null;
        }
        double? slotWidth = section is { Drawable: true } ? section.Width(section.ConductorMid) : null;
        double? End(Coil coil) => TurnLength.EndLength(c, TurnLength.Span(design, section, TurnLength.PitchOf(coil, design.Slots)), slotWidth);
        if (design.Winding.Coils.Length == 0 || design.Winding.Coils.Any(coil => End(coil) is null))
        {
            notes.Add(c.EndLength is null && c.EndShape is null ? "resistance needs the coil ends: 'end_shape' or 'end_length' in the conductor block" : "resistance needs the bore (for the coil span)");
            return null;
        }
        if (c.EndShape == EndWindingShape.Lap && c.EndOverhang is null) notes.Add("lap coil ends: apex at (w/2) tan 30 deg beyond the straight run (default; 'end_overhang' sets it)");
        double Mlt(Coil coil) => 2 * (stack + End(coil)!.Value);
        var lengths = PhaseResistance.ConductorLength(design, Mlt);
        var material = ConductorMaterials.Of(c.Material);
        double temperature = c.Temperature ?? 20;
        if (c.Temperature is null) notes.Add("resistance and losses at 20 degC (no 'temperature' in the conductor block)");
        double turnArea = strand.BareArea * c.Strands;
        double rho20 = material.Resistivity20, rhoHot = material.ResistivityAt(temperature);
        var phases = design.Phases.Select(p =>
        {
            int turns = design.Winding.Coils.Where(x => x.Phase == p.Index).Sum(x => x.Turns);
            double mlt = turns > 0 ? lengths[p.Index] / turns : 0;
            return new PhaseResistanceFigures(p.Name, mlt, lengths[p.Index],
                PhaseResistance.Of(lengths[p.Index], rho20, design.Winding.Paths, turnArea),
                PhaseResistance.Of(lengths[p.Index], rhoHot, design.Winding.Paths, turnArea));
        }).ToImmutableArray();
        double meanEnd = design.Winding.Coils.Average(coil => End(coil)!.Value);
        double mass = material.Density * lengths.Sum() * turnArea;
        return new WindingResistance(material.Name, temperature, rho20, rhoHot, meanEnd, mass, phases);
    }

    private static PhaseInductanceSet? Inductances(WindingDesign design, SlotSection? section, GapSummary gap, InductanceMatrix? airGap,
        double? differential, WindingResistance? resistance, ImmutableArray<string>.Builder notes)
    {
        var g = design.Geometry;
        if (g.StackLength is not { } stack || design.Phases.Length == 0 || design.PolePairs == 0)
        {
            notes.Add("inductances need the stack length");
            return null;
        }
        var spectrum = WindingSpectrum.Of(design);
        int m = design.Phases.Length, p = design.PolePairs;
        double turns = spectrum.SeriesTurns(0), kw = spectrum.WindingFactor(0, p);
        double mu0l = AirGapField.Mu0 * stack;
        double? magnetising = airGap is { } l0 ? PhaseInductances.Magnetising(m, l0.MeanRadius, stack, kw, turns, p, l0.EffectiveGap) : null;
        double? slot = null, tip = null, slotLambda = null, tipLambda = null;
        if (section is not null && SlotPermeance.Of(section, gap.EffectiveGap) is { } permeance)
        {
            var (s, t) = PhaseInductances.SlotSums(design, permeance);
            slot = mu0l * s;
            tip = gap.EffectiveGap is null ? null : mu0l * t;
            slotLambda = permeance.Layers.Length == 1 ? permeance.Layers[0, 0] + permeance.Above : null;
            tipLambda = gap.EffectiveGap is null ? null : permeance.ToothTip;
        }
        else if (section is not null) notes.Add("slot leakage needs a slot drawn by its shape, with the slot opening");
        double? end = resistance is { } r ? PhaseInductances.EndWinding(m, design.Slots, design.SlotsPerPolePerPhase, turns, r.EndLength) : null;
        double skewFactor = ClosedFormFactors.Skew(p, g.SkewSlots, design.Slots);
        double? skew = magnetising * PhaseInductances.SkewCoefficient(skewFactor);
        double? diff = magnetising * differential;
        double? total = slot + tip + end + skew + diff;
        if (total is null) notes.Add("total leakage and synchronous inductance need every part: slot (slot block), end winding (coil ends, stack), magnetising (bore, gap, stack)");
        return new PhaseInductanceSet(magnetising, slot, tip, end, skew, diff, total, magnetising + total, slotLambda, tipLambda);
    }

    private static double? TorqueConstant(WindingDesign design, ImmutableArray<string>.Builder notes)
    {
        var g = design.Geometry;
        if (g.GapFluxDensity is not { } b || g.BoreRadius is not { } r || g.StackLength is not { } l || design.PolePairs == 0) return null;
        double flux = BackEmf.FluxPerPole(b, r, l, design.PolePairs);
        // E_rms per electrical Hz, then T·Ω = m·E·I: k_T = m·E/Ω per rms ampere, Ω = 2πf/p.
        double perHz = BackEmf.Rms(1, design.FundamentalWindingFactor(0), design.SeriesTurns(0), flux);
        return design.Phases.Length * perHz * design.PolePairs / (2 * Math.PI);
    }

    /// <summary>rms value of a phase current: √(dc² + Σ_f |Î_f|²/2), the components of one frequency added as phasors.</summary>
    public static double Rms(PhaseCurrent current)
    {
        double dc = 0, sum = 0;
        foreach (var group in current.Components.GroupBy(c => c.Omega))
        {
            if (group.Key == 0) { dc += group.Sum(c => c.Peak); continue; }
            var phasor = group.Aggregate(Complex.Zero, (acc, c) => acc + Complex.FromPolarCoordinates(c.Peak, c.PhaseAngle));
            sum += phasor.Magnitude * phasor.Magnitude / 2;
        }
        return Math.Sqrt(dc * dc + sum);
    }

    private static DriveConductorFigures DriveOf(WindingDesign design, Drive drive, Strand? strand, WindingResistance? resistance,
        PhaseInductanceSet? inductances, double? torqueConstant)
    {
        var rms = drive.Currents.Select(Rms).ToArray();
        double largest = rms.DefaultIfEmpty(0).Max();
        var strongest = drive.Currents.SelectMany(c => c.Components).Where(c => c.Omega != 0).OrderByDescending(c => Math.Abs(c.Peak)).FirstOrDefault();
        double? hz = strongest?.FrequencyHz;
        double? density = strand is not null && design.Conductor is { } c ? largest / (design.Winding.Paths * c.Strands * strand.BareArea) : null;
        double? loss = resistance is { } r ? r.Phases.Select((ph, k) => k < rms.Length ? rms[k] * rms[k] * ph.ResistanceHot : 0).Sum() : null;
        double? reactance = hz is { } f && inductances?.CompleteSynchronous is { } ls ? 2 * Math.PI * f * ls : null;
        double angle = drive.CurrentAngle ?? 0;
        double? torque = null;
        if (torqueConstant is { } kt && strongest is not null && drive.Currents.Length > 0)
        {
            // The working-frequency rms current of the first phase.
            var atWorking = drive.Currents[0].Components.Where(x => x.Omega == strongest.Omega)
                .Aggregate(Complex.Zero, (acc, x) => acc + Complex.FromPolarCoordinates(x.Peak, x.PhaseAngle));
            torque = kt * atWorking.Magnitude / Math.Sqrt(2) * Math.Cos(angle);
        }
        return new DriveConductorFigures(drive.Name, hz, largest, density, loss, reactance, angle * 180 / Math.PI, torque);
    }
}
