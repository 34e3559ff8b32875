using System.Globalization;
using SectionTwist.Torsion;

namespace SectionTwist.Cli;

/// <summary>The human-readable table for one section, in the profile's unit.</summary>
internal static class SectionText
{
    public static void Write(TextWriter w, SectionResult r, string source)
    {
        var u = r.LengthUnit;
        double l = u.Metres;
        string s = u.Symbol;
        var p = r.Properties;
        string F(double v) => v.ToString("G6", CultureInfo.InvariantCulture);
        string E(double v) => double.IsNaN(v) ? "n/a" : double.IsInfinity(v) ? "unbounded (singular corner)" : v.ToString("0.0E+0", CultureInfo.InvariantCulture);
        w.WriteLine($"section {source}  (lengths in {s})");
        w.WriteLine($"  area A                    {F(p.Area / (l * l)),14} {s}^2");
        w.WriteLine($"  centroid (x, y)           ({F(p.Centroid.X / l)}, {F(p.Centroid.Y / l)}) {s}");
        w.WriteLine($"  Ixx, Iyy (centroidal)     {F(p.Ixx / Math.Pow(l, 4)),14}, {F(p.Iyy / Math.Pow(l, 4))} {s}^4");
        w.WriteLine($"  Ixy                       {F(p.Ixy / Math.Pow(l, 4)),14} {s}^4");
        w.WriteLine($"  I1, I2 (principal)        {F(p.I1 / Math.Pow(l, 4)),14}, {F(p.I2 / Math.Pow(l, 4))} {s}^4 at {F(p.PrincipalAngle * 180 / Math.PI)} deg");
        w.WriteLine($"  polar moment Ip           {F(p.PolarMoment / Math.Pow(l, 4)),14} {s}^4");
        w.WriteLine($"  torsion constant J        {F(r.TorsionConstant / Math.Pow(l, 4)),14} {s}^4   J/Ip = {r.TorsionConstant / p.PolarMoment:F4}   est. rel. error {E(r.EstimatedRelativeError.TorsionConstant)}");
        w.WriteLine($"  peak shear per torque     {F(r.MaxShearPerTorque * 1e-3),14} MPa per kN*m   est. rel. error {E(r.EstimatedRelativeError.MaxShear)}");
        w.WriteLine($"  torsional modulus T/tau   {F(r.TorsionalModulus / Math.Pow(l, 3)),14} {s}^3");
        w.WriteLine($"  peak shear at             ({F(r.MaxShearLocation.X / l)}, {F(r.MaxShearLocation.Y / l)}) {s}");
        if (r.RegionTorsionConstants.Count > 1)
            for (int i = 0; i < r.RegionTorsionConstants.Count; i++)
                w.WriteLine($"  J of part {i + 1,-3}             {F(r.RegionTorsionConstants[i] / Math.Pow(l, 4)),14} {s}^4");
        if (r.Warping is { } wr) WriteWarping(w, r, wr);
        w.WriteLine($"  mesh                      {r.Mesh.Nodes} nodes, {r.Mesh.Elements} quadratic triangles, min angle {r.Mesh.MinAngleDeg:F1} deg");
        foreach (var warn in r.Warnings) w.WriteLine($"  warning [{warn.Code}]: {warn.Message}");
        }

    private static void WriteWarping(TextWriter w, SectionResult r, Warping.WarpingResult wr)
    {
        var u = r.LengthUnit;
        double l = u.Metres;
        string s = u.Symbol;
        string F(double v) => v.ToString("G6", CultureInfo.InvariantCulture);
        string E(double v) => double.IsNaN(v) ? "n/a" : v.ToString("0.0E+0", CultureInfo.InvariantCulture);
        var e = wr.EstimatedError;
        w.WriteLine($"  shear centre (x, y)       ({F(wr.ShearCentre.X / l)}, {F(wr.ShearCentre.Y / l)}) {s}   est. error {E(e.ShearCentre / l)} {s}");
        w.WriteLine($"  warping constant Iw       {F(wr.WarpingConstant / Math.Pow(l, 6)),14} {s}^6   est. error {E(e.WarpingConstant / Math.Pow(l, 6))} {s}^6 (about the shear centre)");
        w.WriteLine($"  max |sectorial coord.|    {F(wr.MaxSectorialCoordinate / (l * l)),14} {s}^2 at ({F(wr.MaxSectorialCoordinateLocation.X / l)}, {F(wr.MaxSectorialCoordinateLocation.Y / l)}) {s}   est. error {E(e.MaxSectorialCoordinate / (l * l))} {s}^2");
        w.WriteLine($"  J from warping function   {F(wr.TorsionConstantUpperBound / Math.Pow(l, 4)),14} {s}^4 (upper bound; the J above is the lower-bound solve, extrapolated)");
        w.WriteLine($"  warping length a (steel)  {F(wr.SteelWarpingLength / l),14} {s}   a = sqrt(E Iw / (G J)), E/G = 2.6");
        string verdict = wr.Classification == Warping.WarpingClass.WarpingSensitive
            ? "open thin-walled: restrained warping at supports and loads changes twist and adds normal stress; T L / (G J) alone can be far off"
            : "solid or closed: warping torsion negligible, Saint-Venant torsion applies";
        w.WriteLine($"  warping ratio Iw/(J rp^2) {F(wr.WarpingRatio),14}   {verdict}");
        if (wr.Classification == Warping.WarpingClass.WarpingSensitive)
            w.WriteLine("  caution: lateral-torsional buckling, local buckling and connection design are not checked; follow the local steel design code");
    }
}
