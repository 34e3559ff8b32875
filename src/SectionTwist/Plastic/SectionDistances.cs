using SectionTwist.Geometry;
using SectionTwist.Meshing;

namespace SectionTwist.Plastic;

/// <summary>
/// Distances from points of a meshed section to the boundary loops of their own region: to the outer loop and to each
/// hole. They build the obstacle of the elastic-plastic problem and the fully plastic stress function (the sand heap).
/// Holes are numbered globally in mesh-loop order; a hole of another region is at infinite distance.
/// </summary>
internal sealed class SectionDistances
{
    private readonly LoopDistance[] _loops;

    public SectionDistances(Mesh mesh)
    {
        Loops = mesh.Loops;
        _loops = Loops.Select(l => new LoopDistance(l.Geometry)).ToArray();
        OuterOf = new int[Loops.Max(l => l.Region) + 1];
        for (int l = 0; l < Loops.Length; l++) if (!Loops[l].IsHole) OuterOf[Loops[l].Region] = l;
        HoleLoops = Enumerable.Range(0, Loops.Length).Where(l => Loops[l].IsHole).ToArray();
        HoleOfLoop = new int[Loops.Length];
        Array.Fill(HoleOfLoop, -1);
        for (int k = 0; k < HoleLoops.Length; k++) HoleOfLoop[HoleLoops[k]] = k;
    }

    /// <summary>The mesh loops.</summary>
    public MeshLoop[] Loops { get; }
    /// <summary>Loop index of each region's outer loop.</summary>
    public int[] OuterOf { get; }
    /// <summary>Loop index of each hole (global hole numbering).</summary>
    public int[] HoleLoops { get; }
    /// <summary>Global hole number of each loop, -1 for outer loops.</summary>
    public int[] HoleOfLoop { get; }
    /// <summary>Number of holes.</summary>
    public int HoleCount => HoleLoops.Length;

    /// <summary>Distance from <paramref name="p"/> (in region <paramref name="region"/>) to the region's outer loop.</summary>
    public double ToOuter(Point2 p, int region) => _loops[OuterOf[region]].To(p);

    /// <summary>Distance from <paramref name="p"/> (in region <paramref name="region"/>) to hole <paramref name="k"/>; infinite for another region's hole.</summary>
    public double ToHole(Point2 p, int region, int k) =>
        Loops[HoleLoops[k]].Region == region ? _loops[HoleLoops[k]].To(p) : double.PositiveInfinity;

    /// <summary>
    /// Gaps between loops on a fine polygon of each hole: <c>OuterGap[k]</c> = nearest distance from hole k to its
    /// region's outer loop, <c>HoleGap[j, k]</c> = nearest distance from hole k to hole j (infinite across regions).
    /// With |grad phi| &lt;= tau_y along straight paths they bound the hole constants: c_k &lt;= tau_y OuterGap[k] and
    /// |c_k - c_j| &lt;= tau_y HoleGap[j, k].
    /// </summary>
    public (double[] OuterGap, double[,] HoleGap) Gaps(CancellationToken ct = default)
    {
        int n = HoleCount;
        var outer = new double[n];
        var gap = new double[n, n];
        for (int k = 0; k < n; k++)
        {
            outer[k] = double.PositiveInfinity;
            for (int j = 0; j < n; j++) gap[j, k] = double.PositiveInfinity;
            var loop = Loops[HoleLoops[k]];
            double diag = loop.Geometry.Bounds.Diagonal;
            foreach (var seg in loop.Geometry.Segments)
            {
                ct.ThrowIfCancellationRequested();
                foreach (var p in seg.Flatten(1e-6 * diag, diag / 400))
                {
                    outer[k] = Math.Min(outer[k], ToOuter(p, loop.Region));
                    for (int j = 0; j < n; j++) if (j != k) gap[j, k] = Math.Min(gap[j, k], ToHole(p, loop.Region, j));
                }
            }
        }
        return (outer, gap);
    }

    /// <summary>The interval allowed for hole k's constant given the others (see <see cref="Gaps"/>).</summary>
    public static (double Lo, double Hi) HoleRange(int k, ReadOnlySpan<double> c, double[] outerGap, double[,] holeGap)
    {
        double lo = 0, hi = outerGap[k];
        for (int j = 0; j < c.Length; j++)
        {
            if (j == k || double.IsInfinity(holeGap[j, k])) continue;
            hi = Math.Min(hi, c[j] + holeGap[j, k]);
            lo = Math.Max(lo, c[j] - holeGap[j, k]);
        }
        return (lo, Math.Max(lo, hi));
    }
}
