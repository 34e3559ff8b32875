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

    [Fact]
    public void Restriction_that_keeps_the_node_order_only_drops_rows_and_columns()
    {
        var a = Small().ToCsc();
        int[] map = [0, -1, 1, 2]; // node 1 dropped, the others in order
        Assert.True(CscRestriction.OneToOne(map, 3));
        Assert.False(CscRestriction.OneToOne([1, -1, 0, 1], 2));
        var b = CscRestriction.Restrict(a, map, 3);
        double[,] expected = { { 4, 0, -2 }, { 0, 6, -3 }, { -2, -3, 7 } };
        var dense = new double[3, 3];
        for (int j = 0; j < 3; j++)
            for (int p = b.ColPtr[j]; p < b.ColPtr[j + 1]; p++)
            {
                if (p > b.ColPtr[j]) Assert.True(b.RowIdx[p - 1] < b.RowIdx[p], "rows sorted within a column");
                dense[b.RowIdx[p], j] = b.Values[p];
            }
        Assert.Equal(expected, dense);
    }

    // The analysis of a submatrix read from the whole matrix through the map must be the analysis of the formed
    // submatrix: the same order, tree and column counts, and a factorization that solves the submatrix's system.
    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void Analysis_of_a_submatrix_read_through_the_map_equals_the_analysis_of_the_formed_submatrix(bool shuffled)
    {
        var a = ReferenceProblems.RandomSpd(300, 6, 7);
        var rng = new Random(3);
        var map = new int[a.N];
        int n = 0;
        for (int i = 0; i < a.N; i++) map[i] = rng.NextDouble() < 0.2 ? -1 : n++;
        if (shuffled)
        {
            // unknowns numbered out of node order (still one node each)
            var relabel = Enumerable.Range(0, n).OrderBy(_ => rng.Next()).ToArray();
            for (int i = 0; i < a.N; i++) if (map[i] >= 0) map[i] = relabel[map[i]];
        }
        var order = CscRestriction.RestrictOrder(Amd.Order(a), map, n);
        var b = CscRestriction.Restrict(a, map, n);
        var formed = SymbolicCholesky.AnalyzeOrdered(b, order);
        var read = SymbolicCholesky.AnalyzeRestricted(a, map, n, order);
        Assert.Equal(formed.Perm, read.Perm);
        Assert.Equal(formed.Parent, read.Parent);
        Assert.Equal(formed.Lp, read.Lp);
        Assert.Equal(formed.Fp, read.Fp);
        Assert.Equal(formed.Fi, read.Fi);
        Assert.Equal(formed.PermutedValues(b), read.PermutedValues(a));
        var (x, rhs) = SparseTestUtil.Manufactured(b);
        var u = new double[n];
        SpdSolver.Factorize(read, a).Solve(rhs, u);
        Assert.True(b.RelativeResidual(u, rhs) < 1e-13);
        Assert.True(SparseTestUtil.RelativeError(u, x) < 1e-10);
        Assert.Throws<ArgumentException>(() => SymbolicCholesky.AnalyzeRestricted(a, Enumerable.Repeat(0, a.N).ToArray(), 1, [0]));
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
        Assert.True(shared.Residual < 1e-12, $"residual {shared.Residual:E2} of the direct solve");
        Tol.Rel(own.J, shared.J, 1e-11, Dsm);
        for (int i = 0; i < own.Phi.Length; i++) Tol.Abs(own.Phi[i], shared.Phi[i], 1e-11 * own.Phi.Max(Math.Abs), Dsm);
        var w1 = WarpingSolver.Solve(mesh, p.Properties.Centroid)!;
        var w2 = WarpingSolver.Solve(mesh, p.Properties.Centroid, default, shared.Laplacian)!;
        Tol.Rel(w1.WarpingConstant, w2.WarpingConstant, 1e-10, Dsm);
        Tol.Rel(w1.TorsionConstantUpper, w2.TorsionConstantUpper, 1e-10, Dsm);
    }
}
