using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>The messages of <see cref="DxfSelection"/>: each names the place and a remedy the user can type where they are.</summary>
internal sealed partial class DxfSelection
{
    private static string Pt(Point2 p) => $"({DxfRemedy.Num(p.X)}, {DxfRemedy.Num(p.Y)})";

    private static string Show(Box2 b) => $"x {DxfRemedy.Num(b.MinX)}..{DxfRemedy.Num(b.MaxX)}, y {DxfRemedy.Num(b.MinY)}..{DxfRemedy.Num(b.MaxY)}";

    /// <summary>"LINE (line 12)", "LINE (line 12) and LINE (line 20)" or "5 entities (LINE (line 12), ...)".</summary>
    private static string Describe(IReadOnlyList<string> sources) => sources.Count switch
    {
        1 => sources[0],
        2 => $"{sources[0]} and {sources[1]}",
        _ => $"{sources.Count} entities ({sources[0]}, {sources[1]}, ...)",
    };

    /// <summary>"--part 1 (area 1134, x 0..40, y 0..40), --part 2 (...)" for the first <paramref name="max"/> parts.</summary>
    private string ListParts(int max)
    {
        var list = Parts.Take(max).Select(p => $"{_fix.Part(p.Number)} (area {DxfRemedy.Num(p.Area)}, {Show(p.Bounds)})");
        return string.Join(", ", list) + (Parts.Count > max ? $" and {Parts.Count - max} more (list them with {DxfRemedy.Inspect(file)})" : "");
    }

    private string LayerHint => layers.Count > 1 ? $", choose the outline's layers with {_fix.Layer("NAME,NAME")}" : "";

    private SectionTwistException NoOutline()
    {
        string on = filter is null ? "" : $" on {filter.Describe()}";
        var unknown = filter?.Unmatched(layers).ToList() ?? [];
        string what = o.UseHatches ? "no HATCH boundary" : "no outline entities";
        string hatchHint = o.UseHatches ? (builder.HatchCount == 0 ? "; the drawing holds no HATCH: take the drawn outline (leave out the hatch choice)" : "")
            : builder.HatchCount > 0 ? $"; the drawing holds {builder.HatchCount} HATCH entities: take their boundaries with {_fix.Hatch}" : "";
        string layerList = string.Join(", ", layers.DefaultIfEmpty("(none)").Select(l => $"'{l}'"));
        if (unknown.Count > 0)
            return new SectionTwistException("dxf-no-outline",
                $"{file}: {(unknown.Count == 1 ? "layer" : "layers")} {string.Join(", ", unknown.Select(u => $"'{u}'"))} {(unknown.Count == 1 ? "matches" : "match")} no layer of the drawing; its layers are {layerList}");
        return new SectionTwistException("dxf-no-outline", $"{file}: {what}{on} in model space; layers: {layerList}{hatchHint}");
    }

    private SectionTwistException NothingCloses()
    {
        var open = _asm!.Loose.Where(g => !g.Straight).ToList();
        if (open.Count > 0) return OpenError(open, true);
        if (_asm.Junctions.Count > 0) return JunctionError(_asm.Junctions[0], true);
        var lines = _asm.Loose.SelectMany(g => g.Sources).ToList();
        return new SectionTwistException("dxf-no-outline",
            $"{file}: no closed outline: {(lines.Count > 0 ? $"{Describe(lines)} {(lines.Count == 1 ? "is a straight line" : "are straight lines")} that close nothing" : "nothing closes")}; draw the section as closed loops{LayerHint}");
    }

    private SectionTwistException NotAround(Point2 p)
    {
        var nearest = Parts.OrderBy(f => Distance(f.Bounds, p)).FirstOrDefault();
        string hint = nearest is null ? "" : $"; the nearest part is {_fix.Part(nearest.Number)} ({Show(nearest.Bounds)}), e.g. {_fix.At(nearest.Inside)}";
        return new SectionTwistException("dxf-no-part", $"{file}: no closed outline lies around {Pt(p)}{hint}");
    }

    private static double Distance(Box2 b, Point2 p)
    {
        double dx = Math.Max(0, Math.Max(b.MinX - p.X, p.X - b.MaxX)), dy = Math.Max(0, Math.Max(b.MinY - p.Y, p.Y - b.MaxY));
        return Math.Sqrt(dx * dx + dy * dy);
    }

