using FsCheck.Xunit;
using SectionTwist.Geometry;
using SectionTwist.Meshing;

namespace SectionTwist.Tests.Meshing;

/// <summary>
/// Property-based checks (FsCheck drives the seeds; each seed builds one random simple polygon): the mesher never
/// throws on a valid profile and always meets the mesh invariants. The polygon families are simple by
/// construction: star-shaped (random radii about a kernel point, common practice for random simple polygons),
/// convex hulls of random points (Andrew's monotone chain), and orthogonal "skyline" polygons. Coarse meshes keep
/// each case to a few milliseconds.
/// </summary>
public class MesherPropertyTests
{
    private static void Check(Profile p, double h, bool angleCheck = true)
    {
        var m = Mesher.Generate(p, new MeshOptions { MaxEdgeLength = h });
        MeshAssert.Valid(m, p);
        bool straight = p.Loops.SelectMany(l => l.Segments).All(s => s is LineSegment);
        Tol.Rel(p.Properties.Area, MeshQuality.Area(m), straight ? 1e-11 : 1e-6, "exact profile area (Green's theorem)");
        // skinny triangles only close to small input angles (within a quarter of the part size)
        if (angleCheck) MeshAssert.MinAngle(m, 25, MeshAssert.SharpCorners(p), 0.25 * p.Bounds.Diagonal);
    }

    private static List<Point2> Star(Random rng, double rmin, int n)
    {
        var angles = Enumerable.Range(0, n).Select(i => (i + 0.15 + 0.7 * rng.NextDouble()) * 2 * Math.PI / n).ToArray();
        return angles.Select(a => new Point2(Math.Cos(a), Math.Sin(a)) * (rmin + (1 - rmin) * rng.NextDouble())).ToList();
    }

    [Property(MaxTest = 50)]
    public void Random_star_shaped_polygons_mesh_validly(int seed)
    {
        var rng = new Random(seed);
        var pts = Star(rng, 0.3, 3 + rng.Next(18));
        Check(new Profile([new Region(LoopBuilder.Polygon(pts))]), 0.3);
    }

    [Property(MaxTest = 50)]
    public void Random_star_shaped_polygons_with_a_hole_mesh_validly(int seed)
    {
        var rng = new Random(seed);
        var pts = Star(rng, 0.4, 5 + rng.Next(15));
        Loop hole = rng.Next(2) == 0
            ? LoopBuilder.Circle(new Point2(0.02 * rng.NextDouble(), 0), 0.1 + 0.15 * rng.NextDouble())
            : LoopBuilder.Polygon(Star(rng, 0.5, 3 + rng.Next(6)).Select(q => 0.25 * q));
        Check(new Profile([new Region(LoopBuilder.Polygon(pts), [hole])]), 0.3);
    }

    [Property(MaxTest = 50)]
    public void Random_convex_hulls_mesh_validly(int seed)
    {
        var rng = new Random(seed);
        var pts = Enumerable.Range(0, 4 + rng.Next(30)).Select(_ => new Point2(rng.NextDouble(), 0.2 + rng.NextDouble())).ToList();
        var hull = ConvexHull(pts);
        if (hull.Count < 3) return;
        Check(new Profile([new Region(LoopBuilder.Polygon(hull))]), 0.2);
    }

    [Property(MaxTest = 50)]
    public void Random_orthogonal_polygons_mesh_validly(int seed)
    {
        // skyline: columns of random integer heights on a unit base; all angles are 90 or 270 degrees
        var rng = new Random(seed);
        int n = 2 + rng.Next(8);
        var heights = Enumerable.Range(0, n).Select(_ => 1 + rng.Next(5)).ToArray();
        var pts = new List<Point2> { new(0, 0), new(n, 0) };
        for (int i = n - 1; i >= 0; i--)
        {
            pts.Add(new Point2(i + 1, heights[i]));
            pts.Add(new Point2(i, heights[i]));
        }
        // drop collinear repeats where neighbouring columns have the same height
        var clean = new List<Point2>();
        for (int i = 0; i < pts.Count; i++)
        {
            Point2 a = pts[(i + pts.Count - 1) % pts.Count], b = pts[i], c = pts[(i + 1) % pts.Count];
            if (b == c || Point2.Cross(b - a, c - b) != 0) clean.Add(b);
        }
        clean = clean.Where((q, i) => q != clean[(i + 1) % clean.Count]).ToList();
        var p = new Profile([new Region(LoopBuilder.Polygon(clean))]);
        Check(p, 0.7);
        // no small input angles here: the bound holds everywhere
        MeshAssert.MinAngle(Mesher.Generate(p, new MeshOptions { MaxEdgeLength = 0.7 }), 25);
    }

    private static List<Point2> ConvexHull(List<Point2> pts)
    {
        var s = pts.Distinct().OrderBy(q => q.X).ThenBy(q => q.Y).ToList();
        if (s.Count < 3) return s;
        var h = new List<Point2>();
        for (int pass = 0; pass < 2; pass++)
        {
            int start = h.Count;
            foreach (var q in s)
            {
                while (h.Count >= start + 2 && Point2.Cross(h[^1] - h[^2], q - h[^2]) <= 0) h.RemoveAt(h.Count - 1);
                h.Add(q);
            }
            h.RemoveAt(h.Count - 1);
            s.Reverse();
        }
        return h;
    }
}
