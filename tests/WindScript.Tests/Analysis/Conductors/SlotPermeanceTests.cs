using WindScript.Analysis;
using WindScript.Analysis.Conductors;
using WindScript.Model;
using WindScript.Tests.Support;

namespace WindScript.Tests.Analysis.Conductors;

/// <summary>
/// Slot leakage permeance against the closed forms of Pyrhonen et al., Design of Rotating Electrical
/// Machines (2014), ch. 4, and against an independent finite-difference solution of the slot's
/// magnetostatic field (ideal iron), computed here.
/// </summary>
public class SlotPermeanceTests
{
    private static SlotSection Section(SlotShape shape, double width, double depth, double tip = 0, double taper = 0, double wedge = 0,
        double liner = 0, double separator = 0, int layers = 1, double? opening = null) => new()
    {
        Shape = shape, Opening = opening ?? width, TipHeight = tip, TipTaper = taper, Wedge = wedge, Liner = liner,
        Separator = separator, Layers = layers, Depth = depth, TopWidth = width, BottomWidth = width, Slots = 36,
    };

    // Pyrhonen ch. 4, single-layer semi-closed parallel slot: lambda = h4/(3 b4) + h3/b4 + 2 h2/(b4 + b1) + h1/b1.
    [Theory]
    [InlineData(6e-3, 20e-3, 0.8e-3, 1.2e-3, 1.5e-3, 2.5e-3)]
    [InlineData(9e-3, 35e-3, 1.0e-3, 2.0e-3, 3.0e-3, 3.0e-3)]
    public void Single_layer_semi_closed_slot_matches_the_closed_form(double b4, double depth, double h1, double h2, double h3, double b1)
    {
        var s = Section(SlotShape.SemiClosed, b4, depth, h1, h2, h3, opening: b1);
        var p = SlotPermeance.Of(s, null)!;
        double h4 = depth - h1 - h2 - h3;
        double expected = h4 / (3 * b4) + h3 / b4 + 2 * h2 / (b4 + b1) + h1 / b1;
        Assert.Equal(expected, p.Layers[0, 0] + p.Above, 6);
    }

    // Pyrhonen ch. 4, tooth-tip leakage factor lambda_d = 5 (delta/b1) / (5 + 4 delta/b1).
    [Fact]
    public void Tooth_tip_factor_is_the_closed_form()
    {
        Assert.Equal(5 * 0.2 / (5 + 0.8), SlotPermeance.ToothTipFactor(0.5e-3, 2.5e-3), 14);
    }

    // Pyrhonen ch. 4, double-layer 60-degree-belt three-phase winding short-pitched to W/tau_p:
    // L_u = (4m/Q) mu0 l N^2 [k1 h4/(3 b4) + k2 (h3/b4 + 2 h2/(b4 + b1) + h1/b1)], k2 = 1 - 3 eps/4, k1 = 1 - 9 eps/16,
    // with two layers of height h4/2 and no separator. The code sums the actual layer contents of every slot.
    [Theory]
    [InlineData(36, 4, 9)]
    [InlineData(36, 4, 8)]
    [InlineData(36, 4, 7)]
    [InlineData(48, 4, 10)]
    [InlineData(24, 2, 10)]
    public void Double_layer_short_pitch_matches_the_k1_k2_closed_form(int slots, int poles, int pitch)
    {
        var d = Designs.IntegralSlot(slots, poles, pitch, geometry: new Geometry { BoreDiameter = 0.15, StackLength = 0.1, Gap = 5e-4 });
        double b4 = 7e-3, depth = 25e-3, h1 = 1e-3, h2 = 1.5e-3, h3 = 2e-3, b1 = 3e-3;
        var s = Section(SlotShape.SemiClosed, b4, depth, h1, h2, h3, layers: 2, opening: b1);
        var permeance = SlotPermeance.Of(s, null)!;
        var (slotSum, _) = PhaseInductances.SlotSums(d, permeance);
        double h4 = depth - h1 - h2 - h3;
        double relative = pitch / ((double)slots / poles);
        var (k1, k2) = SlotPermeance.ShortPitchFactors(relative);
        Assert.Equal(1 - 9 * (1 - relative) / 16, k1, 12); // the book's k1 for 2/3 <= W/tau_p <= 1
        double n = d.SeriesTurns(0);
        double closed = 4.0 * 3 / slots * n * n * (k1 * h4 / (3 * b4) + k2 * (h3 / b4 + 2 * h2 / (b4 + b1) + h1 / b1));
        Assert.Equal(closed, slotSum, 4 - (int)Math.Floor(Math.Log10(closed)));
    }

