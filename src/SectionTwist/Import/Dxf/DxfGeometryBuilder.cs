using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// Turns model-space entities into outline curves in world coordinates: LINE, ARC, CIRCLE, LWPOLYLINE, 2D/3D POLYLINE,
/// SPLINE, ELLIPSE, and INSERT (expanded recursively with base point, scale, rotation, arrays and OCS, cycles detected).
/// Entities on layer 0 inside a block take the layer of the INSERT. Paper-space entities, text, dimensions, hatches and
/// similar annotation are counted and ignored; unknown types are listed once as skipped. With <paramref name="hatches"/>
/// the boundary paths of HATCH entities become the outline curves instead (section views hatch the cut material).
/// Curves on layers outside the choice go to <see cref="OtherCurves"/> (a broken entity there is ignored, not fatal).
/// </summary>
internal sealed partial class DxfGeometryBuilder(DxfDocument doc, Func<string, bool>? layerChosen, bool hatches = false, CancellationToken ct = default)
{
    /// <summary>Most outline curves one drawing may produce (guards against huge arrays and runaway nesting).</summary>
    public const int MaxCurves = Limits.InputLimits.MaxDxfPieces;
    private const int MaxDepth = Limits.InputLimits.MaxDxfBlockDepth;
    private int _emitted;

    private static readonly HashSet<string> Annotation = new(StringComparer.Ordinal)
    {
        "TEXT", "MTEXT", "DIMENSION", "ARC_DIMENSION", "LARGE_RADIAL_DIMENSION", "HATCH", "MPOLYGON", "POINT", "ATTDEF",
        "ATTRIB", "LEADER", "MLEADER", "MULTILEADER", "TOLERANCE", "VIEWPORT", "IMAGE", "WIPEOUT", "XLINE", "RAY", "SOLID",
        "TRACE", "3DFACE", "OLE2FRAME", "OLEFRAME", "SHAPE", "UNDERLAY", "PDFUNDERLAY", "DWFUNDERLAY", "DGNUNDERLAY", "TABLE",
        "ACAD_TABLE", "HELIX", "REGION", "3DSOLID", "BODY", "SURFACE", "MESH", "LIGHT", "SECTION",
    };

    private readonly Stack<string> _blocks = new();
    private readonly HashSet<string> _warnedUnknown = new(StringComparer.Ordinal);

    public List<SourcedCurve> Curves { get; } = [];
    /// <summary>Outline curves on layers outside the choice (for the check that a layer choice leaves no loop behind).</summary>
    public List<SourcedCurve> OtherCurves { get; } = [];
    /// <summary>Insertion points of TEXT and MTEXT (world coordinates) with the entity, for the sheet check.</summary>
    public List<(Point2 Where, string Source)> TextPoints { get; } = [];
    /// <summary>HATCH entities seen in model space (expanded blocks included).</summary>
    public int HatchCount { get; private set; }
    /// <summary>Model-space entity counts by type (top level, before block expansion).</summary>
    public SortedDictionary<string, int> EntityCounts { get; } = new(StringComparer.Ordinal);
    /// <summary>Model-space entity counts by layer (top level).</summary>
    public SortedDictionary<string, int> LayerCounts { get; } = new(StringComparer.OrdinalIgnoreCase);
    /// <summary>Types not used for the outline (annotation and unknown types), once each.</summary>
    public SortedSet<string> Skipped { get; } = new(StringComparer.Ordinal);
    public List<string> Warnings { get; } = [];
    public int PaperSpaceSkipped { get; private set; }
    public bool NonPlanar { get; private set; }

    private string File => doc.File;

    public void Run()
    {
        foreach (var e in doc.Entities)
        {
            if (e.PaperSpace) { PaperSpaceSkipped++; continue; }
            EntityCounts[e.Type] = EntityCounts.GetValueOrDefault(e.Type) + 1;
            LayerCounts[e.Layer] = LayerCounts.GetValueOrDefault(e.Layer) + 1;
            Emit(e, Affine2.Identity, null, "");
        }
    }

    private void Emit(DxfEntity e, Affine2 m, string? insertLayer, string where)
    {
        if ((++_emitted & 4095) == 0) ct.ThrowIfCancellationRequested();
        if (e.PaperSpace) return;
        string layer = insertLayer is not null && e.Layer == "0" ? insertLayer : e.Layer;
        if (e.Type == "INSERT") { ExpandInsert(e, m, layer, where); return; }
        if (e.Type == "HATCH") HatchCount++;
        if (e.Type is "TEXT" or "MTEXT") TextPoints.Add((m.Apply(e.Pt(10)), e.Describe() + where));
        if (hatches)
        {
            if (e.Type == "HATCH") Guarded(e, m, layer, where, Hatch);
            else if (!Annotation.Contains(e.Type)) Skipped.Add(e.Type);
            return;
        }
        if (Annotation.Contains(e.Type)) { Skipped.Add(e.Type); return; }
        bool known = e.Type is "LINE" or "ARC" or "CIRCLE" or "LWPOLYLINE" or "POLYLINE" or "SPLINE" or "ELLIPSE";
        if (!known)
        {
            Skipped.Add(e.Type);
            if (_warnedUnknown.Add(e.Type)) Warnings.Add($"skipped entity type {e.Type} (first at line {e.Line}): not used for outlines");
            return;
        }
        Guarded(e, m, layer, where, EmitCurve);
    }

