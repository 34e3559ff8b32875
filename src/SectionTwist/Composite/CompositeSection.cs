using SectionTwist.Geometry;
using SectionTwist.Shaft;

namespace SectionTwist.Composite;

/// <summary>
/// A cross-section made of parts of different materials, perfectly bonded where they meet. Parts meet along shared
/// edges: whole closed loops inside the section (a core in a sleeve, an insert in a bar) or pieces of their outlines
/// that end on the outer boundary or where three parts meet (the two layers of a bimetal strip, two half-discs, an
/// insert touching the outer edge). A shared piece may be only part of a segment of either part, and need not be split
/// the same way by both. Each shared piece becomes an interface of the mesh; the pieces drawn by one part only form the
/// outline (<see cref="Envelope"/>, the union of the parts, holes included), which is validated like any profile.
/// Parts that overlap, touch only at a point or stand apart are refused.
/// </summary>
public sealed class CompositeSection
{
    /// <summary>Builds and checks a composite section; throws a <see cref="SectionTwistException"/> naming the part and the remedy.</summary>
    /// <param name="parts">The parts, at least one; names must differ.</param>
    /// <param name="name">A short name for messages.</param>
    public CompositeSection(IEnumerable<CompositePart> parts, string? name = null)
    {
        ArgumentNullException.ThrowIfNull(parts);
        Parts = parts.ToList().AsReadOnly();
        Name = name ?? (Parts.Count > 0 ? Parts[0].Shape.Name : "composite");
        if (Parts.Count == 0) throw new SectionTwistException("empty-profile", $"{Name}: a composite section needs at least one part");
        foreach (var g in Parts.GroupBy(p => p.Name, StringComparer.OrdinalIgnoreCase))
            if (g.Count() > 1) throw new SectionTwistException("duplicate-part", $"{Name}: two parts are named '{g.Key}'; give each part its own name");
        foreach (var p in Parts) p.Material.Validate();
        var unit = Parts[0].Shape.Unit;
        var arrangement = new CompositeArrangement(Parts, Name);
        try
        {
            Envelope = Profile.FromLoops(arrangement.Loops, unit, Name);
        }
        catch (SectionTwistException ex) when (ex.Code is "self-intersection" or "overlapping-regions" or "hole-outside" or "hole-in-hole" or "zero-area")
        {
            throw new SectionTwistException("composite-parts",
                $"{Name}: the parts overlap or their union is not a valid outline ({ex.Message}); draw the parts so that they do not overlap and neighbours share their edges exactly");
        }
        double sum = Parts.Sum(p => p.Shape.Properties.Area), env = Envelope.Properties.Area;
        if (Math.Abs(sum - env) > 1e-6 * env)
            throw new SectionTwistException("composite-overlap",
                $"{Name}: the parts' areas add to {sum / env:0.######} times the area of their union, so parts overlap (one lies inside another or they cross); draw a sleeve as a ring whose inner loop is the core's outline, and neighbouring parts sharing an edge");
        arrangement.CheckConnected();
        arrangement.WithRegions(Envelope);
        Interfaces = arrangement.Interfaces;
        Materials = Parts.Select(p => p.Material).DistinctBy(m => m.Name, StringComparer.OrdinalIgnoreCase).ToList().AsReadOnly();
    }

    /// <summary>The parts as given.</summary>
    public IReadOnlyList<CompositePart> Parts { get; }

    /// <summary>The distinct materials of the parts (by name), in the order of first use.</summary>
    public IReadOnlyList<Material> Materials { get; }

    /// <summary>A short name for messages and reports.</summary>
    public string Name { get; }

    /// <summary>The section's outline without the interfaces (the homogeneous profile of the same shape).</summary>
    public Profile Envelope { get; }

    /// <summary>The pieces of boundary shared by two parts (bonded interfaces), each ending on the outline, at a junction of three parts or closing on itself.</summary>
    internal IReadOnlyList<CompositeInterface> Interfaces { get; }

    /// <summary>The part that contains <paramref name="p"/> (inside one of its regions, outside their holes), or -1.</summary>
    internal int PartAt(Point2 p)
    {
        for (int i = 0; i < Parts.Count; i++)
            foreach (var r in Parts[i].Shape.Regions)
                if (r.Outer.Contains(p) && !r.Holes.Any(h => h.Contains(p))) return i;
        return -1;
    }
}
