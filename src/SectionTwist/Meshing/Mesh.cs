using SectionTwist.Geometry;

namespace SectionTwist.Meshing;

/// <summary>
/// A conforming mesh of 6-node (quadratic) triangles. Element e has nodes
/// <c>Elements[6e..6e+5]</c> = corners v0, v1, v2 counter-clockwise, then the mid-side nodes of edges
/// (v0,v1), (v1,v2), (v2,v0). Mid-side nodes of edges on an arc lie on the true arc (curved, isoparametric edges).
/// </summary>
internal sealed class Mesh
{
    public Mesh(double[] x, double[] y, int[] elements, int[] elementRegion, MeshBoundaryEdge[] boundaryEdges, MeshLoop[] loops)
    {
        X = x; Y = y; Elements = elements; ElementRegion = elementRegion; BoundaryEdges = boundaryEdges; Loops = loops;
        NodeLoop = new int[x.Length];
        Array.Fill(NodeLoop, -1);
        foreach (var e in boundaryEdges) { NodeLoop[e.A] = e.Loop; NodeLoop[e.Mid] = e.Loop; NodeLoop[e.B] = e.Loop; }
    }

    /// <summary>Node x coordinates, metres.</summary>
    public double[] X { get; }
    /// <summary>Node y coordinates, metres.</summary>
    public double[] Y { get; }
    /// <summary>Six node indices per element (corners counter-clockwise, then mid-sides of edges 01, 12, 20).</summary>
    public int[] Elements { get; }
    /// <summary>Index of the profile region that each element belongs to.</summary>
    public int[] ElementRegion { get; }
    /// <summary>Boundary edges, each oriented along its loop (outer loops counter-clockwise, holes clockwise).</summary>
    public MeshBoundaryEdge[] BoundaryEdges { get; }
    /// <summary>The profile loops, numbered region by region: outer loop, then that region's holes.</summary>
    public MeshLoop[] Loops { get; }
    /// <summary>For each node the loop it lies on, or -1 for an interior node.</summary>
    public int[] NodeLoop { get; }

    /// <summary>
    /// Zone of each element: elements joined without crossing a boundary or interface edge share a zone (composite
    /// sections give each zone one material).
    /// </summary>
    public int[] ElementZone { get; init; } = [];

    /// <summary>Centroid of the largest element of each zone (a point well inside it, to find its material).</summary>
    public Point2[] ZoneSample { get; init; } = [];

    /// <summary>Interface edges (composite sections): A - Mid - B on the interface curve, oriented along the interface loop.</summary>
    public MeshBoundaryEdge[] InterfaceEdges { get; init; } = [];

    public int NodeCount => X.Length;
    public int ElementCount => Elements.Length / 6;

    public Point2 Node(int i) => new(X[i], Y[i]);
}

/// <summary>
/// A quadratic boundary edge A - Mid - B lying on <see cref="Curve"/> between parameters <see cref="T0"/> and <see cref="T1"/>.
/// </summary>
internal readonly record struct MeshBoundaryEdge(int A, int Mid, int B, int Loop, Segment Curve, double T0, double T1);

/// <summary>A boundary loop of the meshed profile.</summary>
/// <param name="Region">Index of the region.</param>
/// <param name="Hole">Index of the hole within the region, or -1 for the outer loop.</param>
/// <param name="Geometry">The exact loop.</param>
internal sealed record MeshLoop(int Region, int Hole, Loop Geometry)
{
    public bool IsHole => Hole >= 0;

    /// <summary>An interface between two materials inside the region (composite sections), not a boundary.</summary>
    public bool IsInterface { get; init; }

    /// <summary>An interface chain with two ends (on the outline or at junctions of three parts), not a closed loop; its <see cref="Geometry"/> runs there and back.</summary>
    public bool IsOpen { get; init; }
}