    /// <summary>
    /// Runs one entity's reader: curves on a chosen layer go to <see cref="Curves"/> and a geometry error there is fatal
    /// (named with the entity); curves on other layers go to <see cref="OtherCurves"/> and a geometry error there only
    /// drops that entity.
    /// </summary>
    private void Guarded(DxfEntity e, Affine2 m, string layer, string where, Action<DxfEntity, Affine2, string, string> read)
    {
        string src = e.Describe() + where;
        bool chosen = layerChosen?.Invoke(layer) ?? true;
        if (chosen)
        {
            try { read(e, m, src, layer); }
            catch (SectionTwistException x) when (x.Code is "bad-arc" or "bad-ellipse" or "dxf-degenerate" or "bad-spline")
            {
                throw new SectionTwistException(x.Code, $"{File}: {src}: {x.Message}");
            }
            return;
        }
        int before = Curves.Count, warnings = Warnings.Count;
        try { read(e, m, src, layer); }
        catch (SectionTwistException x) when (x.Code is "bad-arc" or "bad-ellipse" or "dxf-degenerate" or "bad-spline" or "bad-dxf-number" or "bad-hatch") { }
        for (int i = before; i < Curves.Count; i++) OtherCurves.Add(Curves[i]);
        Curves.RemoveRange(before, Curves.Count - before);
        Warnings.RemoveRange(warnings, Warnings.Count - warnings);
    }

    private void EmitCurve(DxfEntity e, Affine2 m, string src, string layer)
    {
        switch (e.Type)
        {
            case "LINE": Line(e, m, src, layer); break;
            case "ARC": case "CIRCLE": ArcOrCircle(e, m, src, layer); break;
            case "LWPOLYLINE": LwPolyline(e, m, src, layer); break;
            case "POLYLINE": Polyline(e, m, src, layer); break;
            case "SPLINE": Spline(e, m, src, layer); break;
            case "ELLIPSE": Ellipse(e, m, src, layer); break;
        }
    }

    private void Add(Segment s, string src, string layer)
    {
        if (Curves.Count + OtherCurves.Count >= MaxCurves)
            throw new SectionTwistException("dxf-too-large", $"{File}: the drawing expands to more than {MaxCurves} outline pieces (huge block arrays?); export only the section outline");
        var b = s.Bounds;
        if (!double.IsFinite(b.MinX + b.MaxX + b.MinY + b.MaxY) || Math.Max(Math.Abs(b.MinX), Math.Max(Math.Abs(b.MaxX), Math.Max(Math.Abs(b.MinY), Math.Abs(b.MaxY)))) > 1e30)
            throw new SectionTwistException("dxf-degenerate", $"{File}: {src} lies beyond 1e30 drawing units after block scaling; check the insert scales");
        Curves.Add(new SourcedCurve(s, null, src, layer));
    }

    private Affine2 OcsMap(DxfEntity e, Affine2 m, double elevation)
    {
        var ocs = Ocs.ToWorld(e.Extrusion, elevation, out bool planar);
        if (!planar && !NonPlanar)
        {
            NonPlanar = true;
            Warnings.Add($"{e.Describe()} is not in the XY plane (extrusion {e.Extrusion}); projected onto XY");
        }
        return m.After(ocs);
    }

    private void Line(DxfEntity e, Affine2 m, string src, string layer)
    {
        Point2 a = m.Apply(e.Pt(10)), b = m.Apply(e.Pt(11));
        if (a == b) { Warnings.Add($"{src}: zero-length line ignored"); return; }
        Add(new LineSegment(a, b), src, layer);
    }

