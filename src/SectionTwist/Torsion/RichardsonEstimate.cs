using SectionTwist.Meshing;

namespace SectionTwist.Torsion;

/// <summary>
/// The error of J from two solves, the second on the uniform refinement of the first, with the convergence order
/// taken element by element: Richardson extrapolation (Richardson 1911; Roache, Verification and Validation in
/// Computational Science and Engineering, 1998, ch. 5) applied to the parts of the difference that converge at
/// different rates.
/// <para>
/// For nested spaces the difference of the two torsion constants is the energy of the difference of the solutions,
/// J_f - J_c = a(u_f - u_c, u_f - u_c) (Galerkin orthogonality; J = a(u, u) is twice the complementary energy), a sum
/// of element terms. The part within two element layers of a corner converges at that corner's order p_c
/// (<see cref="CornerAnalysis.Order(double)"/>), the rest at order 4; each part's remaining error on the fine mesh is
/// its difference divided by 2^p - 1. Where the meshes are not nested (curved edges put new boundary nodes on the
/// true curve) the larger of |J_f - J_c| and the summed energy is split in the same proportions.
/// </para>
/// </summary>
internal static class RichardsonEstimate
{
    /// <summary>The result.</summary>
    /// <param name="Difference">J_f - J_c, m^4.</param>
    /// <param name="FineError">Estimated error of the fine J (before the safety factor), m^4, non-negative.</param>
    /// <param name="Correction">Extrapolation added to the fine J, m^4 (signed like the difference).</param>
    /// <param name="RegionCorrection">The correction of each region's J.</param>
    /// <param name="EffectiveOrder">The single order p with FineError = |difference| / (2^p - 1).</param>
    internal sealed record Result(double Difference, double FineError, double Correction, double[] RegionCorrection, double EffectiveOrder);

    // Reference coordinates (in the parent) of the six nodes of each child, in MeshRefinement.Uniform's order.
    private static readonly double[] ChildR =
    [
        0, 0.5, 0, 0.25, 0.25, 0,
        0.5, 1, 0.5, 0.75, 0.75, 0.5,
        0, 0.5, 0, 0.25, 0.25, 0,
        0.5, 0, 0.5, 0.25, 0.25, 0.5,
    ];
    private static readonly double[] ChildS =
    [
        0, 0, 0.5, 0, 0.25, 0.25,
        0, 0, 0.5, 0, 0.25, 0.25,
        0.5, 0.5, 1, 0.5, 0.75, 0.75,
        0.5, 0.5, 0, 0.5, 0.25, 0.25,
    ];

    /// <summary>Per-child interpolation weights: the parent's six shape functions at each of the 24 child nodes.</summary>
    internal static readonly double[] Weights = BuildWeights();

    private static double[] BuildWeights()
    {
        var w = new double[24 * 6];
        for (int k = 0; k < 24; k++) P2Triangle.Shape(ChildR[k], ChildS[k], w.AsSpan(6 * k, 6));
        return w;
    }

    /// <summary>Estimates the error of <paramref name="fine"/>, the solve on <c>MeshRefinement.Uniform(coarse.Mesh)</c>.</summary>
    public static Result Compute(TorsionSolution coarse, TorsionSolution fine, IReadOnlyList<CornerAnalysis.Corner> corners, CancellationToken ct = default)
    {
        var mc = coarse.Mesh;
        var mf = fine.Mesh;
        int ne = mc.ElementCount;
        if (mf.ElementCount != 4 * ne) throw new InvalidOperationException("the fine mesh is not the uniform refinement of the coarse one");
        var order = CornerZones.ElementOrders(mc, corners);
        int nr = coarse.RegionJ.Length;
        var energy = new double[nr];
        var weighted = new double[nr];
        double wMin = 1 / (Math.Pow(2, CornerAnalysis.LowestOrder(corners)) - 1);
        Span<double> xe = stackalloc double[6];
        Span<double> ye = stackalloc double[6];
        Span<double> ke = stackalloc double[36];
        Span<double> fe = stackalloc double[6];
        Span<double> d = stackalloc double[6];
        for (int e = 0; e < ne; e++)
        {
            if ((e & 4095) == 0) ct.ThrowIfCancellationRequested();
            double w = 1 / (Math.Pow(2, order[e]) - 1);
            int region = mc.ElementRegion[e];
            for (int c = 0; c < 4; c++)
            {
                int child = 4 * e + c;
                TorsionSolver.Gather(mf, child, xe, ye);
                for (int a = 0; a < 6; a++)
                {
                    var nw = Weights.AsSpan(6 * (6 * c + a), 6);
                    double uc = 0;
                    for (int b = 0; b < 6; b++) uc += nw[b] * coarse.Phi[mc.Elements[6 * e + b]];
                    d[a] = fine.Phi[mf.Elements[6 * child + a]] - uc;
                }
                TorsionSolver.ElementMatrices(xe, ye, ke, fe);
                double en = 0;
                for (int a = 0; a < 6; a++)
                {
                    double row = 0;
                    for (int b = 0; b < 6; b++) row += ke[6 * a + b] * d[b];
                    en += d[a] * row;
                }
                en = Math.Max(en, 0);
                energy[region] += en;
                weighted[region] += w * en;
            }
        }
        var regionCorrection = new double[nr];
        double fineError = 0, correction = 0;
        for (int r = 0; r < nr; r++)
        {
            double diff = fine.RegionJ[r] - coarse.RegionJ[r];
            double wEff = energy[r] > 0 ? weighted[r] / energy[r] : wMin;
            fineError += Math.Max(Math.Abs(diff), energy[r]) * wEff;
            regionCorrection[r] = diff * wEff;
            correction += regionCorrection[r];
        }
        double dj = fine.J - coarse.J;
        double pEff = fineError > 0 && dj != 0 ? Math.Log2(1 + Math.Abs(dj) / fineError) : CornerAnalysis.SmoothOrder;
        return new Result(dj, fineError, correction, regionCorrection, pEff);
    }
}
