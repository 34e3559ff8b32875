using SectionTwist.Geometry;

namespace SectionTwist.Plastic;

/// <summary>
/// The mesh of the elastic-plastic solve and, for each point of the torque-twist curve, which nodes have yielded; for
/// pictures of the plastic zone spreading. <see cref="Triangles"/> lists the quadratic mesh as linear sub-triangles.
/// </summary>
public sealed class PlasticField
{
    internal PlasticField(double[] x, double[] y, int[] triangles, IReadOnlyList<IReadOnlyList<Point2>> boundaries, IReadOnlyList<IReadOnlyList<bool>> yielded,
        bool[] free)
    {
        Free = Array.AsReadOnly(free);
        X = Array.AsReadOnly(x); Y = Array.AsReadOnly(y); Triangles = Array.AsReadOnly(triangles);
        Boundaries = boundaries; Yielded = yielded;
    }

    /// <summary>Node x coordinates, m.</summary>
    public IReadOnlyList<double> X { get; }
    /// <summary>Node y coordinates, m.</summary>
    public IReadOnlyList<double> Y { get; }
    /// <summary>Linear sub-triangles, three node indices each, counter-clockwise.</summary>
    public IReadOnlyList<int> Triangles { get; }
    /// <summary>Boundary loops as fine polylines, m.</summary>
    public IReadOnlyList<IReadOnlyList<Point2>> Boundaries { get; }
    /// <summary>True for interior nodes (they carry the yield state); boundary nodes are fixed and never marked.</summary>
    public IReadOnlyList<bool> Free { get; }
    /// <summary>For each curve point (same order as <see cref="PlasticResult.Curve"/>) whether each node has yielded.</summary>
    public IReadOnlyList<IReadOnlyList<bool>> Yielded { get; }
}
