namespace SectionTwist.Tests.Import;

/// <summary>
/// Small drawings of our own making that reproduce what real CAD output does to a section reader (invented geometry of
/// the winch and conveyor scenario; the expected areas are elementary geometry, named beside each check).
/// </summary>
internal static class RegressionDrawings
{
    /// <summary>Tube R = 20, r = 8 of the sheet's section view, centred at (100, 80).</summary>
    public const double TubeR = 20, TubeBore = 8, TubeX = 100, TubeY = 80;

    /// <summary>Hex bar across flats 30 mm of the sheet's second view, centred at (300, 150).</summary>
    public const double HexFlats = 30, HexX = 300, HexY = 150;

    /// <summary>pi (R^2 - r^2).</summary>
    public static double TubeArea => Math.PI * (TubeR * TubeR - TubeBore * TubeBore);

    /// <summary>Regular hexagon of width across flats s: (sqrt 3 / 2) s^2.</summary>
    public static double HexArea => Math.Sqrt(3) / 2 * HexFlats * HexFlats;

    /// <summary>
    /// An A3 sheet (420 x 297): trim frame of LINEs, drawing border (closed LWPOLYLINE), title block of lines ending on
    /// the border (T-junctions), title text, a DIMENSION, a front view of a stepped shaft drawn as rectangles sharing an
    /// edge (junctions), a section view (tube of CIRCLEs with centre lines and a HATCH of the cut material) and an end
    /// view of a hex bar (LINEs).
    /// </summary>
    public static DxfText Sheet(bool withHatch = true, int? insUnits = 4)
    {
        var d = new DxfText().Header(insUnits, "AC1015").Entities();
        d.Rect(0, 0, 420, 297, "FRAME");
        d.Polygon("BORDER", [(10, 10), (410, 10), (410, 287), (10, 287)]);
        d.Line(250, 10, 250, 60, "TITLE").Line(250, 60, 410, 60, "TITLE").Line(250, 35, 410, 35, "TITLE").Line(330, 10, 330, 35, "TITLE");
        d.Text(260, 45, "WINCH DRUM SHAFT", "TITLE").Text(340, 20, "SHEET 1/1", "TITLE").Text(80, 115, "SECTION A-A", "TEXT");
        d.Dimension(40, 150, 180, 150);
        // front view: two steps sharing the edge x = 100 (three ends meet at (100, 155) and (100, 185))
        d.Line(40, 150, 100, 150, "VIEW").Line(100, 150, 100, 155, "VIEW").Line(100, 155, 100, 185, "VIEW").Line(100, 185, 100, 190, "VIEW")
            .Line(100, 190, 40, 190, "VIEW").Line(40, 190, 40, 150, "VIEW")
            .Line(100, 155, 180, 155, "VIEW").Line(180, 155, 180, 185, "VIEW").Line(180, 185, 100, 185, "VIEW");
        // section view: tube with centre lines
        d.Circle(TubeX, TubeY, TubeR, "VIEW").Circle(TubeX, TubeY, TubeBore, "VIEW");
        d.Line(TubeX - 25, TubeY, TubeX + 25, TubeY, "CENTER").Line(TubeX, TubeY - 25, TubeX, TubeY + 25, "CENTER");
        if (withHatch)
            d.HatchPolylines("HATCH",
                [(TubeX + TubeR, TubeY, 1), (TubeX - TubeR, TubeY, 1)],
                [(TubeX + TubeBore, TubeY, 1), (TubeX - TubeBore, TubeY, 1)]);
        // end view: hexagon across flats 30 (corners at radius s / sqrt 3)
        double rc = HexFlats / Math.Sqrt(3);
        var hex = Enumerable.Range(0, 6).Select(k => (HexX + rc * Math.Cos(k * Math.PI / 3), HexY + rc * Math.Sin(k * Math.PI / 3))).ToArray();
        for (int k = 0; k < 6; k++) d.Line(hex[k].Item1, hex[k].Item2, hex[(k + 1) % 6].Item1, hex[(k + 1) % 6].Item2, "VIEW");
        return d.End();
    }

    /// <summary>Vertices of a polygon with <paramref name="n"/> corners on a circle (a circle exported as facets).</summary>
    public static IEnumerable<(double X, double Y)> Facets(double cx, double cy, double r, int n, double from = 0, double sweep = 2 * Math.PI, bool closed = true)
    {
        int count = closed ? n : n + 1;
        for (int k = 0; k < count; k++)
        {
            double a = from + sweep * k / n;
            yield return (cx + r * Math.Cos(a), cy + r * Math.Sin(a));
        }
    }
}
