using SectionTwist.Geometry;
using SectionTwist.Meshing;
using SectionTwist.Profiles;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Torsion;

/// <summary>
/// The solve on a uniform refinement by conjugate gradients with the two-grid cycle (coarse factorization reused,
/// start from the coarse solution interpolated) against the direct solve of the same system.
/// </summary>
public class TwoGridSolveTests
{
    private static (TorsionSolution Direct, TorsionSolution TwoGrid, ConjugateGradientOutcome Outcome) Both(string spec, double h, double tolerance)
    {
        var profile = ProfileTemplates.Create(spec);
        var area = profile.Regions.SelectMany(r => r.Loops).Select(l => Math.Abs(l.SignedArea)).ToArray();
        var coarseMesh = Mesher.Generate(profile, new MeshOptions { MaxEdgeLength = h, MaxArcAngleDegrees = 15 });
        var fineMesh = MeshRefinement.Uniform(coarseMesh);
        var coarse = TorsionSolver.Solve(coarseMesh, area, default, tolerance, keepFactor: true);
        Assert.NotNull(coarse.Factor);
        TorsionSolver.LastTwoGrid = null;
        var twoGrid = TorsionSolver.Solve(fineMesh, area, default, tolerance, parent: coarse);
        var outcome = TorsionSolver.LastTwoGrid;
        var direct = TorsionSolver.Solve(fineMesh, area, default, tolerance);
        Assert.NotNull(outcome);
        return (direct, twoGrid, new ConjugateGradientOutcome(outcome!.Value.Iterations, outcome.Value.Converged, outcome.Value.RelativeResidual));
    }

    internal readonly record struct ConjugateGradientOutcome(int Iterations, bool Converged, double Residual);

    [Theory]
    [InlineData("keyed:d=40,r=0.4", 0.0007)]
    [InlineData("tube:D=50,d=40", 0.0006)]
    public void Two_grid_solve_matches_the_direct_solve_in_few_iterations(string spec, double h)
    {
        var (direct, twoGrid, outcome) = Both(spec, h, 1e-11);
        Assert.True(outcome.Converged, $"{spec}: two-grid CG did not converge ({outcome})");
        // A mesh-independent cycle: the error falls by a fixed factor per iteration (Hackbusch 1985, ch. 10), so a
        // start from the coarse solution reaches 1e-11 in a few tens of iterations (common practice, no source).
        Assert.True(outcome.Iterations <= 40, $"{spec}: {outcome.Iterations} iterations");
        Assert.True(twoGrid.Residual <= 2e-11, $"{spec}: residual {twoGrid.Residual}");
        // J = u . f: the algebraic error enters squared, so the two solves agree far beyond the residual.
        Tol.Rel(direct.J, twoGrid.J, 1e-12, $"{spec}: J of the two-grid solve against the direct solve");
        Tol.Rel(direct.MaxGradient, twoGrid.MaxGradient, 1e-8, $"{spec}: peak gradient");
        for (int l = 0; l < direct.LoopValue.Length; l++) Tol.Rel(direct.LoopValue[l] + 1e-30, twoGrid.LoopValue[l] + 1e-30, 1e-9, "hole constant");
    }

    [Fact]
    public void Tube_by_two_grid_solve_gives_the_exact_J()
    {
        // Hollow circle: J = pi (D^4 - d^4) / 32 (Timoshenko and Goodier, Theory of Elasticity, 3rd ed., sec. 101).
        var (_, twoGrid, _) = Both("tube:D=50,d=40", 0.0006, 1e-11);
        Tol.Rel(Math.PI * (Math.Pow(0.050, 4) - Math.Pow(0.040, 4)) / 32, twoGrid.J, 1e-7, "tube J, exact");
    }

    [Fact]
    public void Prolongation_reproduces_quadratics_on_straight_elements()
    {
        // The refined 6-node space contains the coarse one: a quadratic polynomial is interpolated exactly (nested
        // spaces; common practice, no source). All nodes are taken as unknowns here.
        var profile = ProfileTemplates.Create("rect:b=30,h=10");
        var coarse = Mesher.Generate(profile, new MeshOptions { MaxEdgeLength = 0.004 });
        var fine = MeshRefinement.Uniform(coarse);
        int[] cd = Enumerable.Range(0, coarse.NodeCount).ToArray(), fd = Enumerable.Range(0, fine.NodeCount).ToArray();
        var p = NestedProlongation.Build(coarse, cd, coarse.NodeCount, fine, fd, fine.NodeCount, default);
        static double Q(double x, double y) => 3 + 2e2 * x - 5e2 * y + 4e4 * x * x - 7e4 * x * y + 1e4 * y * y;
        var uc = Enumerable.Range(0, coarse.NodeCount).Select(i => Q(coarse.X[i], coarse.Y[i])).ToArray();
        for (int i = 0; i < fine.NodeCount; i++)
        {
            double s = 0;
            for (int k = p.RowPtr[i]; k < p.RowPtr[i + 1]; k++) s += p.Values[k] * uc[p.ColIdx[k]];
            Assert.Equal(Q(fine.X[i], fine.Y[i]), s, 1e-9);
        }
    }
}
