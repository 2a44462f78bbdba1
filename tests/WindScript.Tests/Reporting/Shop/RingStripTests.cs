using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using WindScript.Reporting.Drawing;

namespace WindScript.Tests.Reporting.Shop;

/// <summary>A line on the developed ring continues at the other end of the strip and loses no length.</summary>
public class RingStripTests
{
    [Fact]
    public void A_line_past_the_right_end_continues_from_the_left_end()
    {
        var pieces = RingStrip.Wrap([new Point(80, 0), new Point(120, 40)], 0, 100);
        Assert.Equal(2, pieces.Count);
        Assert.Equal(new Point(100, 20), pieces[0][^1]);
        Assert.Equal(new Point(0, 20), pieces[1][0]);
        Assert.Equal(new Point(20, 40), pieces[1][^1]);
    }

    [Property(MaxTest = 300)]
    public Property Pieces_stay_inside_the_strip_and_keep_the_horizontal_length() =>
        Prop.ForAll(Gen.ListOf(Gen.Choose(-990, 1990)).Where(xs => xs.Count >= 2).ToArbitrary(), xs =>
        {
            // Points within one strip width either side, as coils and links are drawn.
            var points = xs.Select((x, i) => new Point(x / 10.0, i)).ToList();
            var pieces = RingStrip.Wrap(points, 0, 100);
            bool inside = pieces.All(p => p.All(q => q.X >= -1e-9 && q.X <= 100 + 1e-9));
            double Length(IReadOnlyList<Point> p) => p.Zip(p.Skip(1), (a, b) => Math.Abs(b.X - a.X)).Sum();
            // A jump of more than a whole strip between two points is not a line the diagram draws.
            bool drawable = points.Zip(points.Skip(1), (a, b) => Math.Abs(b.X - a.X)).All(dx => dx < 100);
            return !drawable || (inside && Math.Abs(Length(points) - pieces.Sum(Length)) < 1e-6);
        });
}