    // An open rectangular slot with a liner (so the current fills only part of the width and the field is 2-D):
    // the 1-D permeance against a finite-difference solution of div grad A = -mu0 J with ideal iron
    // (dA/dn = 0 on the walls and bottom) and A = 0 across the slot's mouth; lambda = (1/mu0) integral of A J for 1 A.
    [Theory]
    [InlineData(6e-3, 18e-3, 0.4e-3, 1.5e-3)]
    [InlineData(10e-3, 30e-3, 0.8e-3, 3e-3)]
    public void Open_slot_permeance_matches_a_finite_difference_field_solution(double width, double depth, double liner, double wedge)
    {
        var s = Section(SlotShape.Open, width, depth, wedge: wedge, liner: liner);
        var p = SlotPermeance.Of(s, null)!;
        double fd = FiniteDifferenceLambda(width, depth, liner, wedge, nx: 40, ny: 120);
        Assert.InRange(Math.Abs(fd - (p.Layers[0, 0] + p.Above)) / fd, 0, 0.01);
    }

    /// <summary>Cell-centred finite differences, SOR; x across the slot, y from the mouth (y = 0) to the bottom.</summary>
    private static double FiniteDifferenceLambda(double width, double depth, double liner, double wedge, int nx, int ny)
    {
        double hx = width / nx, hy = depth / ny;
        var a = new double[nx, ny];
        var j = new double[nx, ny];
        double area = 0;
        for (int i = 0; i < nx; i++)
            for (int k = 0; k < ny; k++)
            {
                double x = (i + 0.5) * hx, y = (k + 0.5) * hy;
                bool copper = x > liner && x < width - liner && y > wedge + liner && y < depth - liner;
                if (copper) { j[i, k] = 1; area += hx * hy; }
            }
        for (int i = 0; i < nx; i++) for (int k = 0; k < ny; k++) j[i, k] /= area; // 1 A in total
        double cx = 1 / (hx * hx), cy = 1 / (hy * hy), omega = 1.97;
        for (int sweep = 0; sweep < 20000; sweep++)
        {
            double change = 0, largest = 1e-300;
            for (int i = 0; i < nx; i++)
                for (int k = 0; k < ny; k++)
                {
                    // Neumann on x walls and at the bottom (mirror), Dirichlet A = 0 at the mouth (ghost = -A).
                    double west = i > 0 ? a[i - 1, k] : a[i, k], east = i < nx - 1 ? a[i + 1, k] : a[i, k];
                    double south = k < ny - 1 ? a[i, k + 1] : a[i, k], north = k > 0 ? a[i, k - 1] : -a[i, k];
                    double diag = 2 * cx + 2 * cy;
                    double target = (cx * (west + east) + cy * (north + south) + j[i, k]) / diag; // mu0 = 1
                    double step = omega * (target - a[i, k]);
                    a[i, k] += step;
                    change = Math.Max(change, Math.Abs(step));
                    largest = Math.Max(largest, Math.Abs(a[i, k]));
                }
            if (change < 1e-9 * largest) break;
        }
        double energy = 0;
        for (int i = 0; i < nx; i++) for (int k = 0; k < ny; k++) energy += a[i, k] * j[i, k] * hx * hy;
        return energy;
    }
}
