using SectionTwist.Meshing;
using SectionTwist.Profiles;
using SectionTwist.Sparse;
using SectionTwist.Torsion;
using SectionTwist.Warping;

namespace SectionTwist.Tests.Sparse;

/// <summary>
/// The matrix shared by the stress-function and warping solves: a restriction of the all-node Laplacian must equal the
/// directly assembled system (direct-stiffness method: assembling then dropping or merging unknowns is the same as
/// assembling the reduced unknowns; Zienkiewicz and Taylor, The Finite Element Method, vol. 1, ch. 1), and the results
/// with the shared matrix and order must equal those of separate solves to rounding.
/// </summary>
public class CscRestrictionTests
{
    private const string Dsm = "direct-stiffness assembly (Zienkiewicz and Taylor vol. 1 ch. 1): restriction equals reduced assembly";

    private static TripletMatrix Small()
    {
        // 4 x 4 symmetric: a path graph 0-1-2-3 plus the pair (0, 3)
        var t = new TripletMatrix(4);
        double[,] k = { { 4, -1, 0, -2 }, { -1, 5, -1, 0 }, { 0, -1, 6, -3 }, { -2, 0, -3, 7 } };
        for (int i = 0; i < 4; i++) for (int j = 0; j < 4; j++) if (k[i, j] != 0) t.Add(i, j, k[i, j]);
        return t;
    }

    [Fact]
    public void Restriction_drops_and_merges_unknowns_like_P_transpose_A_P()
    {
        var a = Small().ToCsc();
        // node 1 dropped; nodes 0 and 3 merged into unknown 1, node 2 is unknown 0
        int[] map = [1, -1, 0, 1];
        var b = CscRestriction.Restrict(a, map, 2);
        // P' A P by hand: (0,0) = A22 = 6; (0,1) = A20 + A23 = -3; (1,1) = A00 + A03 + A30 + A33 = 4 - 2 - 2 + 7 = 7
        double[,] expected = { { 6, -3 }, { -3, 7 } };
        for (int j = 0; j < 2; j++)
        {
            Assert.Equal(2, b.ColPtr[j + 1] - b.ColPtr[j]);
            for (int p = b.ColPtr[j]; p < b.ColPtr[j + 1]; p++) Assert.Equal(expected[b.RowIdx[p], j], b.Values[p]);
            Assert.True(b.RowIdx[b.ColPtr[j]] < b.RowIdx[b.ColPtr[j] + 1], "rows sorted within a column");
        }
        // order 3, 2, 1, 0: node 1 leaves; unknown 1 (nodes 3 and 0) takes the place of node 0, the last of them
        Assert.Equal([0, 1], CscRestriction.RestrictOrder([3, 2, 1, 0], map, 2));
    }

    // A square tube has a hole (merged unknowns) and an outer boundary (dropped unknowns); an I-section has neither hole
    // nor curve: the shared path must give the same J to rounding.
    [Theory]
    [InlineData("shs:B=60,t=5")]
    [InlineData("ipe:120")]
    public void Shared_matrix_gives_the_same_stress_function_solution(string spec)
    {
        var p = ProfileTemplates.Create(spec);
        var mesh = Mesher.Generate(p, new MeshOptions { MaxEdgeLength = 0.004 });
        var holes = p.Regions.SelectMany(r => r.Loops).Select(l => Math.Abs(l.SignedArea)).ToArray();
        var own = TorsionSolver.Solve(mesh, holes);
        var shared = TorsionSolver.Solve(mesh, holes, default, SpdSolver.DefaultTolerance, shareLaplacian: true);
        Assert.NotNull(shared.Laplacian);
        Tol.Rel(own.J, shared.J, 1e-11, Dsm);
        for (int i = 0; i < own.Phi.Length; i++) Tol.Abs(own.Phi[i], shared.Phi[i], 1e-11 * own.Phi.Max(Math.Abs), Dsm);
        var w1 = WarpingSolver.Solve(mesh, p.Properties.Centroid)!;
        var w2 = WarpingSolver.Solve(mesh, p.Properties.Centroid, default, shared.Laplacian)!;
        Tol.Rel(w1.WarpingConstant, w2.WarpingConstant, 1e-10, Dsm);
        Tol.Rel(w1.TorsionConstantUpper, w2.TorsionConstantUpper, 1e-10, Dsm);
    }
}
