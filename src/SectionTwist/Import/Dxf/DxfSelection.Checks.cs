using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>Checks after the choice: loops on layers left out, and curves drawn as facets (warned, or fitted by arcs).</summary>
internal sealed partial class DxfSelection
{
    /// <summary>Warns when a closed loop on a layer outside the choice lies in the material of a chosen region (a bore on its own layer).</summary>
    private void CheckOtherLayers(List<Face> faces, Box2 box)
    {
        if (filter is null || builder.OtherCurves.Count == 0) return;
        var near = builder.OtherCurves.Where(c => box.Contains(c.Bounds, _snap)).ToList();
        if (near.Count == 0) return;
        var asm = new OutlineAssembler(file, _snap, o.SplineTolerance, Extent, ct);
        asm.Run(near);
        var r = _regions!;
        for (int i = 0; i < asm.Loops.Count; i++)
        {
            var loop = asm.Loops[i];
            var probe = loop.Segments[0].PointAt(0.5);
            for (int k = 0; k < faces.Count; k++)
            {
                var f = faces[k];
                if (!r.InMaterial(f, probe) || f.Holes.Append(f.Loop).Any(h => SameBox(r.LoopAt(h).Bounds, loop.Bounds))) continue;
                string layer = asm.LoopLayers[i][0];
                if (o.PartLayers?.Contains(layer, StringComparer.OrdinalIgnoreCase) == true) break; // another part of a composite
                Warnings.Add($"the closed loop {asm.LoopSources[i][0]} on layer '{layer}' lies inside the chosen section but its layer is not chosen; " +
                             $"if it is a hole or part of the outline, add its layer: {_fix.Layer(filter.Spec + "," + layer)}");
                break;
            }
        }
    }

    private bool SameBox(Box2 a, Box2 b)
    {
        double t = Math.Max(_snap, 1e-9 * Extent);
        return Math.Abs(a.MinX - b.MinX) <= t && Math.Abs(a.MaxX - b.MaxX) <= t && Math.Abs(a.MinY - b.MinY) <= t && Math.Abs(a.MaxY - b.MaxY) <= t;
    }

    /// <summary>The chosen regions, with facet runs reported (or replaced by arcs when asked).</summary>
    private List<Region> Facet(List<Face> faces)
    {
        var r = _regions!;
        var result = new List<Region>();
        var box = Box2.Empty;
        foreach (var f in faces) box = box.Union(f.Bounds);
        double size = box.Diagonal;
        foreach (var f in faces)
        {
            var loops = new List<Loop>();
            foreach (int li in f.Holes.Prepend(f.Loop))
            {
                var loop = r.LoopAt(li);
                bool hole = li != f.Loop;
                bool materialLeft = loop.IsCounterClockwise != hole;
                var runs = FacetRuns.Find(loop, materialLeft);
                if (runs.Count == 0) { loops.Add(loop); continue; }
                var sources = _asm!.LoopSources[li];
                if (o.FitArcs is { } rel)
                {
                    var fitted = FacetArcs.Fit(loop, rel * size, out _, out _);
                    foreach (var run in runs)
                    {
                        var pts = RunPoints(loop, run);
                        Facets.Add(new DxfFacetInfo(Range(sources, run), run.Count, run.Middle, run.Concave, FacetArcs.FitPoints(pts, rel * size).Count(s => s is ArcSegment)));
                    }
                    loops.Add(fitted);
                    continue;
                }
                foreach (var run in runs)
                {
                    var info = new DxfFacetInfo(Range(sources, run), run.Count, run.Middle, run.Concave, null);
                    Facets.Add(info);
                    double suggest = SuggestFit(RunPoints(loop, run), size);
                    Warnings.Add($"curve drawn as {run.Count} facets ({info.Entities}, near {Pt(run.Middle)}): the {(run.Concave ? "peak shear depends on the facets (each facet corner is re-entrant)" : "results depend on the facets")}; " +
                                 $"export true arcs or use {_fix.FitArcs(suggest)}");
                }
                loops.Add(loop);
            }
            result.Add(new Region(loops[0], loops.Skip(1)));
        }
        return result;
    }

    private static List<Point2> RunPoints(Loop loop, FacetRun run)
    {
        var segs = loop.Segments;
        int n = segs.Count;
        var pts = new List<Point2>(run.Count + 1);
        for (int k = 0; k < run.Count; k++) pts.Add(segs[(run.First + k) % n].Start);
        pts.Add(segs[(run.First + run.Count - 1) % n].End);
        return pts;
    }

    /// <summary>The smallest of 1e-6 .. 1e-3 (of the part size) that fits at least three facets per arc on average.</summary>
    private static double SuggestFit(List<Point2> pts, double size)
    {
        foreach (double rel in (ReadOnlySpan<double>)[1e-6, 1e-5, 1e-4, 1e-3])
            if (FacetArcs.FitPoints(pts, rel * size).Count * 3 <= pts.Count - 1) return rel;
        return 1e-3;
    }

    /// <summary>"LWPOLYLINE (handle 2A, line 40) segments 3 to 66", or the first and last entity of the run.</summary>
    private static string Range(string[] sources, FacetRun run)
    {
        int n = sources.Length;
        string first = sources[run.First % n], last = sources[(run.First + run.Count - 1) % n];
        static (string Head, string? Seg) Split(string s)
        {
            int k = s.LastIndexOf(" segment ", StringComparison.Ordinal);
            return k < 0 ? (s, null) : (s[..k], s[(k + 9)..]);
        }
        var (h1, s1) = Split(first);
        var (h2, s2) = Split(last);
        if (h1 == h2) return s1 is null ? h1 : $"{h1} segments {s1} to {s2}";
        return $"{first} to {last}";
    }
}
