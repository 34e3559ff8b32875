using SectionTwist.Geometry;
using SectionTwist.Meshing;
using SectionTwist.Sparse;

namespace SectionTwist.Torsion;

/// <summary>
/// Finite-element solve of the Prandtl stress-function problem on one mesh (Timoshenko and Goodier, Theory of
/// Elasticity, 3rd ed., sec. 101 and 115): Laplacian(phi) = -2 for G theta = 1; phi = 0 on each region's outer boundary;
/// phi = unknown constant c_k on hole k, fixed by the circulation condition integral(d phi/dn ds) = 2 A_k, which enters the
/// weak form as one extra unknown per hole with load 2 A_k. Then J = 2 integral(phi dA) + 2 sum(c_k A_k) = u . f.
/// </summary>
internal static class TorsionSolver
{
    /// <summary>Fine unknowns from which the solve on a uniform refinement uses the two-grid iteration (<see cref="TwoGridSolver"/>).</summary>
    internal static int TwoGridThreshold { get; set; } = 20_000;

    /// <summary>
    /// Solves on <paramref name="mesh"/>; <paramref name="holeArea"/> gives the exact area enclosed by each loop (used for
    /// holes); <paramref name="tolerance"/> is the relative residual asked of an iterative linear solve. With
    /// <paramref name="shareLaplacian"/> the matrix is assembled over all nodes and kept with its fill-reducing order
    /// (<see cref="TorsionSolution.Laplacian"/>) for the warping solve on the same mesh.
    /// <paramref name="keepFactor"/> keeps a direct factorization on the solution (<see cref="TorsionSolution.Factor"/>)
    /// for the solve on its uniform refinement; <paramref name="parent"/> is that coarser solution when
    /// <paramref name="mesh"/> is its refinement: the solve then iterates with the two-grid cycle from the parent's
    /// solution interpolated instead of factorizing (the direct solver remains the fallback of a stalled iteration).
    /// </summary>
    public static TorsionSolution Solve(Mesh mesh, double[] holeArea, CancellationToken ct = default, double tolerance = SpdSolver.DefaultTolerance,
        bool shareLaplacian = false, bool keepFactor = false, TorsionSolution? parent = null)
    {
        int nNodes = mesh.NodeCount, nEl = mesh.ElementCount;
        var loops = mesh.Loops;
        // DOF map: outer-boundary nodes fixed (-1); all nodes on hole k share one DOF; interior nodes one each.
        var dof = new int[nNodes];
        var holeDof = new int[loops.Length];
        int nd = 0;
        for (int l = 0; l < loops.Length; l++) holeDof[l] = loops[l].IsHole ? nd++ : -1;
        for (int i = 0; i < nNodes; i++)
        {
            int l = mesh.NodeLoop[i];
            dof[i] = l < 0 ? nd++ : holeDof[l];
        }
        int n = nd;
        var f = new double[n];
        for (int l = 0; l < loops.Length; l++) if (holeDof[l] >= 0) f[holeDof[l]] += 2 * holeArea[l];

        Span<double> xe = stackalloc double[6];
        Span<double> ye = stackalloc double[6];
        MeshLaplacian? laplacian = null;
        // With the matrix shared for the warping solve, its order of all nodes is computed anyway while that is an
        // approximate minimum degree order, and factorizing with it is cheaper than iterating; above
        // SymbolicCholesky.NestedDissectionThreshold nodes the nested-dissection order alone costs more than the
        // iteration, and the warping solve iterates too (WarpingSolver), so the order is never computed.
        bool twoGrid = parent?.Factor is not null && n >= TwoGridThreshold
            && (!shareLaplacian || nNodes > SymbolicCholesky.NestedDissectionThreshold);
        CscMatrix? k;
        ISpdSolver? solver = null;
        if (shareLaplacian)
        {
            var load = new double[6 * nEl];
            laplacian = MeshLaplacian.Assemble(mesh, load, ct);
            for (int q = 0; q < load.Length; q++)
            {
                int d = dof[mesh.Elements[q]];
                if (d >= 0) f[d] += load[q];
            }
            if (n > 0 && twoGrid) k = CscRestriction.Restrict(laplacian.Matrix, dof, n, ct);
            else if (n > 0) (k, solver) = laplacian.System(dof, n, tolerance, ct);
            else k = new CscMatrix(0, [0], [], []);
        }
        else
        {
            k = AssembleReduced(mesh, dof, n, f, ct);
            if (n > 0 && !twoGrid) solver = SpdSolver.Create(k, tolerance, ct);
        }
        var u = new double[n];
        ISpdSolver? kept = null;
        if (n > 0 && twoGrid)
        {
            var pf = parent!.Factor!;
            var p = NestedProlongation.Build(parent.Mesh, pf.Dof, pf.N, mesh, dof, n, ct);
            var tg = new TwoGridSolver(k!, p, pf.Solver, tolerance, ct);
            var uc = new double[pf.N];
            for (int i = 0; i < parent.Mesh.NodeCount; i++) if (pf.Dof[i] >= 0) uc[pf.Dof[i]] = parent.Phi[i];
            var x0 = new double[n];
            tg.Prolong(uc, x0);
            tg.Initial = x0;
            tg.Solve(f, u);
            LastTwoGrid = tg.LastOutcome;
            if (!tg.LastOutcome.Converged) SpdSolver.CreateDirect(k!, ct).Solve(f, u);
        }
        else
        {
            solver?.Solve(f, u);
            if (keepFactor && solver is not null and not SpdSolver.IterativeWithFallback) kept = solver;
        }
        double residual = n == 0 ? 0 : k is not null ? k.RelativeResidual(u, f) : laplacian!.RelativeResidual(dof, n, u, f);

        var phi = new double[nNodes];
        for (int i = 0; i < nNodes; i++) phi[i] = dof[i] < 0 ? 0 : u[dof[i]];
        var loopValue = new double[loops.Length];
        for (int l = 0; l < loops.Length; l++) loopValue[l] = holeDof[l] >= 0 ? u[holeDof[l]] : 0;

        // J per region: 2 int(phi) over the region's elements + 2 c_k A_k for its holes.
        var regionJ = new double[loops.Max(l => l.Region) + 1];
        for (int e = 0; e < nEl; e++)
        {
            Gather(mesh, e, xe, ye);
            double integral = IntegratePhi(mesh, e, xe, ye, phi);
            regionJ[mesh.ElementRegion[e]] += 2 * integral;
        }
        for (int l = 0; l < loops.Length; l++) if (loops[l].IsHole) regionJ[loops[l].Region] += 2 * loopValue[l] * holeArea[l];
        double j = regionJ.Sum();

        var raw = BoundaryFluxRecovery.Recover(mesh, phi);
        var (flux, maxG, where) = BoundaryFluxRecovery.Smooth(mesh, raw);
        return new TorsionSolution
        {
            Mesh = mesh, Phi = phi, LoopValue = loopValue, J = j, RegionJ = regionJ, BoundaryFlux = flux,
            MaxGradient = maxG, MaxGradientLocation = where, Residual = residual, Laplacian = laplacian,
            Factor = kept is null ? null : new TorsionSolution.Factorization(dof, n, kept),
        };
    }

