using SectionTwist.Geometry;

namespace SectionTwist.Meshing;

/// <summary>
/// The quality triangulator: a profile (lines, arcs and any other <see cref="Segment"/> curves) to a conforming
/// mesh of 6-node triangles. Constrained Delaunay triangulation with exact predicates, Ruppert-Shewchuk refinement
/// to a minimum angle and a graded size, then quadratic elements whose boundary mid-side nodes lie on the true curves.
/// See <see cref="DelaunayRefiner"/> for the algorithm and its sources.
/// </summary>
internal static class Mesher
{
    /// <summary>Meshes <paramref name="profile"/>. Throws <see cref="SectionTwistException"/> for bad options or geometry it cannot mesh.</summary>
    public static Mesh Generate(Profile profile, MeshOptions options, CancellationToken ct = default) =>
        Generate(profile, options, out _, ct);

    /// <summary>As <see cref="Generate(Profile, MeshOptions, CancellationToken)"/>, also returning the refiner's counters.</summary>
    internal static Mesh Generate(Profile profile, MeshOptions options, out MesherStats stats, CancellationToken ct = default) =>
        Generate(profile, [], options, out stats, ct);

    /// <summary>
    /// As <see cref="Generate(Profile, MeshOptions, CancellationToken)"/> with interface curves inside the regions
    /// (composite sections): each is kept as a chain of element edges with curved mid-side nodes on the true curve, and
    /// <see cref="Mesh.ElementZone"/> tells the pieces between them apart. The curves may close on themselves or end on
    /// the outline's vertices or on each other's ends (junctions); they must not cross the boundary or each other, nor
    /// end anywhere else (checked by the caller, <c>CompositeArrangement</c>).
    /// </summary>
    internal static Mesh Generate(Profile profile, IReadOnlyList<(Segment Curve, int Region)> interfaces, MeshOptions options, out MesherStats stats, CancellationToken ct = default)
    {
        ArgumentNullException.ThrowIfNull(profile);
        ArgumentNullException.ThrowIfNull(options);
        MeshFeasibility.Check(profile);
        var refiner = new DelaunayRefiner(profile, options, ct, interfaces);
        refiner.Run();
        // A boundary mid-side node far off its chord can fold a curved element (Jacobian sign change): split those
        // boundary edges and refine again until every curved element has a positive Jacobian.
        for (int round = 0; ; round++)
        {
            var mesh = P2MeshBuilder.Build(refiner, out var inverted);
            if (inverted.Count == 0 || round >= 20)
            {
                stats = new MesherStats(refiner.T.VertexCount - 3, mesh.ElementCount, refiner.AcceptedSkinny, refiner.OffCurveVertices, round, inverted.Count);
                return mesh;
            }
            foreach (int c in inverted.Distinct().ToList()) refiner.SplitChord(c);
            refiner.ResumeRefinement();
        }
    }
}

/// <summary>Counters from one mesher run (for diagnostics and tests).</summary>
/// <param name="Vertices">Corner vertices.</param>
/// <param name="Elements">Elements.</param>
/// <param name="AcceptedSkinny">Skinny triangles accepted because of small input angles.</param>
/// <param name="OffCurveVertices">Boundary vertices left on a chord (their star did not allow the move onto the curve).</param>
/// <param name="JacobianRounds">Rounds of boundary refinement for folded curved elements.</param>
/// <param name="FoldedLeft">Curved elements still failing the Jacobian test at the end (0 normally).</param>
internal readonly record struct MesherStats(int Vertices, int Elements, int AcceptedSkinny, int OffCurveVertices, int JacobianRounds, int FoldedLeft);
