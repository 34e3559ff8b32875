using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// Finds entities far away from the rest of the drawing, so that one stray construction line does not set the size
/// that the snap and curve tolerances scale with. Robust statistics (median centre, median reach; see Huber and
/// Ronchetti, Robust Statistics, 2nd ed., 2009, ch. 1 and 5, for the median as a location and scale estimate with a
/// 50 % breakdown point): the reach of a curve is how far its box extends from the median centre (largest coordinate
/// difference); a curve whose reach exceeds <see cref="Factor"/> times the median reach is far.
/// </summary>
internal static class StrayEntities
{
    /// <summary>How many median reaches away a curve must extend to count as far (common practice, no source).</summary>
    public const double Factor = 1000;

    /// <summary>Splits the curves into the core and the far ones; the core's box is the drawing's extent.</summary>
    public static (List<SourcedCurve> Core, List<SourcedCurve> Far, Box2 Extent) Split(List<SourcedCurve> curves)
    {
        var box = Box2.Empty;
        foreach (var c in curves) box = box.Union(c.Bounds);
        if (curves.Count < 3) return (curves, [], box);
        int n = curves.Count;
        var bounds = new Box2[n];
        var xs = new double[n];
        var ys = new double[n];
        for (int i = 0; i < n; i++)
        {
            bounds[i] = curves[i].Bounds;
            xs[i] = bounds[i].Center.X;
            ys[i] = bounds[i].Center.Y;
        }
        double mx = Median(xs), my = Median(ys);
        var reach = new double[n];
        for (int i = 0; i < n; i++)
        {
            var b = bounds[i];
            reach[i] = Math.Max(Math.Max(Math.Abs(b.MinX - mx), Math.Abs(b.MaxX - mx)), Math.Max(Math.Abs(b.MinY - my), Math.Abs(b.MaxY - my)));
        }
        double r = Median((double[])reach.Clone());
        if (!(r > 0)) r = reach.Max();
        if (!(r > 0)) return (curves, [], box);
        var core = new List<SourcedCurve>(n);
        var far = new List<SourcedCurve>();
        var extent = Box2.Empty;
        for (int i = 0; i < n; i++)
        {
            if (reach[i] > Factor * r) { far.Add(curves[i]); continue; }
            core.Add(curves[i]);
            extent = extent.Union(bounds[i]);
        }
        return far.Count == 0 ? (curves, [], box) : (core, far, extent);
    }

    private static double Median(double[] v)
    {
        Array.Sort(v);
        int n = v.Length;
        return n % 2 == 1 ? v[n / 2] : 0.5 * (v[n / 2 - 1] + v[n / 2]);
    }
}
