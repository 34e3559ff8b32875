using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// From outline curves to the chosen regions: window, far strays left out, loops assembled with tolerances scaled to
/// the drawing's extent, regions nested and offered, the section chosen (all parts, a part number, a point), loose
/// entities and junctions judged against the choice, other layers checked for loops left behind, facets found or
/// fitted. Fields fill as the stages run, so <c>inspect</c> can report what was found before a problem stopped it.
/// </summary>
internal sealed partial class DxfSelection(string file, DxfReadOptions o, DxfGeometryBuilder builder, LayerFilter? filter, IReadOnlyCollection<string> layers,
    Units.LengthUnit unit, CancellationToken ct)
{
    private readonly DxfRemedy _fix = new(o.ShaftFileKeys);
    private OutlineAssembler? _asm;
    private DrawingRegions? _regions;
    private double _snap;

    public List<DxfPartInfo> Parts { get; } = [];
    public List<DxfLeftOut> LeftOut { get; } = [];
    public List<DxfJunctionInfo> Junctions { get; } = [];
    public List<string> Frames { get; } = [];
    public List<DxfFacetInfo> Facets { get; } = [];
    public List<string> Warnings { get; } = [];
    public double Extent { get; private set; }
    public double SnapTolerance => _snap;
    public int Loops => _asm?.Loops.Count ?? 0;
    public double LargestGap => _asm?.LargestGap ?? 0;
    public int DuplicatesDropped => _asm?.DuplicatesDropped ?? 0;
    /// <summary>Largest deviation allowed where curves were replaced by arcs (drawing units).</summary>
    public double CurveTolerance => _asm?.CurveTolerance ?? 0;
    public int? SelectedPart { get; private set; }
    public string? Selection { get; private set; }

    /// <summary>The chosen regions in drawing units (null until chosen).</summary>
    public List<Region>? Chosen { get; private set; }

    public void Run()
    {
        var curves = builder.Curves;
        if (curves.Count == 0 || filter?.Unmatched(layers).Any() == true) throw NoOutline();
        if (o.Window is { } w)
        {
            double tol = 1e-9 * w.Diagonal;
            var inside = curves.Where(c => w.Contains(c.Bounds, tol)).ToList();
            if (inside.Count == 0)
            {
                var all = Box2.Empty;
                foreach (var c in curves) all = all.Union(c.Bounds);
                throw new SectionTwistException("dxf-no-outline",
                    $"{file}: no outline entity lies wholly inside the window {Show(w)}; the outline entities span {Show(all)}");
            }
            curves = inside;
        }
        var (core, far, extent) = StrayEntities.Split(curves);
        foreach (var c in far)
            LeftOut.Add(new DxfLeftOut(c.Source, 1, c.Layer, c.Bounds, $"far from the rest of the drawing (which spans {Show(extent)})"));
        if (far.Count > 0)
            Warnings.Add($"left out {Describe(far.Select(c => c.Source).ToList())} at {Show(far[0].Bounds)}: far from the rest of the drawing (which spans {Show(extent)})");
        double scale = extent.Diagonal;
        if (!(scale > 0)) throw NoOutline();
        _asm = Assemble(core, scale);
        var loopBox = Box2.Empty;
        foreach (var l in _asm.Loops) loopBox = loopBox.Union(l.Bounds);
        if (_asm.Loops.Count > 0 && loopBox.Diagonal < scale / 100)
        {
            scale = loopBox.Diagonal; // the closed loops are far smaller than the drawing: tolerances follow them
            _asm = Assemble(core, scale);
        }
        Extent = scale;
        foreach (var j in _asm.Junctions) Junctions.Add(new DxfJunctionInfo(j.Where, j.Ends, j.Sources, j.Bounds));
        var stuff = builder.TextPoints.Where(t => o.Window is not { } win || win.Contains(Box2.Empty.Include(t.Where)))
            .Concat(_asm.Junctions.Select(j => (j.Where, $"{j.Ends} ends meeting at {Pt(j.Where)}")))
            .Concat(_asm.Loose.Where(g => !g.Straight).Select(g => (g.Segments[0].PointAt(0.5), g.Sources[0])));
        _regions = new DrawingRegions(_asm.Loops, _asm.LoopLayers, _asm.LoopSources, stuff);
        for (int i = 0; i < _regions.IsFrame.Length; i++)
            if (_regions.IsFrame[i]) Frames.Add($"{_regions.Entity(i)} ({_regions.FrameReason[i]})");
        for (int k = 0; k < _regions.Parts.Count; k++)
        {
            var f = _regions.Parts[k];
            Parts.Add(new DxfPartInfo(k + 1, f.Area, f.Holes.Length, f.Bounds, f.Layers, f.Entity, f.Inside));
        }
        if (_asm.Loops.Count == 0) throw NothingCloses();
        var faces = Choose();
        if (o.Window is { } win) Selection = $"{Selection} inside the window {Show(win)}";
        int loops = faces.Sum(f => 1 + f.Holes.Length);
        if (loops > Limits.InputLimits.MaxLoops)
            throw new SectionTwistException("dxf-too-many-loops",
                $"{file}: the chosen section has {loops} closed loops, more than the {Limits.InputLimits.MaxLoops} SectionTwist analyses together (contour or hatch lines?); " +
                $"choose the outline's layers with {_fix.Layer("NAME")} or one part with {_fix.Part(1)}");
        var box = Box2.Empty;
        foreach (var f in faces) box = box.Union(f.Bounds);
        JudgeLeftovers(faces, box);
        CheckOtherLayers(faces, box);
        Chosen = Facet(faces);
    }

    private OutlineAssembler Assemble(List<SourcedCurve> curves, double scale)
    {
        _snap = o.SnapTolerance * scale;
        var asm = new OutlineAssembler(file, _snap, o.SplineTolerance, scale, ct);
        asm.Run(curves);
        return asm;
    }

    /// <summary>The regions to analyse: the part asked for, the one around the point, or all parts when the drawing is unambiguous.</summary>
    private List<Face> Choose()
    {
        var r = _regions!;
        if (o.At is { } p)
        {
            var f = r.At(p) ?? throw NotAround(p);
            int idx = r.Parts.FindIndex(x => x.Loop == f.Loop);
            if (r.IsHole(f.Loop))
            {
                var around = r.Around(f.Loop);
                throw new SectionTwistException("dxf-no-part",
                    $"{file}: {Pt(p)} lies in the hole {f.Entity}{(around is null ? "" : $" of the part {around.Entity}; give a point in its material, e.g. {_fix.At(around.Inside)}")}");
            }
            SelectedPart = idx >= 0 ? idx + 1 : null;
            Selection = $"at {Pt(p)}";
            return [f];
        }
        if (o.Part is { } n)
        {
            if (n > r.Parts.Count)
                throw new SectionTwistException("dxf-no-part",
                    $"{file}: {_fix.Part(n)} does not exist: the drawing holds {r.Parts.Count} part(s): {ListParts(6)}");
            SelectedPart = n;
            Selection = $"part {n}";
            return [r.Parts[n - 1]];
        }
        if (_asm!.Junctions.Count > 0) throw JunctionError(_asm.Junctions[0], true);
        var open = _asm.Loose.Where(g => !g.Straight).ToList();
        if (open.Count > 0 && !o.SkipOpen) throw OpenError(open, true);
        if (Frames.Count > 0)
            throw new SectionTwistException("dxf-sheet",
                $"{file}: this looks like a drawing sheet: {Frames[0]}; choose the section: {ListParts(4)}, or a point with {_fix.At(r.Parts.Count > 0 ? r.Parts[0].Inside : default)}");
        if (r.MaxDepth >= 2)
        {
            var island = r.Parts.First(f => f.Depth >= 2);
            throw new SectionTwistException("dxf-island",
                $"{file}: {island.Entity} lies inside a hole of another part (a part inside a hole, or a frame around the drawing); choose one: {ListParts(4)}");
        }
        var all = r.Parts.Where(f => f.Depth == 0).ToList();
        StrayHoleCheck.Check(file, all.Select(r.ToRegion).ToList(), _asm.Loops, _asm.LoopLayers, unit);
        Selection = "all parts";
        if (all.Count > 1)
            Warnings.Add($"{all.Count} separate parts analysed together (their J add up): {ListParts(5)}; pick one with {_fix.Part(1)} or a point with {_fix.At(all[0].Inside)}");
        return all;
    }

    /// <summary>Loose pieces and junctions near the chosen regions decide whether the choice is sound.</summary>
    private void JudgeLeftovers(List<Face> faces, Box2 box)
    {
        bool all = o.At is null && o.Part is null;
        double grow = Math.Max(_snap, 1e-9 * Extent);
        bool Near(Box2 b) => all || b.Intersects(box, grow);
        if (!all)
            foreach (var j in _asm!.Junctions)
                if (Near(j.Bounds) && faces.Any(f => j.Bounds.Intersects(f.Bounds, grow) && !Encloses(j.Bounds, f.Bounds))) throw JunctionError(j, false);
        var open = new List<LooseGroup>();
        int away = 0;
        foreach (var g in _asm!.Loose)
        {
            if (!Near(g.Bounds)) { away += g.Segments.Length; continue; }
            if (g.Straight)
            {
                LeftOut.Add(new DxfLeftOut(Describe(g.Sources), g.Sources.Length, string.Join(", ", g.Layers), g.Bounds, "a straight line that closes nothing (a construction or centre line)"));
                continue;
            }
            open.Add(g);
        }
        var straight = LeftOut.Where(l => l.Reason.StartsWith("a straight", StringComparison.Ordinal)).ToList();
        if (straight.Count > 0)
            Warnings.Add($"left out {(straight.Count == 1 ? straight[0].Entities : $"{straight.Count} straight lines ({straight[0].Entities}, ...)")}: closes nothing (a construction or centre line?)");
        if (open.Count > 0)
        {
            if (!o.SkipOpen) throw OpenError(open, all);
            foreach (var g in open)
            {
                if (faces.Any(f => Encloses(g.Bounds, f.Bounds)) && NearlyClosed(g)) throw OpenError([g], all, surrounds: true);
                LeftOut.Add(new DxfLeftOut(Describe(g.Sources), g.Sources.Length, string.Join(", ", g.Layers), g.Bounds, "does not close (left out on request)"));
            }
            Warnings.Add($"left out {open.Sum(g => g.Sources.Length)} entities that do not close, on request: {Describe(open.SelectMany(g => g.Sources).ToList())}");
        }
        if (away > 0) Warnings.Add($"{away} outline piece(s) away from the chosen part were not used");
    }

    /// <summary>True when the group's free ends lie close together (an outline with a gap rather than a stray curve).</summary>
    private static bool NearlyClosed(LooseGroup g)
    {
        var ends = g.FreeEnds;
        double best = double.PositiveInfinity;
        for (int i = 0; i < ends.Length; i++)
            for (int j = i + 1; j < ends.Length; j++) best = Math.Min(best, Point2.Distance(ends[i].Where, ends[j].Where));
        return best < 0.1 * g.Bounds.Diagonal;
    }

    private static bool Encloses(Box2 outer, Box2 inner) => outer.Contains(inner, 0) && outer.Width * outer.Height > inner.Width * inner.Height * (1 + 1e-9);
}
