using SectionTwist.Meshing;
using SectionTwist.Profiles;
using SectionTwist.Sparse;
using SectionTwist.Torsion;
using SectionTwist.Warping;

namespace SectionTwist.Tests.Warping;

/// <summary>
/// The warping solve on a uniformly refined mesh by two-grid preconditioned conjugate gradients on the coarse solve's
/// factorization (used on meshes above SymbolicCholesky.NestedDissectionThreshold nodes) gives the same normalized warping function and
/// properties as the direct factorization of the fine system, to the iteration's tolerance: the two solve the same
/// discrete problem (psi fixed at a different node only shifts it by a constant, which the normalization removes).
/// </summary>
public class WarpingTwoGridTests
{
    [Theory]
    [InlineData("ipe:200")]
    [InlineData("lun:100x50x8")]
    [InlineData("hfrhs:100x50x4")]
    public void Two_grid_and_direct_fine_solves_agree(string spec)
    {
        var profile = ProfileTemplates.Create(spec);
        var centroid = profile.Properties.Centroid;
        var coarseMesh = Mesher.Generate(profile, new MeshOptions { MaxEdgeLength = Math.Sqrt(profile.Properties.Area) / 6 });
        var fineMesh = MeshRefinement.Uniform(coarseMesh);
        var coarse = WarpingSolver.Solve(coarseMesh, centroid, keepSolver: true)!;
        var direct = WarpingSolver.Solve(fineMesh, centroid)!;
        var twoGrid = WarpingSolver.Solve(fineMesh, centroid, parent: coarse, keepSolver: true, twoGridThreshold: 0)!;
        var used = Assert.IsType<TwoGridWithFallback>(twoGrid.Solver);
        Assert.False(used.UsedFallback, "the two-grid iteration converged without the direct fallback");
        string why = $"{spec}: same discrete problem, two-grid CG to relative residual {WarpingSolver.TwoGridTolerance:E0}";
        Tol.Rel(direct.WarpingConstant, twoGrid.WarpingConstant, 1e-8, why);
        Tol.Rel(direct.TorsionConstantUpper, twoGrid.TorsionConstantUpper, 1e-8, why);
        Tol.Rel(direct.MaxOmega, twoGrid.MaxOmega, 1e-8, why);
        Tol.Rel(direct.MaxShearFactor, twoGrid.MaxShearFactor, 1e-6, why);
        double size = Math.Sqrt(profile.Properties.Area);
        Tol.Abs(0, SectionTwist.Geometry.Point2.Distance(direct.ShearCentre, twoGrid.ShearCentre), 1e-9 * size, why);
        double worst = 0;
        for (int i = 0; i < direct.Omega.Length; i++) worst = Math.Max(worst, Math.Abs(direct.Omega[i] - twoGrid.Omega[i]));
        Assert.True(worst <= 1e-8 * direct.MaxOmega, $"{why}: largest nodal omega difference {worst:E2} m^2 against max |omega| {direct.MaxOmega:E3}");
    }

    // A mesh above the nested-dissection threshold (ipe:200 at 1e-6: about 80 000 fine nodes): the stress-function solve
    // with the shared matrix iterates as the plain analysis does, and the warping solve iterates on the coarse
    // factorization; J agrees with the plain analysis and the warping properties with a coarser analysis, within the
    // stated error estimates.
    [Fact]
    public void A_large_mesh_analysis_with_warping_matches_the_plain_analysis()
    {
        var profile = ProfileTemplates.Create("ipe:200");
        var plain = SectionAnalyzer.Analyze(profile, new AnalysisOptions { Accuracy = 1e-6 });
        var warped = SectionAnalyzer.Analyze(profile, new AnalysisOptions { Accuracy = 1e-6, Warping = true });
        Assert.True(warped.Mesh.Nodes > SymbolicCholesky.NestedDissectionThreshold, $"{warped.Mesh.Nodes} nodes: the two-grid path is not exercised");
        // the meshes may differ by a few elements (the size field of a refinement pass follows the coarse solution's
        // round-off), so J agrees within the two estimates, not to the digit
        double bound = (plain.EstimatedRelativeError.TorsionConstant + warped.EstimatedRelativeError.TorsionConstant) * plain.TorsionConstant;
        Tol.Abs(plain.TorsionConstant, warped.TorsionConstant, bound, "the plain analysis, within both error estimates");
        var coarse = SectionAnalyzer.Analyze(profile, new AnalysisOptions { Accuracy = 1e-4, Warping = true }).Warping!;
        var w = warped.Warping!;
        Assert.True(Math.Abs(w.WarpingConstant - coarse.WarpingConstant) <= coarse.EstimatedError.WarpingConstant + w.EstimatedError.WarpingConstant,
            $"Iw {w.WarpingConstant:E6} (1e-6) against {coarse.WarpingConstant:E6} (1e-4, est. {coarse.EstimatedError.WarpingConstant:E2})");
        Assert.True(Math.Abs(w.MaxSectorialCoordinate - coarse.MaxSectorialCoordinate) <= coarse.EstimatedError.MaxSectorialCoordinate + w.EstimatedError.MaxSectorialCoordinate,
            $"max |omega| {w.MaxSectorialCoordinate:E6} against {coarse.MaxSectorialCoordinate:E6}");
        Assert.True(w.TorsionConstantUpperBound >= warped.TorsionConstant * (1 - 1e-9), "the warping J stays an upper bound");
    }
}
