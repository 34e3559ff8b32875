using SectionTwist.Units;

namespace SectionTwist.Geometry;

/// <summary>
/// A cross-section: one or more disjoint regions, each an outer loop with holes. Coordinates are in metres;
/// <see cref="Unit"/> is the unit the user gave the outline in and is used for display only.
/// </summary>
public sealed class Profile
{
    private SectionProperties? _properties;

    /// <summary>Creates a profile from regions and validates it (see <see cref="ProfileValidator"/>).</summary>
    public Profile(IEnumerable<Region> regions, LengthUnit? unit = null, string? name = null)
    {
        Regions = regions.ToArray();
        Unit = unit ?? LengthUnit.Millimetre;
        Name = name ?? "profile";
        if (Regions.Count == 0) throw new SectionTwistException("empty-profile", $"{Name}: the profile has no closed outline; draw at least one closed loop");
        var b = Box2.Empty;
        foreach (var r in Regions) b = b.Union(r.Outer.Bounds);
        Bounds = b;
        ProfileValidator.Validate(this);
    }

    /// <summary>
    /// Builds a profile from unordered closed loops: loops are nested by containment, so even depth is an outer
    /// boundary and odd depth a hole of the loop that encloses it.
    /// </summary>
    public static Profile FromLoops(IEnumerable<Loop> loops, LengthUnit? unit = null, string? name = null)
    {
        var list = loops.ToList();
        if (list.Count == 0) throw new SectionTwistException("empty-profile", $"{name ?? "profile"}: no closed loop found; draw at least one closed outline");
        var area = list.Select(l => Math.Abs(l.SignedArea)).ToArray();
        int n = list.Count;
        if (n > Limits.InputLimits.MaxLoops)
            throw new SectionTwistException("too-many-loops",
                $"{name ?? "profile"}: {n} closed loops, more than the {Limits.InputLimits.MaxLoops} SectionTwist analyses together (contour or hatch lines?); keep only the section's outline and holes (a drawing: --layer NAME)");
        var poly = new IReadOnlyList<Point2>?[n];
        long traced = 0;
        // parent = smallest loop that contains a point of this loop
        var parent = new int[n];
        for (int i = 0; i < n; i++)
        {
            parent[i] = -1;
            var probe = list[i].Segments[0].PointAt(0.5);
            for (int j = 0; j < n; j++)
            {
                if (i == j || area[j] <= area[i] || !list[j].Bounds.Contains(list[i].Bounds, 1e-9 * list[j].Bounds.Diagonal)) continue;
                // each loop is traced once, not once per loop tested against it
                if (poly[j] is null)
                {
                    poly[j] = list[j].Flatten(1e-7 * Math.Max(list[j].Bounds.Diagonal, double.Epsilon));
                    traced += poly[j]!.Count;
                    if (traced > Limits.InputLimits.MaxOutlineEdges)
                        throw new SectionTwistException("profile-too-complex",
                            $"{name ?? "profile"}: {n} loops trace to more than {Limits.InputLimits.MaxOutlineEdges} straight pieces (stacked or repeated outlines?); remove the duplicates or keep only the section's loops");
                }
                if (Loop.WindingNumber(poly[j]!, probe) != 0 && (parent[i] < 0 || area[j] < area[parent[i]])) parent[i] = j;
            }
        }
        var depth = new int[n];
        for (int i = 0; i < n; i++) { int d = 0; for (int p = parent[i]; p >= 0 && d <= n; p = parent[p]) d++; depth[i] = d; }
        var regions = new List<Region>();
        for (int i = 0; i < n; i++)
        {
            if (depth[i] % 2 != 0) continue;
            var holes = Enumerable.Range(0, n).Where(j => parent[j] == i && depth[j] % 2 == 1).Select(j => list[j]);
            regions.Add(new Region(list[i], holes));
        }
        return new Profile(regions, unit, name);
    }

    /// <summary>The disjoint regions.</summary>
    public IReadOnlyList<Region> Regions { get; }

    /// <summary>The unit the outline was given in (display only; coordinates are metres).</summary>
    public LengthUnit Unit { get; }

    /// <summary>A short name for messages and reports.</summary>
    public string Name { get; }

    /// <summary>Bounding box of all regions, metres.</summary>
    public Box2 Bounds { get; }

    /// <summary>All loops: for each region its outer loop then its holes.</summary>
    public IEnumerable<Loop> Loops => Regions.SelectMany(r => r.Loops);

    /// <summary>
    /// Cautions from the source that built the profile (e.g. a template default quoted from memory of a standard);
    /// empty for most profiles. An analysis repeats them among its warnings.
    /// </summary>
    public IReadOnlyList<ProfileWarning> Warnings { get; init; } = [];

    /// <summary>
    /// Largest distance, metres, between the outline and the drawn curves it stands for where those could not be kept
    /// exactly (splines and bent ellipses replaced by arcs); 0 when the outline is the drawn geometry. The analysis adds
    /// its effect on J to the error estimate.
    /// </summary>
    public double CurveTolerance { get; init; }

    /// <summary>Exact area properties (lines and arcs integrated exactly).</summary>
    public SectionProperties Properties => _properties ??= SectionProperties.Compute(this);

    /// <summary>The profile moved by a similarity transform.</summary>
    public Profile Transformed(Similarity2 t) => new(Regions.Select(r => r.Transformed(t)), Unit, Name) { CurveTolerance = CurveTolerance * t.Scale, Warnings = Warnings };

    /// <summary>The same profile under another name or display unit.</summary>
    public Profile With(string? name = null, LengthUnit? unit = null) => new(Regions, unit ?? Unit, name ?? Name) { CurveTolerance = CurveTolerance, Warnings = Warnings };
}
