using SectionTwist.Geometry;
using SectionTwist.Meshing;

namespace SectionTwist.Tests.Torsion;

/// <summary>Structured 6-node meshes built directly (independent of the triangulator) for solver tests.</summary>
internal static class TestMeshes
{
    /// <summary>Rectangle [0,a] x [0,b] cut into nx x ny squares, each split into two triangles.</summary>
    public static (Mesh Mesh, Profile Profile) Rectangle(double a, double b, int nx, int ny)
    {
        var loop = LoopBuilder.Polygon([new(0, 0), new(a, 0), new(a, b), new(0, b)]);
        var profile = new Profile([new Region(loop)]);
        int px = 2 * nx + 1, py = 2 * ny + 1;
        var x = new double[px * py]; var y = new double[px * py];
        for (int j = 0; j < py; j++) for (int i = 0; i < px; i++) { x[j * px + i] = a * i / (px - 1); y[j * px + i] = b * j / (py - 1); }
        int Id(int i, int j) => j * px + i;
        var el = new List<int>();
        for (int j = 0; j < ny; j++)
            for (int i = 0; i < nx; i++)
            {
                int i0 = 2 * i, j0 = 2 * j;
                // lower-right triangle (i0,j0) (i0+2,j0) (i0+2,j0+2)
                el.AddRange([Id(i0, j0), Id(i0 + 2, j0), Id(i0 + 2, j0 + 2), Id(i0 + 1, j0), Id(i0 + 2, j0 + 1), Id(i0 + 1, j0 + 1)]);
                // upper-left triangle (i0,j0) (i0+2,j0+2) (i0,j0+2)
                el.AddRange([Id(i0, j0), Id(i0 + 2, j0 + 2), Id(i0, j0 + 2), Id(i0 + 1, j0 + 1), Id(i0 + 1, j0 + 2), Id(i0, j0 + 1)]);
            }
        var edges = new List<MeshBoundaryEdge>();
        var segs = profile.Regions[0].Outer.Segments;
        // walk the boundary counter-clockwise: bottom, right, top, left
        for (int i = 0; i < nx; i++) edges.Add(new(Id(2 * i, 0), Id(2 * i + 1, 0), Id(2 * i + 2, 0), 0, segs[0], (double)i / nx, (double)(i + 1) / nx));
        for (int j = 0; j < ny; j++) edges.Add(new(Id(px - 1, 2 * j), Id(px - 1, 2 * j + 1), Id(px - 1, 2 * j + 2), 0, segs[1], (double)j / ny, (double)(j + 1) / ny));
        for (int i = nx; i > 0; i--) edges.Add(new(Id(2 * i, py - 1), Id(2 * i - 1, py - 1), Id(2 * i - 2, py - 1), 0, segs[2], (double)(nx - i) / nx, (double)(nx - i + 1) / nx));
        for (int j = ny; j > 0; j--) edges.Add(new(Id(0, 2 * j), Id(0, 2 * j - 1), Id(0, 2 * j - 2), 0, segs[3], (double)(ny - j) / ny, (double)(ny - j + 1) / ny));
        var mesh = new Mesh(x, y, el.ToArray(), new int[el.Count / 6], edges.ToArray(), [new MeshLoop(0, -1, profile.Regions[0].Outer)]);
        return (mesh, profile);
    }

    /// <summary>Annulus (outer radius ro, inner ri) on a polar lattice of nr x nt cells; curved isoparametric elements.</summary>
    public static (Mesh Mesh, Profile Profile) Annulus(double ro, double ri, int nr, int nt)
    {
        var outer = LoopBuilder.Circle(default, ro);
        var inner = LoopBuilder.Circle(default, ri);
        var profile = new Profile([new Region(outer, [inner])]);
        int pr = 2 * nr + 1, pt = 2 * nt;
        var x = new double[pr * pt]; var y = new double[pr * pt];
        for (int k = 0; k < pt; k++)
            for (int i = 0; i < pr; i++)
            {
                double r = ri + (ro - ri) * i / (pr - 1), t = 2 * Math.PI * k / pt;
                x[k * pr + i] = r * Math.Cos(t); y[k * pr + i] = r * Math.Sin(t);
            }
        int Id(int i, int k) => ((k % pt + pt) % pt) * pr + i;
        var el = new List<int>();
        for (int k = 0; k < nt; k++)
            for (int i = 0; i < nr; i++)
            {
                int i0 = 2 * i, k0 = 2 * k;
                el.AddRange([Id(i0, k0), Id(i0 + 2, k0), Id(i0 + 2, k0 + 2), Id(i0 + 1, k0), Id(i0 + 2, k0 + 1), Id(i0 + 1, k0 + 1)]);
                el.AddRange([Id(i0, k0), Id(i0 + 2, k0 + 2), Id(i0, k0 + 2), Id(i0 + 1, k0 + 1), Id(i0 + 1, k0 + 2), Id(i0, k0 + 1)]);
            }
        var reg = profile.Regions[0];
        var oc = reg.Outer.Segments[0];
        var ic = reg.Holes[0].Segments[0]; // clockwise circle
        var edges = new List<MeshBoundaryEdge>();
        for (int k = 0; k < nt; k++) edges.Add(new(Id(pr - 1, 2 * k), Id(pr - 1, 2 * k + 1), Id(pr - 1, 2 * k + 2), 0, oc, (double)k / nt, (double)(k + 1) / nt));
        for (int k = nt; k > 0; k--) edges.Add(new(Id(0, 2 * k), Id(0, 2 * k - 1), Id(0, 2 * k - 2), 1, ic, (double)(nt - k) / nt, (double)(nt - k + 1) / nt));
        var mesh = new Mesh(x, y, el.ToArray(), new int[el.Count / 6], edges.ToArray(),
            [new MeshLoop(0, -1, reg.Outer), new MeshLoop(0, 0, reg.Holes[0])]);
        return (mesh, profile);
    }
}