    private void ArcOrCircle(DxfEntity e, Affine2 m, string src, string layer)
    {
        double r = e.Dbl(40, 0);
        if (!(r > 0)) { Warnings.Add($"{src}: radius {r} is not positive; ignored"); return; }
        var c = e.Pt(10);
        double a0 = 0, sweep = 2 * Math.PI;
        if (e.Type == "ARC")
        {
            double d0 = e.Dbl(50, 0), d1 = e.Dbl(51, 360);
            double dsweep = (d1 - d0) % 360.0;
            if (dsweep < 0) dsweep += 360.0;
            if (dsweep < 1e-12) { Warnings.Add($"{src}: start and end angles are equal ({d0} deg); ignored"); return; }
            a0 = Deg(d0);
            sweep = Deg(dsweep);
        }
        var arc = new ArcSegment(c, r, a0, sweep);
        Add(Conics.Map(arc, OcsMap(e, m, e.Z(10))), src, layer);
    }

    /// <summary>Degrees to radians, exact at multiples of 90 degrees up to rounding of pi.</summary>
    private static double Deg(double d) => d * (Math.PI / 180.0);

    private void Segments(List<(Point2 P, double Bulge)> v, bool closed, Affine2 map, string src, string layer)
    {
        // closing by a repeated first vertex
        if (v.Count > 2 && v[^1].P == v[0].P) { closed = true; v.RemoveAt(v.Count - 1); }
        int n = v.Count;
        if (n < 2) { Warnings.Add($"{src}: fewer than two vertices; ignored"); return; }
        int segs = closed ? n : n - 1;
        for (int i = 0; i < segs; i++)
        {
            Point2 a = v[i].P, b = v[(i + 1) % n].P;
            if (a == b) continue;
            double bulge = v[i].Bulge;
            Segment s = bulge == 0 || Math.Abs(bulge) < 1e-12 ? new LineSegment(a, b) : ArcSegment.FromBulge(a, b, Math.Clamp(bulge, -1e6, 1e6));
            Add(Conics.Map(s, map), src + (segs > 1 ? $" segment {i + 1}" : ""), layer);
        }
    }

    private void LwPolyline(DxfEntity e, Affine2 m, string src, string layer)
    {
        var v = new List<(Point2 P, double Bulge)>();
        var ps = e.Pairs;
        for (int i = 0; i < ps.Count; i++)
        {
            if (ps[i].Code == 10)
            {
                double x = ps[i].AsDouble(File), y = 0;
                if (i + 1 < ps.Count && ps[i + 1].Code == 20) y = ps[i + 1].AsDouble(File);
                v.Add((new Point2(x, y), 0));
            }
            else if (ps[i].Code == 42 && v.Count > 0) v[^1] = (v[^1].P, ps[i].AsDouble(File));
        }
        bool closed = (e.Int(70, 0) & 1) != 0;
        Segments(v, closed, OcsMap(e, m, e.Dbl(38, 0)), src, layer);
    }

    private void Polyline(DxfEntity e, Affine2 m, string src, string layer)
    {
        int flags = e.Int(70, 0);
        if ((flags & (16 | 64)) != 0)
        {
            Skipped.Add("POLYLINE (mesh/polyface)");
            Warnings.Add($"{src}: a polygon mesh or polyface is not an outline; ignored");
            return;
        }
        bool is3d = (flags & 8) != 0;
        var v = new List<(Point2 P, double Bulge)>();
        foreach (var vx in e.Vertices)
        {
            int vf = vx.Int(70, 0);
            if ((vf & 16) != 0) continue; // spline frame control point
            v.Add((vx.Pt(10), is3d ? 0 : vx.Dbl(42, 0)));
        }
        var map = is3d ? m : OcsMap(e, m, e.Z(10));
        Segments(v, (flags & 1) != 0, map, src, layer);
    }

    private void Ellipse(DxfEntity e, Affine2 m, string src, string layer)
    {
        var c = e.Pt(10);
        var major = e.Pt(11);
        double ratio = e.Dbl(40, 1);
        var (nx, ny, nz) = e.Extrusion;
        double nl = Math.Sqrt(nx * nx + ny * ny + nz * nz);
        if (!(nl > 0)) { nx = 0; ny = 0; nz = 1; nl = 1; }
        nz /= nl;
        if (major.Length == 0 || !(ratio >= 1e-3) || ratio > 1e3) { Warnings.Add($"{src}: degenerate ellipse (axis ratio {ratio}) ignored"); return; }
        // minor = ratio * (N x major); only its XY part matters (major has no Z for a planar ellipse)
        var minor = new Point2(-nz * major.Y, nz * major.X) * ratio;
        double s = e.Dbl(41, 0), t = e.Dbl(42, 2 * Math.PI);
        double sweep = t - s;
        if (Math.Abs(sweep) >= 2 * Math.PI - 1e-12) sweep = 2 * Math.PI;
        else { sweep %= 2 * Math.PI; if (sweep <= 1e-12) sweep += 2 * Math.PI; }
        Add(Conics.Arc(m.Apply(c), m.ApplyVector(major), m.ApplyVector(minor), s, sweep), src, layer);
    }
}