    /// <summary>The ways to choose a section, offered when all parts were asked for: a closed part, a view or the hatch.</summary>
    private string Choice(bool allMode)
    {
        if (!allMode) return "";
        if (Parts.Count > 0) return $"; or choose a closed part: {ListParts(3)}";
        string hatch = builder.HatchCount > 0 ? $"the hatched section with {_fix.Hatch}" : "";
        string view = builder.TextPoints.Count > 0 ? $"one view with {_fix.WindowWord}" : "";
        return hatch.Length + view.Length == 0 ? "" : $", or take {view}{(hatch.Length > 0 && view.Length > 0 ? " or " : "")}{hatch}";
    }

    private SectionTwistException JunctionError(Junction j, bool allMode) =>
        new("dxf-branch",
            $"{file}: {j.Ends} outline ends meet at {Pt(j.Where)} ({string.Join(", ", j.Sources)}), so no single outline runs through there; " +
            $"remove the stray or construction lines there{LayerHint}{Choice(allMode)}{MaterialHint}");

    /// <summary>Layers that meet along edges may be the bonded parts of a composite section.</summary>
    private string MaterialHint => layers.Count > 1
        ? $"; or, if the layers are bonded parts of different materials, give each layer its material with {_fix.Materials(layers.Order(StringComparer.Ordinal).Take(3))}" : "";

    /// <summary>Open entities: the nearest pair of free ends is a gap (with a snap value that closes it) or nothing is near.</summary>
    private SectionTwistException OpenError(List<LooseGroup> open, bool allMode, bool surrounds = false)
    {
        var ends = open.SelectMany(g => g.FreeEnds).ToList();
        var (a, b, d) = ClosestPair(ends);
        string count = open.Sum(g => g.Sources.Length) is var n && n > 1 ? $" ({n} entities do not close)" : "";
        double rel = b >= 0 ? DxfRemedy.RoundUp1(1.5 * d / Extent) : double.PositiveInfinity;
        if (rel <= 1e-2)
        {
            // a small gap: the snap value that closes it (1.5 times the gap, rounded up), within what the option accepts
            return new SectionTwistException("open-loop",
                $"{file}: open outline: gap of {DxfRemedy.Num(d)} drawing units between the end of {ends[a].Source} at {Pt(ends[a].Where)} and the end of {ends[b].Source} at {Pt(ends[b].Where)}{count}; " +
                $"close it in CAD, or join the ends with {_fix.Snap(rel)} (now {DxfRemedy.Num(o.SnapTolerance)}){LayerHint}{Choice(allMode && !surrounds)}");
        }
        if (surrounds)
            return new SectionTwistException("open-loop",
                $"{file}: open outline around the chosen part: {ends[a].Source} ends at {Pt(ends[a].Where)} with nothing joined to it{count}; " +
                $"it surrounds the part, so it cannot be left out: close the outline in CAD{LayerHint}");
        var e = ends.Count > 0 ? ends[0] : (Where: open[0].Segments[0].Start, Source: open[0].Sources[0]);
        return new SectionTwistException("open-loop",
            $"{file}: open outline: {e.Source} ends at {Pt(e.Where)} with nothing joined to it{count}; close the outline in CAD, or leave the open entities out with {_fix.SkipOpen}{LayerHint}{Choice(allMode)}");
    }

    /// <summary>The closest pair of points (sweep over x-sorted points).</summary>
    private static (int A, int B, double D) ClosestPair(List<(Point2 Where, string Source)> pts)
    {
        var order = Enumerable.Range(0, pts.Count).OrderBy(i => pts[i].Where.X).ToArray();
        double best = double.PositiveInfinity;
        int ba = 0, bb = -1;
        for (int i = 0; i < order.Length; i++)
            for (int j = i + 1; j < order.Length && pts[order[j]].Where.X - pts[order[i]].Where.X < best; j++)
            {
                double d = Point2.Distance(pts[order[i]].Where, pts[order[j]].Where);
                if (d < best) { best = d; ba = order[i]; bb = order[j]; }
            }
        return (ba, bb, best);
    }
}
