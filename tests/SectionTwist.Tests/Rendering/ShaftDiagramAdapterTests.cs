using SectionTwist.Rendering.Adapters;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Rendering.Shaft;
using SectionTwist.Shaft;
using SkiaSharp;

namespace SectionTwist.Tests.Rendering;

/// <summary>The adapter from a solved shaft to the diagram data: torque steps, signs, sizes and shear at the segment ends.</summary>
public class ShaftDiagramAdapterTests
{
    private static readonly Material Steel = new("steel", 79.3e9, 60e6, null, "G: Gere, Mechanics of Materials; allowable invented for the test");

    // A cantilever held at A, +300 N*m applied at B and -100 N*m at D (right-hand rule about the axis A -> D).
    // Statics (common practice, no source): the internal torque in a cut is the sum of the applied torques beyond it,
    // AB +200, BC -100, CD -100 N*m; the reaction at A is -(300 - 100) = -200 N*m.
    // Segment BC is given from C to B and the taper from D to C, so the adapter must orient them along the axis.
    internal static ShaftModel Cantilever() => new()
    {
        Title = "adapter test",
        Stations = [new("A", 0), new("B", 0.2), new("C", 0.5), new("D", 0.7)],
        Segments =
        [
            new ShaftSegment("A", "B", SectionStiffness.Round(0.040), Steel),
            new ShaftSegment("C", "B", SectionStiffness.Tube(0.050, 0.030), Steel) { Name = "hollow" },
            new ShaftSegment("D", "C", new RoundTaper(0.030, 0.036), Steel) { Name = "taper" },
        ],
        Loads = [new PointTorque("B", 300), new PointTorque("D", -100)],
        FixedStations = ["A"],
    };

    [Fact]
    public void Torque_steps_at_the_stations_with_the_signs_of_the_result()
    {
        var result = ShaftSolver.Solve(Cantilever());
        var data = ShaftDiagramAdapter.From(result);
        var seg = data.Segments.ToDictionary(s => s.Label);
        // the same numbers as the solver, and the statics above
        foreach (var r in result.Segments)
        {
            Assert.Equal(r.TorqueAtFrom, seg[r.Label].TorqueStart);
            Assert.Equal(r.TorqueAtTo, seg[r.Label].TorqueEnd);
        }
        Tol.Rel(200, seg["A-B"].TorqueStart, 1e-9, "statics");
        Tol.Rel(-100, seg["hollow"].TorqueStart, 1e-9, "statics");
        Tol.Rel(-100, seg["taper"].TorqueEnd, 1e-9, "statics");
        Assert.Equal((0.2, 0.5), (seg["hollow"].From, seg["hollow"].To));

        // the plotted series: up to +200 at A, a step down by the applied 300 at B, none at C, back to zero at D
        var pts = ShaftSeries.Torque(data);
        double[] Step(double x) => [.. pts.Where(p => Math.Abs(p.X - x) < 1e-12).Select(p => p.Y)];
        Assert.Equal(0, Step(0)[0]);
        Tol.Rel(200, Step(0)[1], 1e-9);
        Assert.Equal(2, Step(0.2).Length);
        Tol.Rel(300, Step(0.2)[0] - Step(0.2)[1], 1e-9, "the jump equals the applied torque at B");
        Tol.Rel(Step(0.5)[0], Step(0.5)[1], 1e-12, "no torque applied at C: no step");
        Assert.Equal(0, Step(0.7)[^1]);

        var a = data.Stations.Single(s => s.Name == "A");
        Assert.Equal(SupportKind.Fixed, a.Support);
        Tol.Rel(-200, a.Reaction, 1e-9, "statics");
        Assert.Equal(result.Reactions.Single().Torque, a.Reaction);
        Assert.Equal(300, data.Stations.Single(s => s.Name == "B").AppliedTorque);
        // phi_B = T L / (G J), Timoshenko and Goodier ch. 10; positive like the internal torque of AB
        double phiB = 200 * 0.2 / (79.3e9 * Math.PI * Math.Pow(0.040, 4) / 32);
        Tol.Rel(phiB * 180 / Math.PI, data.Stations.Single(s => s.Name == "B").RotationDeg, 1e-9, "T L / (G J)");
    }

    [Fact]
    public void Sizes_and_shear_follow_the_sections_in_axis_order()
    {
        var result = ShaftSolver.Solve(Cantilever());
        var seg = ShaftDiagramAdapter.From(result).Segments.ToDictionary(s => s.Label);
        // round: tau = 16 T / (pi d^3) (Timoshenko and Goodier ch. 10), as the solver's peak
        Tol.Rel(200 * 16 / (Math.PI * Math.Pow(0.040, 3)), seg["A-B"].ShearStart, 1e-12);
        Tol.Rel(result.Segments.Single(s => s.Label == "A-B").MaxShear, seg["A-B"].ShearEnd, 1e-12);
        Assert.Equal(0.040, seg["A-B"].OuterStart);
        Assert.Equal(0, seg["A-B"].Inner);
        // tube: the bore follows from J and the outer diameter
        Tol.Rel(0.030, seg["hollow"].Inner, 1e-9, "J = pi (D^4 - d^4) / 32");
        Assert.Equal(0.050, seg["hollow"].OuterEnd);
        // taper given from D (30 mm) to C (36 mm): along the axis it starts at C with 36 mm
        Assert.Equal((0.036, 0.030), (seg["taper"].OuterStart, seg["taper"].OuterEnd));
        Tol.Rel(100 * 16 / (Math.PI * Math.Pow(0.030, 3)), seg["taper"].ShearEnd, 1e-12);
        Tol.Rel(result.Segments.Single(s => s.Label == "taper").MaxShear, seg["taper"].ShearEnd, 1e-9, "peak at the small end");
        Assert.Equal(60e6, seg["taper"].Allowable);
    }

