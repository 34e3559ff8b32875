using SectionTwist.Geometry;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Torsion;

public class TorsionSolverTests
{
    [Theory]
    [InlineData(1.0)]
    [InlineData(2.0)]
    public void Structured_rectangle_converges_to_series(double aspect)
    {
        double b = 0.01, a = aspect * b;
        var (beta, alpha) = SectionTwist.Tests.References.Published.Rectangle(a, b);
        var (mesh, profile) = TestMeshes.Rectangle(a, b, (int)(24 * aspect), 24);
        var s = TorsionSolver.Solve(mesh, new double[1]);
        Assert.True(s.Residual < 1e-10);
        // Timoshenko and Goodier sec. 109 series; P2 with sharp convex corners: a fine structured mesh gets 1e-5.
        Tol.Rel(beta * a * b * b * b, s.J, 2e-5, "rectangle series");
        Tol.Rel(1 / (alpha * a * b * b), s.MaxGradient / s.J, 2e-3, "rectangle series, tau at mid long side");
        // peak at the middle of a long side (any side of a square)
        Point2[] mids = aspect == 1 ? [new(a / 2, 0), new(a / 2, b), new(0, b / 2), new(a, b / 2)] : [new(a / 2, 0), new(a / 2, b)];
        Assert.Contains(mids, m => Point2.Distance(m, s.MaxGradientLocation) < 0.02 * a);
        _ = profile;
    }

    // Hollow circle: J = pi (D^4 - d^4) / 32, tau = 16 T D / (pi (D^4 - d^4)) (Timoshenko and Goodier, ch. 10).
    [Fact]
    public void Tube_hole_constant_gives_exact_J_and_peak()
    {
        double ro = 0.025, ri = 0.015;
        var (mesh, profile) = TestMeshes.Annulus(ro, ri, 4, 96);
        var area = profile.Loops.Select(l => Math.Abs(l.SignedArea)).ToArray();
        var s = TorsionSolver.Solve(mesh, area);
        double jExact = Math.PI * (Math.Pow(ro, 4) - Math.Pow(ri, 4)) / 2;
        Tol.Rel(jExact, s.J, 1e-6, "hollow circle, exact");
        Tol.Rel(2 * ro / (Math.PI * (Math.Pow(ro, 4) - Math.Pow(ri, 4))), s.MaxGradient / s.J, 1e-4, "hollow circle, exact");
        // hole constant: phi = (ro^2 - r^2)/2 at r = ri
        Tol.Rel((ro * ro - ri * ri) / 2, s.LoopValue[1], 1e-6, "hollow circle stress function");
    }
}
