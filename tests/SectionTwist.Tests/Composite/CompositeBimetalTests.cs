using SectionTwist.Composite;
using SectionTwist.Torsion;
using Xunit.Abstractions;
using static SectionTwist.Tests.Composite.CompositeShapes;

namespace SectionTwist.Tests.Composite;

/// <summary>
/// A bimetal strip, two layers of widths b and thicknesses t1, t2 bonded along the long edge, against the thin-strip limit
/// and against an independent grid solution.
/// </summary>
public class CompositeBimetalTests(ITestOutputHelper output)
{
    private static readonly SectionTwist.Shaft.Material Steel = CompositeExactTests.Steel;
    private static readonly SectionTwist.Shaft.Material Brass = CompositeExactTests.Brass;

    /// <summary>
    /// Thin-strip limit, derived in the test from the membrane analogy (Prandtl; Timoshenko and Goodier, Theory of
    /// Elasticity, sec. 107 for the homogeneous strip): far from the short edges psi depends on y only, so
    /// ((G_ref / G) psi')' = -2 with psi = 0 on both faces gives psi' = -2 (G / G_ref)(y - y0), where the faces' condition
    /// puts y0 at the G-weighted centroid integral(G y dy) / integral(G dy); then G_ref J_ref = 2 G_ref b integral(psi dy)
    /// = 4 b integral(G (y - y0)^2 dy). For one material it is G b t^3 / 3. The short edges lower it by a relative amount
    /// of order t / b (0.630 t / b for one material, Timoshenko and Goodier sec. 109).
    /// </summary>
    private static double ThinStripGJ(double b, double t1, double g1, double t2, double g2)
    {
        double y0 = (g1 * t1 * t1 / 2 + g2 * (t1 * t2 + t2 * t2 / 2)) / (g1 * t1 + g2 * t2);
        double I(double a, double c) => (Math.Pow(c - y0, 3) - Math.Pow(a - y0, 3)) / 3; // integral((y - y0)^2, a..c)
        return 4 * b * (g1 * I(0, t1) + g2 * I(t1, t1 + t2));
    }

    [Fact]
    public void Thin_strip_formula_is_one_material_when_the_moduli_agree()
    {
        // derived in the test: 4 b G integral((y - t/2)^2) = G b t^3 / 3
        Tol.Rel(79e9 * 0.05 * Math.Pow(0.003, 3) / 3, ThinStripGJ(0.05, 0.001, 79e9, 0.002, 79e9), 1e-13, "G b t^3 / 3 (Timoshenko and Goodier sec. 107)");
    }

    [Fact]
    public void Wide_bimetal_strip_approaches_the_thin_strip_limit_as_t_over_b()
    {
        double t1 = 0.001, t2 = 0.0015, t = t1 + t2;
        var err = new double[2];
        int[] ratio = [20, 40];
        for (int k = 0; k < 2; k++)
        {
            double b = ratio[k] * t;
            var r = CompositeAnalyzer.Analyze(Layers(b, (t1, Steel), (t2, Brass)), Steel, new AnalysisOptions { Accuracy = 1e-5 });
            double thin = ThinStripGJ(b, t1, Steel.ShearModulus, t2, Brass.ShearModulus);
            err[k] = (thin - r.TorsionalRigidity) / thin;
            output.WriteLine($"b/t = {ratio[k]}: GJ {r.TorsionalRigidity:R}, thin-strip {thin:R}, relative shortfall {err[k]:E3} = {err[k] * ratio[k]:F3} t/b; estimate {r.EstimatedRelativeError:E2}, {r.Mesh.Elements} elements");
            // the short edges only lower the rigidity, by about 0.63 t / b for one material (Timoshenko and Goodier sec. 109)
            Assert.InRange(err[k], 0.3 / ratio[k], 0.8 / ratio[k]);
        }
        // the shortfall is of order t / b: doubling b / t halves it (derived in the test; the next term is O((t/b)^2))
        Assert.InRange(err[0] / err[1], 1.8, 2.2);
    }

    [Fact]
    public void Two_material_rectangle_matches_an_independent_grid_solution()
    {
        // a 40 x 20 mm rectangle, the lower half steel, the upper half brass, bonded along y = 0 from edge to edge
        const double W = 0.040, H = 0.020;
        var s = new CompositeSection(
        [
            new CompositePart("lower", Shape(Rect(-W / 2, -H / 2, W / 2, 0)), Steel),
            new CompositePart("upper", Shape(Rect(-W / 2, 0, W / 2, H / 2)), Brass),
        ], "two-material rectangle");
        var r = CompositeAnalyzer.Analyze(s, Steel, new AnalysisOptions { Accuracy = 1e-5 });
        double gRatio = Steel.ShearModulus / Brass.ShearModulus;
        var j = new double[3];
        for (int level = 0; level < 3; level++)
            j[level] = CompositeRectangleTests.GridJ(W, H, 0.001 / (1 << level), (_, y) => y > 0 ? gRatio : 1.0);
        double p = Math.Log2((j[1] - j[0]) / (j[2] - j[1]));
        double extrapolated = j[2] + (j[2] - j[1]) / (Math.Pow(2, p) - 1);
        double spread = Math.Abs(extrapolated - j[2]);
        output.WriteLine($"grid J: {j[0]:R} {j[1]:R} {j[2]:R}; order {p:F2}; extrapolated {extrapolated:R}; FE {r.EquivalentTorsionConstant:R}, difference {Tol.RelErr(extrapolated, r.EquivalentTorsionConstant):E2}, estimate {r.EstimatedRelativeError:E2}");
        Assert.InRange(p, 1.2, 2.5);
        Tol.Abs(extrapolated, r.EquivalentTorsionConstant, Math.Max(spread, 1e-4 * extrapolated), "independent grid solution, extrapolated (common practice, no source)");
        Tol.Rel(1.0, r.Materials.Sum(m => m.TorqueShare), 1e-6, "the shares add to the whole torque (equilibrium)");
        // between the all-brass and the all-steel bar (common practice, no source)
        double jSteel = SectionAnalyzer.Analyze(s.Envelope).TorsionConstant;
        Assert.InRange(r.EquivalentTorsionConstant, jSteel / gRatio, jSteel);
    }
}