    [Fact]
    public void Given_j_section_without_a_size_is_drawn_as_the_round_of_equal_j()
    {
        double j = Math.PI * Math.Pow(0.025, 4) / 32;
        var model = new ShaftModel
        {
            Stations = [new("A", 0), new("B", 0.1)],
            Segments = [new ShaftSegment("A", "B", new SectionStiffness(j, 1.2 * 16 / (Math.PI * Math.Pow(0.025, 3))), Steel)],
            Loads = [new PointTorque("B", 50)],
            FixedStations = ["A"],
        };
        var s = ShaftDiagramAdapter.From(ShaftSolver.Solve(model)).Segments.Single();
        Tol.Rel(0.025, s.OuterStart, 1e-12, "(32 J / pi)^(1/4)");
        Assert.Equal(0, s.Inner); // tau/T is not that of a round, so no bore is inferred
    }

    [Fact]
    public void Distributed_torque_ramps_the_internal_torque_and_is_drawn_with_its_total()
    {
        // Held at A; +60 N*m applied at B and -60 N*m spread uniformly over B-C (300 N*m/m over 0.2 m). Statics (common
        // practice, no source): the internal torque is the sum of the torques beyond the cut, so AB carries 60 - 60 = 0 and
        // BC runs from -60 just after B (the whole spread torque lies beyond) to 0 at C.
        var model = new ShaftModel
        {
            Stations = [new("A", 0), new("B", 0.1), new("C", 0.3)],
            Segments = [new ShaftSegment("A", "B", SectionStiffness.Round(0.03), Steel), new ShaftSegment("B", "C", SectionStiffness.Round(0.03), Steel)],
            Loads = [new PointTorque("B", 60), new DistributedTorque("B", "C", -300) { Description = "drum" }],
            FixedStations = ["A"],
        };
        var data = ShaftDiagramAdapter.From(ShaftSolver.Solve(model));
        var spread = Assert.Single(data.DistributedTorques);
        Assert.Equal((0.1, 0.3, "drum"), (spread.From, spread.To, spread.Label));
        Tol.Rel(-60, spread.Total, 1e-12, "intensity times length");
        var bc = data.Segments.Single(s => s.Label == "B-C");
        Tol.Rel(-60, bc.TorqueStart, 1e-9, "statics");
        Tol.Abs(0, bc.TorqueEnd, 1e-9, "statics");
        Tol.Abs(0, data.Segments.Single(s => s.Label == "A-B").TorqueStart, 1e-9, "statics");
        string svg = System.Text.Encoding.UTF8.GetString(ShaftDiagram.Render(data, ImageFormat.Svg, 800, 700));
        Assert.Contains("-60 N·m spread (drum)", System.Xml.Linq.XDocument.Parse(svg).Root!.Value, StringComparison.Ordinal);
    }

    [Fact]
    public void Rendered_diagram_of_the_adapted_shaft_has_the_torque_sign_pixels()
    {
        var data = ShaftDiagramAdapter.From(ShaftSolver.Solve(Cantilever()));
        const int w = 900, h = 820;
        byte[] png = ShaftDiagram.Render(data, ImageFormat.Png, w, h);
        Dump.Write("adapter-shaft.png", png);
        using var bmp = SKBitmap.Decode(png);
        Assert.Equal((w, h), (bmp.Width, bmp.Height));
        var layout = ShaftDiagram.Layout(data, w, h);
        var (tp, _, _) = ShaftDiagram.Panels(data, layout);
        float zero = tp.ToPixelY(0);
        // AB carries +200 N*m: filled above the zero line; CD carries -100 N*m: filled below it
        foreach (var (mid, sign) in new[] { (0.1, +1), (0.6, -1) })
        {
            int x = (int)layout.ToPixelX(mid);
            var filled = bmp.GetPixel(x, (int)(zero - sign * 8));
            var empty = bmp.GetPixel(x, (int)(zero + sign * 8));
            Assert.True(filled.Blue > filled.Red + 15 && filled.Red < 225, $"x={mid}: expected the torque fill on the {(sign > 0 ? "upper" : "lower")} side, got {filled}");
            Assert.True(empty.Red > 230 && empty.Green > 230, $"x={mid}: expected background on the other side, got {empty}");
        }
    }
}
