using SectionTwist.Geometry;
using SectionTwist.Shaft;

namespace SectionTwist.Composite;

/// <summary>
/// A cross-section made of parts of different materials, perfectly bonded where they meet. Parts may meet only along
/// whole closed loops that lie inside the section (a core in a sleeve, a liner in a tube, an insert in a bar): such a
/// loop, drawn once by each part, becomes an interface of the mesh. Loops drawn by one part only form the outline
/// (<see cref="Envelope"/>), which is validated like any profile.
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
        var loops = new List<(Loop Loop, int Part)>();
        for (int i = 0; i < Parts.Count; i++)
            foreach (var l in Parts[i].Shape.Loops) loops.Add((l.Oriented(counterClockwise: true), i));
        double diag = Parts.Select(p => p.Shape.Bounds).Aggregate((a, b) => a.Union(b)).Diagonal;
        var partner = new int[loops.Count];
        Array.Fill(partner, -1);
        for (int i = 0; i < loops.Count; i++)
            for (int j = i + 1; j < loops.Count; j++)
            {
                if (loops[i].Part == loops[j].Part || !SameLoop(loops[i].Loop, loops[j].Loop, diag)) continue;
                if (partner[i] >= 0 || partner[j] >= 0)
                    throw new SectionTwistException("stacked-loops",
                        $"{Name}: the loop near {loops[i].Loop.Segments[0].Start} is drawn by more than two parts; each interface belongs to exactly two parts");
                partner[i] = j; partner[j] = i;
            }
        var outline = new List<Loop>();
        var shared = new List<Loop>();
        for (int i = 0; i < loops.Count; i++)
        {
            if (partner[i] < 0) outline.Add(loops[i].Loop);
            else if (partner[i] > i) shared.Add(loops[i].Loop);
        }
        if (outline.Count == 0)
            throw new SectionTwistException("empty-profile", $"{Name}: every loop is shared by two parts, so the parts overlap; draw each part once");
        try
        {
            Envelope = Profile.FromLoops(outline, unit, Name);
            // all loops together must neither cross nor touch: interfaces may meet the outline only as whole loops
            if (shared.Count > 0) _ = Profile.FromLoops(outline.Concat(shared), unit, Name);
        }
        catch (SectionTwistException ex) when (ex.Code is "self-intersection" or "overlapping-regions" or "hole-outside" or "hole-in-hole")
        {
            throw new SectionTwistException("composite-parts",
                $"{Name}: the parts meet along part of a loop or overlap ({ex.Message}); parts of different materials may meet only along whole closed loops inside the section (a core in a sleeve), each drawn by both parts");
        }
        double sum = Parts.Sum(p => p.Shape.Properties.Area), env = Envelope.Properties.Area;
        if (Math.Abs(sum - env) > 1e-6 * env)
            throw new SectionTwistException("composite-overlap",
                $"{Name}: the parts' areas add to {sum / env:0.######} times the area the outline encloses, so parts overlap or leave gaps; draw a sleeve as a ring whose inner loop is the core's outline");
        var interfaces = new List<(Loop, int)>();
        foreach (var l in shared)
        {
            int region = -1;
            for (int r = 0; r < Envelope.Regions.Count && region < 0; r++)
                if (Envelope.Regions[r].Outer.Contains(l.Segments[0].Start)) region = r;
            interfaces.Add((l, Math.Max(region, 0)));
        }
        Interfaces = interfaces;
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

    internal IReadOnlyList<(Loop Loop, int Region)> Interfaces { get; }

    /// <summary>The part that contains <paramref name="p"/> (inside one of its regions, outside their holes), or -1.</summary>
    internal int PartAt(Point2 p)
    {
        for (int i = 0; i < Parts.Count; i++)
            foreach (var r in Parts[i].Shape.Regions)
                if (r.Outer.Contains(p) && !r.Holes.Any(h => h.Contains(p))) return i;
        return -1;
    }

    /// <summary>
    /// Two loops are the same when their areas and boxes agree and every segment's end and middle lie on the other loop
    /// (within 1e-7 of the section size); how each part split the loop into segments does not matter.
    /// </summary>
    private static bool SameLoop(Loop a, Loop b, double diag)
    {
        double tol = 1e-7 * diag;
        if (Math.Abs(a.SignedArea - b.SignedArea) > 1e-6 * Math.Abs(a.SignedArea)) return false;
        var ba = a.Bounds; var bb = b.Bounds;
        if (Math.Abs(ba.MinX - bb.MinX) > tol || Math.Abs(ba.MaxX - bb.MaxX) > tol || Math.Abs(ba.MinY - bb.MinY) > tol || Math.Abs(ba.MaxY - bb.MaxY) > tol) return false;
        var db = new Plastic.LoopDistance(b);
        var da = new Plastic.LoopDistance(a);
        return a.Segments.All(s => db.To(s.Start) <= tol && db.To(s.PointAt(0.5)) <= tol)
            && b.Segments.All(s => da.To(s.Start) <= tol && da.To(s.PointAt(0.5)) <= tol);
    }
}
