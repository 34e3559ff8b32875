namespace SectionTwist.Geometry;

/// <summary>
/// One connected piece of a section: an outer loop (stored counter-clockwise) and holes (stored clockwise).
/// </summary>
public sealed class Region
{
    /// <summary>Creates a region; orientations are normalised.</summary>
    public Region(Loop outer, IEnumerable<Loop>? holes = null)
    {
        Outer = outer.Oriented(counterClockwise: true);
        Holes = (holes ?? []).Select(h => h.Oriented(counterClockwise: false)).ToArray();
    }

    /// <summary>Outer boundary, counter-clockwise.</summary>
    public Loop Outer { get; }

    /// <summary>Hole boundaries, clockwise.</summary>
    public IReadOnlyList<Loop> Holes { get; }

    /// <summary>Net area (outer minus holes).</summary>
    public double Area => Outer.SignedArea + Holes.Sum(h => h.SignedArea);

    /// <summary>The outer loop followed by the holes.</summary>
    public IEnumerable<Loop> Loops => Holes.Prepend(Outer);

    /// <summary>The region moved by a similarity transform.</summary>
    public Region Transformed(Similarity2 t) => new(Outer.Transformed(t), Holes.Select(h => h.Transformed(t)));
}