    /// <summary>How the last two-grid solve on this thread ended (for tests and benchmarks).</summary>
    [ThreadStatic] internal static ConjugateGradient.Outcome? LastTwoGrid;

    /// <summary>
    /// Assembles the matrix of the unknowns <paramref name="dof"/> directly (Dirichlet nodes dropped, hole nodes merged) and
    /// adds the loads to <paramref name="f"/>; with <paramref name="elementWeight"/> each element's stiffness (not its load)
    /// is scaled by its weight (the composite section's G_ref / G_e).
    /// </summary>
    internal static CscMatrix AssembleReduced(Mesh mesh, int[] dof, int n, double[] f, CancellationToken ct, Func<int, double>? elementWeight = null)
    {
        int nEl = mesh.ElementCount;
        var elementDofs = new int[6 * nEl];
        for (int i = 0; i < elementDofs.Length; i++) elementDofs[i] = dof[mesh.Elements[i]];
        var asm = new ElementAssembler(n, elementDofs, 6);
        Span<double> ke = stackalloc double[36];
        Span<double> fe = stackalloc double[6];
        Span<double> xe = stackalloc double[6];
        Span<double> ye = stackalloc double[6];
        for (int e = 0; e < nEl; e++)
        {
            if ((e & 4095) == 0) ct.ThrowIfCancellationRequested();
            Gather(mesh, e, xe, ye);
            ElementMatrices(xe, ye, ke, fe);
            for (int a = 0; a < 6; a++)
            {
                int da = elementDofs[6 * e + a];
                if (da >= 0) f[da] += fe[a];
            }
            asm.Add(e, ke, elementWeight?.Invoke(e) ?? 1);
        }
        return asm.ToCsc();
    }

    internal static void Gather(Mesh mesh, int e, Span<double> xe, Span<double> ye)
    {
        for (int a = 0; a < 6; a++) { int nd = mesh.Elements[6 * e + a]; xe[a] = mesh.X[nd]; ye[a] = mesh.Y[nd]; }
    }

    /// <summary>Element stiffness int(grad Na . grad Nb) and load int(2 Na) for the 6-node triangle.</summary>
    internal static void ElementMatrices(ReadOnlySpan<double> xe, ReadOnlySpan<double> ye, Span<double> ke, Span<double> fe)
    {
        var rule = P2Triangle.IsStraight(xe, ye) ? P2Triangle.Degree2 : P2Triangle.Degree5;
        ke.Clear(); fe.Clear();
        Span<double> dx = stackalloc double[6];
        Span<double> dy = stackalloc double[6];
        for (int q = 0; q < rule.Count; q++)
        {
            double det = P2Triangle.Gradients(rule, q, xe, ye, dx, dy);
            double w = rule.W[q] * det;
            var nq = rule.N.AsSpan(q * 6, 6);
            for (int a = 0; a < 6; a++)
            {
                fe[a] += 2 * w * nq[a];
                double ax = w * dx[a], ay = w * dy[a];
                for (int b = a; b < 6; b++) ke[6 * a + b] += ax * dx[b] + ay * dy[b];
            }
        }
        for (int a = 0; a < 6; a++) for (int b = 0; b < a; b++) ke[6 * a + b] = ke[6 * b + a];
    }

    private static double IntegratePhi(Mesh mesh, int e, ReadOnlySpan<double> xe, ReadOnlySpan<double> ye, double[] phi)
    {
        var rule = P2Triangle.IsStraight(xe, ye) ? P2Triangle.Degree2 : P2Triangle.Degree5;
        Span<double> dx = stackalloc double[6];
        Span<double> dy = stackalloc double[6];
        double s = 0;
        for (int q = 0; q < rule.Count; q++)
        {
            double det = P2Triangle.Gradients(rule, q, xe, ye, dx, dy);
            var nq = rule.N.AsSpan(q * 6, 6);
            double v = 0;
            for (int a = 0; a < 6; a++) v += nq[a] * phi[mesh.Elements[6 * e + a]];
            s += rule.W[q] * det * v;
        }
        return s;
    }
}
