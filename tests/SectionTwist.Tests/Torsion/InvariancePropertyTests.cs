using FsCheck.Xunit;
using SectionTwist.Geometry;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Torsion;

/// <summary>
/// Property-based checks of the torsion constant: J is invariant under translation, rotation and mirroring of the section and
/// scales as length^4 (dimensional analysis of J = 2 integral(phi dA) with phi ~ length^2; common practice, no source
/// needed). Each seed builds a random star-shaped polygon with a round hole; the two analyses use different meshes, so
/// they agree within the sum of their error estimates (accuracy 1e-4 each).
/// </summary>
public class InvariancePropertyTests
{
    private static Profile RandomSection(Random rng)
    {
        int n = 5 + rng.Next(6);
        var pts = Enumerable.Range(0, n)
            .Select(i => (i + 0.2 + 0.6 * rng.NextDouble()) * 2 * Math.PI / n)
            .Select(a => new Point2(Math.Cos(a), Math.Sin(a)) * (0.02 * (0.7 + 0.3 * rng.NextDouble())))
            .ToList();
        var hole = LoopBuilder.Circle(new Point2(0.001 * rng.NextDouble(), 0), 0.004 + 0.004 * rng.NextDouble());
        return new Profile([new Region(LoopBuilder.Polygon(pts), [hole])]);
    }

    [Property(MaxTest = 6)]
    public void J_is_invariant_under_rigid_motion_and_scales_with_length_to_the_fourth(int seed)
    {
        var rng = new Random(seed);
        var p = RandomSection(rng);
        double angle = 2 * Math.PI * rng.NextDouble();
        double s = Math.Exp(rng.NextDouble() * 4 - 2); // 0.14 .. 7.4
        var moved = p.Transformed(new Similarity2(s, angle, rng.Next(2) == 0, new Point2(rng.NextDouble() - 0.5, 3 * rng.NextDouble())));
        var options = new AnalysisOptions { Accuracy = 1e-4 };
        var a = SectionAnalyzer.Analyze(p, options);
        var b = SectionAnalyzer.Analyze(moved, options);
        double tol = 2e-4 + a.EstimatedRelativeError.TorsionConstant + b.EstimatedRelativeError.TorsionConstant;
        Tol.Rel(a.TorsionConstant * Math.Pow(s, 4), b.TorsionConstant, tol, "J ~ length^4, invariant under rigid motion");
        Tol.Rel(p.Properties.Area * s * s, moved.Properties.Area, 1e-10, "area ~ length^2");
    }
}
