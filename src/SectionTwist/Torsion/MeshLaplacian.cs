using SectionTwist.Meshing;
using SectionTwist.Sparse;

namespace SectionTwist.Torsion;

/// <summary>
/// The Laplacian stiffness matrix K_ab = integral(grad N_a . grad N_b) of one 6-node mesh over all its nodes, assembled
/// once, with one fill-reducing order of all nodes, shared by the two problems solved on the mesh: the Prandtl stress
/// function (Dirichlet: boundary nodes dropped, the nodes of each hole merged into one unknown) and the warping function
/// (Neumann: one node fixed). Both systems are restrictions of K (<see cref="CscRestriction"/>), and the order of each
/// is the restriction of the shared order, so the second problem needs neither an assembly of the matrix nor an
/// ordering of its own; only the numeric factorization differs (Davis, Direct Methods for Sparse Linear Systems, SIAM
/// 2006, ch. 4 and 7: a symbolic analysis reused for matrices of the same pattern; here of a contained pattern).
/// </summary>
internal sealed class MeshLaplacian
{
    private int[]? _order;

    private MeshLaplacian(Mesh mesh, CscMatrix k)
    {
        Mesh = mesh;
        Matrix = k;
    }

    /// <summary>The mesh.</summary>
    public Mesh Mesh { get; }

    /// <summary>K over all nodes (singular: constants are in its null space).</summary>
    public CscMatrix Matrix { get; }

    /// <summary>Assembles K; the element loads int(2 N_a) of the stress-function problem go to <paramref name="elementLoad"/> (6 per element).</summary>
    public static MeshLaplacian Assemble(Mesh mesh, double[] elementLoad, CancellationToken ct)
    {
        int nEl = mesh.ElementCount;
        var asm = new ElementAssembler(mesh.NodeCount, mesh.Elements, 6);
        Span<double> ke = stackalloc double[36];
        Span<double> fe = stackalloc double[6];
        Span<double> xe = stackalloc double[6];
        Span<double> ye = stackalloc double[6];
        for (int e = 0; e < nEl; e++)
        {
            if ((e & 4095) == 0) ct.ThrowIfCancellationRequested();
            TorsionSolver.Gather(mesh, e, xe, ye);
            TorsionSolver.ElementMatrices(xe, ye, ke, fe);
            fe.CopyTo(elementLoad.AsSpan(6 * e, 6));
            asm.Add(e, ke);
        }
        return new MeshLaplacian(mesh, asm.ToCsc());
    }

    /// <summary>
    /// The fill-reducing order of all nodes (approximate minimum degree or nested dissection by size, as
    /// <see cref="SymbolicCholesky.Analyze"/> picks), computed on first use.
    /// </summary>
    public int[] Order(CancellationToken ct)
    {
        if (_order is null)
        {
            int n = Matrix.N;
            _order = n > SymbolicCholesky.NestedDissectionThreshold ? NestedDissection.Order(Matrix, null, ct) : Amd.Order(Matrix, ct);
        }
        return _order;
    }

    /// <summary>The node eliminated last by <see cref="Order"/>: fixing it for the Neumann problem keeps the order valid.</summary>
    public int LastNode(CancellationToken ct) => Order(ct)[^1];

    /// <summary>
    /// The restricted system P' K P for the unknown map <paramref name="map"/> (node to unknown, -1 dropped) and a solver
    /// for it: a factorization with the restricted shared order, or the solver <see cref="SpdSolver.Create(CscMatrix, double, CancellationToken)"/>
    /// picks for large systems (multigrid-CG needs no order). When each unknown is one node the factorization reads
    /// K itself (<see cref="SymbolicCholesky.AnalyzeRestricted"/>) and the restricted matrix is not formed: Matrix is
    /// then null (<see cref="RelativeResidual"/> serves instead).
    /// </summary>
    public (CscMatrix? Matrix, ISpdSolver Solver) System(int[] map, int n, double tolerance, CancellationToken ct)
    {
        if (n <= SpdSolver.IterativeThreshold && CscRestriction.OneToOne(map, n))
        {
            var s = SymbolicCholesky.AnalyzeRestricted(Matrix, map, n, CscRestriction.RestrictOrder(Order(ct), map, n), ct);
            return (null, SpdSolver.Factorize(s, Matrix, ct));
        }
        var a = CscRestriction.Restrict(Matrix, map, n, ct);
        if (n > SpdSolver.IterativeThreshold) return (a, SpdSolver.Create(a, tolerance, ct));
        var symbolic = SymbolicCholesky.AnalyzeOrdered(a, CscRestriction.RestrictOrder(Order(ct), map, n), ct);
        return (a, SpdSolver.Factorize(symbolic, a, ct));
    }

    /// <summary>
    /// ||f - P' K P u||_2 / ||f||_2 for the unknowns <paramref name="u"/> of <paramref name="map"/>, from K (the same
    /// sums, in the same order, as the restricted matrix's <see cref="CscMatrix.RelativeResidual"/> when the map keeps
    /// the node order and merges nothing).
    /// </summary>
    public double RelativeResidual(int[] map, int n, ReadOnlySpan<double> u, ReadOnlySpan<double> f)
    {
        int nn = Matrix.N;
        var x = new double[nn];
        for (int i = 0; i < nn; i++) x[i] = map[i] < 0 ? 0 : u[map[i]];
        var y = new double[nn];
        Matrix.Multiply(x, y);
        var ax = new double[n];
        for (int i = 0; i < nn; i++) if (map[i] >= 0) ax[map[i]] += y[i];
        double r = 0, nb = 0;
        for (int i = 0; i < n; i++) { double d = f[i] - ax[i]; r += d * d; nb += f[i] * f[i]; }
        return nb == 0 ? Math.Sqrt(r) : Math.Sqrt(r / nb);
    }
}
