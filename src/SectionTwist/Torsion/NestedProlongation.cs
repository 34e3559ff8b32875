using SectionTwist.Meshing;
using SectionTwist.Sparse.Amg;

namespace SectionTwist.Torsion;

/// <summary>
/// The interpolation from a 6-node mesh to its uniform refinement (<see cref="MeshRefinement.Uniform"/>) in the
/// unknowns of <see cref="TorsionSolver"/>: each fine unknown gets the coarse element's quadratic shape functions at its
/// place (the refined space contains the coarse one, so on straight-sided elements this is exact; on curved boundary
/// edges the new nodes sit on the true curve and the interpolation is the parent's polynomial there). Nodes of the
/// coarse mesh keep their numbers in the refinement, so they map one to one; a hole's constant maps to the hole's
/// constant; fixed outer-boundary nodes have no unknown.
/// </summary>
internal static class NestedProlongation
{
    /// <summary>Builds P (fine unknowns by coarse unknowns).</summary>
    public static CsrMatrix Build(Mesh coarse, int[] coarseDof, int coarseN, Mesh fine, int[] fineDof, int fineN, CancellationToken ct)
    {
        int nn = coarse.NodeCount;
        var rowPtr = new int[fineN + 1];
        var cols = new int[fineN * 6];
        var vals = new double[fineN * 6];
        var count = new int[fineN];
        var done = new bool[fineN];
        // coarse nodes (and hole constants): identity
        for (int i = 0; i < nn; i++)
        {
            int d = fineDof[i];
            if (d < 0 || done[d]) continue;
            done[d] = true;
            if (coarseDof[i] >= 0) { cols[6 * d] = coarseDof[i]; vals[6 * d] = 1; count[d] = 1; }
        }
        var w = RichardsonEstimate.Weights;
        for (int e = 0; e < coarse.ElementCount; e++)
        {
            if ((e & 4095) == 0) ct.ThrowIfCancellationRequested();
            for (int c = 0; c < 4; c++)
                for (int a = 0; a < 6; a++)
                {
                    int node = fine.Elements[6 * (4 * e + c) + a];
                    int d = fineDof[node];
                    if (node < nn || d < 0 || done[d]) continue;
                    done[d] = true;
                    for (int b = 0; b < 6; b++)
                    {
                        int cd = coarseDof[coarse.Elements[6 * e + b]];
                        double wb = w[6 * (6 * c + a) + b];
                        if (cd < 0 || wb == 0) continue;
                        int k = 0;
                        while (k < count[d] && cols[6 * d + k] != cd) k++;
                        if (k == count[d]) { cols[6 * d + k] = cd; count[d]++; }
                        vals[6 * d + k] += wb;
                    }
                }
        }
        for (int i = 0; i < fineN; i++) rowPtr[i + 1] = rowPtr[i] + count[i];
        var ci = new int[rowPtr[fineN]];
        var v = new double[rowPtr[fineN]];
        for (int i = 0; i < fineN; i++)
        {
            Array.Copy(cols, 6 * i, ci, rowPtr[i], count[i]);
            Array.Copy(vals, 6 * i, v, rowPtr[i], count[i]);
        }
        return new CsrMatrix(fineN, coarseN, rowPtr, ci, v);
    }
}
