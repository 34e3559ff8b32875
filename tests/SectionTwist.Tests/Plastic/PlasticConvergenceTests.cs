using SectionTwist.Meshing;
using SectionTwist.Plastic;
using SectionTwist.Profiles;
using SectionTwist.Units;
using Xunit.Abstractions;

namespace SectionTwist.Tests.Plastic;

/// <summary>Mesh convergence of the fully plastic torque and of a curve point against closed forms.</summary>
public sealed class PlasticConvergenceTests(ITestOutputHelper output)
{
    private static double[] LoopAreas(SectionTwist.Geometry.Profile p) => p.Regions.SelectMany(r => r.Loops).Select(l => Math.Abs(l.SignedArea)).ToArray();

    [Theory]
    // rectangle b x h = 3 x 1: T_p / tau_y = h^2 (3b - h) / 6 = 4/3 (Nadai sand heap, roof)
    [InlineData("rect:b=3,h=1", 4.0 / 3)]
    // equilateral triangle a = 1: T_p / tau_y = a^3 / 12 (Nadai sand heap, pyramid)
    [InlineData("triangle:a=1", 1.0 / 12)]
    public void Fully_plastic_torque_converges_under_uniform_refinement(string spec, double exact)
    {
        var p = ProfileTemplates.Create(spec, LengthUnit.Metre);
        var mesh = Mesher.Generate(p, new MeshOptions { MaxEdgeLength = 0.25 * Math.Sqrt(p.Properties.Area) });
        var t = new List<double>();
        for (int level = 0; level < 4; level++)
        {
            if (level > 0) mesh = MeshRefinement.Uniform(mesh);
            t.Add(FullyPlasticTorque.Compute(mesh, LoopAreas(p)).TorquePerYield);
        }
        var err = t.Select(v => Math.Abs(v - exact) / exact).ToList();
        var rates = err.Zip(err.Skip(1), (a, b) => Math.Log2(a / b)).ToList();
        output.WriteLine($"{spec}: errors {string.Join(", ", err.Select(e => e.ToString("E2")))}; rates {string.Join(", ", rates.Select(r => r.ToString("F2")))}");
        Assert.True(rates.All(r => r >= 1.5), "converges at least as h^1.5 at every step (measured: triangle 2.0, rectangle 1.75)");
        // the estimate (whole change between a mesh and its refinement) bounds the error of the finer mesh
        for (int i = 1; i < t.Count; i++)
            Assert.True(err[i] <= Math.Abs(t[i] - t[i - 1]) / t[i], $"level {i}: error {err[i]:E2} above the estimate {Math.Abs(t[i] - t[i - 1]) / t[i]:E2}");
    }

    [Fact]
    public void Circle_curve_point_converges_under_uniform_refinement()
    {
        // r = 1, G theta / tau_y = 2 (twice the first-yield twist): T / tau_y = (2 pi / 3) (1 - 1/32)
        // (elastic-plastic round bar; Beer, Johnston and DeWolf, Mechanics of Materials, sec. 3.9, from memory).
        var p = ProfileTemplates.Create("circle:d=2", LengthUnit.Metre);
        double exact = 2 * Math.PI / 3 * (1 - 1.0 / 32);
        var mesh = Mesher.Generate(p, new MeshOptions { MaxEdgeLength = 0.3, MaxArcAngleDegrees = 10 });
        var t = new List<double>();
        for (int level = 0; level < 3; level++)
        {
            if (level > 0) mesh = MeshRefinement.Uniform(mesh);
            var s = new ElasticPlasticProblem(mesh, LoopAreas(p)).Solve(2);
            Assert.True(s.Outcome.KktResidual < 1e-10, "the obstacle solve converged");
            t.Add(s.TorquePerYield);
        }
        var err = t.Select(v => Math.Abs(v - exact) / exact).ToList();
        output.WriteLine($"circle curve point: errors {string.Join(", ", err.Select(e => e.ToString("E2")))}");
        Assert.True(err[2] < err[1] && err[1] < err[0], "the error falls with refinement");
        for (int i = 1; i < t.Count; i++)
            Assert.True(err[i] <= Math.Abs(t[i] - t[i - 1]) / t[i], $"level {i}: error {err[i]:E2} above the estimate");
    }

    [Fact]
    public void Two_separate_tubes_carry_twice_the_fully_plastic_torque_of_one()
    {
        // Each region has its own hole constant (a hole of another region is out of reach): two tubes ro = 1, ri = 0.6
        // side by side give 2 x 2 pi (ro^3 - ri^3) / 3 (Nadai sand heap, frustum with plateau), with c = ro - ri each.
        SectionTwist.Geometry.Region Tube(double cx) => new(SectionTwist.Geometry.LoopBuilder.Circle(new(cx, 0), 1),
            [SectionTwist.Geometry.LoopBuilder.Circle(new(cx, 0), 0.6)]);
        var p = new SectionTwist.Geometry.Profile([Tube(0), Tube(3)], LengthUnit.Metre);
        var mesh = MeshRefinement.Uniform(Mesher.Generate(p, new MeshOptions { MaxEdgeLength = 0.15, MaxArcAngleDegrees = 10 }));
        var (t, c) = FullyPlasticTorque.Compute(mesh, LoopAreas(p));
        Tol.Rel(2 * 2 * Math.PI * (1 - 0.216) / 3, t, 1e-5, "Nadai sand heap: two frustums with plateaus");
        Assert.Equal(2, c.Length);
        foreach (double ck in c) Tol.Rel(0.4, ck, 1e-6, "plateau height ro - ri");
    }
}
