using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>INSERT expansion and SPLINE reading.</summary>
internal sealed partial class DxfGeometryBuilder
{
    /// <summary>
    /// Expands an INSERT: world = M . OCS . T(insertion) . R(rotation) . T(column i * 44, row j * 45) . S(41, 42) . T(-base),
    /// so array spacing runs along the rotated axes (DXF reference, INSERT group codes 41-45, 50, 70, 71).
    /// </summary>
    private void ExpandInsert(DxfEntity e, Affine2 m, string layer, string where)
    {
        string name = e.Str(2) ?? "";
        if (!doc.Blocks.TryGetValue(name, out var block))
        {
            Warnings.Add($"{e.Describe()}{where}: block '{name}' is not defined; insert ignored");
            return;
        }
        if (_blocks.Contains(name, StringComparer.OrdinalIgnoreCase))
            throw new SectionTwistException("dxf-block-cycle",
                $"{File}: block '{name}' inserts itself ({string.Join(" -> ", _blocks.Reverse().Append(name))}) at {e.Describe()}; fix the block definitions");
        if (_blocks.Count >= MaxDepth)
            throw new SectionTwistException("dxf-block-depth", $"{File}: blocks nest deeper than {MaxDepth} levels at {e.Describe()}; explode the blocks in CAD");
        double sx = e.Dbl(41, 1), sy = e.Dbl(42, 1);
        if (sx == 0 || sy == 0) { Warnings.Add($"{e.Describe()}{where}: scale factor 0; insert ignored"); return; }
        int cols = Math.Max(1, e.Int(70, 1)), rows = Math.Max(1, e.Int(71, 1));
        if ((long)cols * rows * Math.Max(1, block.Entities.Count) > MaxCurves)
            throw new SectionTwistException("dxf-too-large",
                $"{File}: {e.Describe()} repeats block '{name}' {cols} x {rows} times; that is more than {MaxCurves} pieces - export only the section outline");
        double cs = e.Dbl(44, 0), rs = e.Dbl(45, 0);
        var ins = e.Pt(10);
        var ocs = OcsMap(e, m, e.Z(10));
        var rot = Affine2.Rotation(e.Dbl(50, 0) * (Math.PI / 180.0));
        var inner = Affine2.Scaling(sx, sy).After(Affine2.Translation(-block.Base));
        _blocks.Push(name);
        try
        {
            for (int j = 0; j < rows; j++)
                for (int i = 0; i < cols; i++)
                {
                    var copy = ocs.After(Affine2.Translation(ins)).After(rot).After(Affine2.Translation(new Point2(i * cs, j * rs))).After(inner);
                    string via = $" in block '{name}' via {e.Describe()}{(cols * rows > 1 ? $" copy {j * cols + i + 1}" : "")}{where}";
                    foreach (var be in block.Entities) Emit(be, copy, layer, via);
                }
        }
        finally { _blocks.Pop(); }
    }

    /// <summary>
    /// SPLINE: degree 71, knots 40, weights 41, control points 10/20, fit points 11/21 (world coordinates). With valid
    /// control data the NURBS is used as is; with fit points only, a spline of the same degree (cubic by default)
    /// interpolates them (<see cref="SplineInterpolation"/>). Closed fit splines repeat the first point at the end.
    /// </summary>
    private void Spline(DxfEntity e, Affine2 m, string src, string layer)
    {
        int flags = e.Int(70, 0);
        int degree = e.Int(71, 3);
        var knots = e.All(40).ToArray();
        var weights = e.All(41).ToArray();
        var ctrl = e.Points(10);
        var fit = e.Points(11);
        NurbsCurve curve;
        string? problem = ctrl.Count > 0 ? NurbsCurve.Check(degree, knots, ctrl.Count, weights.Length > 0 ? weights : null) : "no control points";
        if (problem is null)
        {
            bool rational = weights.Length > 0 && weights.Any(w => w != weights[0]);
            curve = new NurbsCurve(degree, knots, ctrl.ToArray(), rational ? weights : null);
        }
        else if (fit.Count >= 2)
        {
            if ((flags & 1) != 0 && fit[^1] != fit[0]) fit.Add(fit[0]);
            if (fit.Count > 100_000) throw new SectionTwistException("dxf-too-large", $"{File}: {src} has {fit.Count} fit points; simplify the spline");
            curve = SplineInterpolation.Interpolate(fit, degree is >= 1 and <= 5 ? degree : 3);
        }
        else
            throw new SectionTwistException("bad-spline",
                $"{File}: {src}: cannot build the spline: {problem}, and fewer than two fit points; re-export the spline or convert it to a polyline");
        if (Curves.Count >= MaxCurves)
            throw new SectionTwistException("dxf-too-large", $"{File}: the drawing expands to more than {MaxCurves} outline pieces; export only the section outline");
        Curves.Add(new SourcedCurve(null, curve.Transformed(m), src, layer));
    }
}
