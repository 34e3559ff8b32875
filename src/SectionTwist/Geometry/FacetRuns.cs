namespace SectionTwist.Geometry;

/// <summary>A run of short straight segments of one loop that turn by small angles the same way: a curve drawn as facets.</summary>
/// <param name="First">Index of the first facet in the loop.</param>
/// <param name="Count">Number of facets.</param>
/// <param name="Cyclic">True when the whole loop is the run (a circle drawn as a polygon).</param>
/// <param name="Middle">A point halfway along the run.</param>
/// <param name="Concave">True when the run bends into the material (its vertices are re-entrant corners).</param>
internal readonly record struct FacetRun(int First, int Count, bool Cyclic, Point2 Middle, bool Concave);

/// <summary>
/// Finds curves drawn as facets (polylines exported from curves, outlines traced from meshes or scans): at least
/// <see cref="MinFacets"/> consecutive lines, each turning from the previous one by <see cref="MinTurnDeg"/> to
/// <see cref="MaxTurnDeg"/> degrees in the same direction, with lengths within a factor <see cref="LengthRatio"/> of their
/// neighbours. The thresholds are common practice, no source: a drawn polygon with 14 or fewer sides (a hexagon, a
/// square) turns by more than 25 degrees; a straight edge split into pieces turns by less than 0.25 degrees.
/// </summary>
internal static class FacetRuns
{
    public const int MinFacets = 6;
    public const double MinTurnDeg = 0.25;
    public const double MaxTurnDeg = 25;
    public const double LengthRatio = 4;

    /// <summary>The facet runs of a loop. <paramref name="materialLeft"/>: the material lies left of the loop's direction.</summary>
    public static List<FacetRun> Find(Loop loop, bool materialLeft = true)
    {
        var segs = loop.Segments;
        int n = segs.Count;
        var runs = new List<FacetRun>();
        if (n < MinFacets) return runs;
        // joint i lies between segment i and segment i + 1: +1 / -1 when it qualifies (turn sign), 0 otherwise
        var joint = new int[n];
        for (int i = 0; i < n; i++)
        {
            var a = segs[i];
            var b = segs[(i + 1) % n];
            if (a is not LineSegment || b is not LineSegment) continue;
            double la = a.Length, lb = b.Length;
            if (!(la > 0 && lb > 0) || Math.Max(la, lb) > LengthRatio * Math.Min(la, lb)) continue;
            Point2 ta = a.End - a.Start, tb = b.End - b.Start;
            double turn = Math.Atan2(Point2.Cross(ta, tb), Point2.Dot(ta, tb)) * (180 / Math.PI);
            if (Math.Abs(turn) >= MinTurnDeg && Math.Abs(turn) <= MaxTurnDeg) joint[i] = Math.Sign(turn);
        }
        if (joint.All(j => j == joint[0] && j != 0))
        {
            runs.Add(new FacetRun(0, n, true, segs[n / 2].Start, joint[0] > 0 != materialLeft));
            return runs;
        }
        // start after a joint that breaks the pattern, then collect maximal runs of equal-sign joints
        int s0 = Array.FindIndex(joint, j => j == 0);
        if (s0 < 0) s0 = Enumerable.Range(0, n).First(i => joint[i] != joint[(i + 1) % n]);
        for (int k = 1; k <= n;)
        {
            int i = (s0 + k) % n;
            if (joint[i] == 0) { k++; continue; }
            int sign = joint[i], len = 0;
            while (k + len <= n && joint[(s0 + k + len) % n] == sign) len++;
            // len joints link len + 1 facets: segments i .. i + len
            if (len + 1 >= MinFacets)
                runs.Add(new FacetRun(i, len + 1, false, segs[(i + (len + 1) / 2) % n].Start, sign > 0 != materialLeft));
            k += len;
        }
        return runs;
    }

    /// <summary>True when the vertex at the start of segment <paramref name="seg"/> lies strictly inside a run (between two of its facets).</summary>
    public static bool IsInside(FacetRun run, int seg, int loopCount)
    {
        if (run.Cyclic) return true;
        int offset = ((seg - run.First) % loopCount + loopCount) % loopCount;
        return offset >= 1 && offset < run.Count;
    }
}
