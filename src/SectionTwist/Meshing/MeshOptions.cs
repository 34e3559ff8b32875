using SectionTwist.Geometry;

namespace SectionTwist.Meshing;

/// <summary>Controls for the quality triangulator. Lengths are in metres.</summary>
internal sealed record MeshOptions
{
    /// <summary>Largest edge length wanted anywhere (metres); null lets the mesher pick from the part size.</summary>
    public double? MaxEdgeLength { get; init; }

    /// <summary>Smallest angle wanted in every triangle, degrees, except where the input itself has a smaller angle.</summary>
    public double MinAngleDegrees { get; init; } = 25;

    /// <summary>Largest distance (metres) between an arc and the straight chord between two boundary vertices on it; null: see MaxArcAngleDegrees.</summary>
    public double? ChordTolerance { get; init; }

    /// <summary>
    /// Largest angle (degrees) a boundary edge may span on a curve when no <see cref="ChordTolerance"/> is given. Curved
    /// 6-node edges follow an arc to fourth order: 5 degrees (the default) keeps the area error of a circle near 1e-9,
    /// 30 degrees near 3e-6 (the torsion analysis picks the angle from the requested accuracy and refines further).
    /// </summary>
    public double MaxArcAngleDegrees { get; init; } = 5;

    /// <summary>Optional wanted edge length at a point (metres); the mesh is refined until edges are no longer than this.</summary>
    public Func<Point2, double>? SizeField { get; init; }

    /// <summary>Grade the mesh toward re-entrant corners and small features.</summary>
    public bool Grade { get; init; } = true;

    /// <summary>Safety limit on the number of triangles.</summary>
    public int MaxTriangles { get; init; } = 4_000_000;
}
