using SectionTwist.Torsion;
using SectionTwist.Units;

namespace SectionTwist.Cli;

/// <summary>The human-readable table for one section, in a <see cref="UnitSystem"/> (by default the profile's own).</summary>
internal static class SectionText
{
    public static void Write(TextWriter w, SectionResult r, string source, UnitSystem? units = null)
    {
        var u = units ?? UnitSystem.For(r.LengthUnit);
        var p = r.Properties;
        string L(double m) => u.Length.Format(m, 6);
        string I(double m4) => u.SecondMoment.Format(m4, 6);
        bool unbounded = double.IsPositiveInfinity(r.EstimatedRelativeError.MaxShear);
        string E(double v) => double.IsNaN(v) ? "n/a" : double.IsInfinity(v) ? "unbounded (sharp re-entrant corner)" : NumberText.Exponent(v, 2);
        w.WriteLine($"section {source}  (units {u.Name})");
        w.WriteLine($"  area A                    {u.Area.Format(p.Area, 6),14} {u.Area.Symbol}");
        w.WriteLine($"  centroid (x, y)           ({L(p.Centroid.X)}, {L(p.Centroid.Y)}) {u.Length.Symbol}");
        w.WriteLine($"  Ixx, Iyy (centroidal)     {I(p.Ixx),14}, {I(p.Iyy)} {u.SecondMoment.Symbol}");
        w.WriteLine($"  Ixy                       {I(p.Ixy),14} {u.SecondMoment.Symbol}");
        w.WriteLine(p.HasPrincipalAxes
            ? $"  I1, I2 (principal)        {I(p.I1),14}, {I(p.I2)} {u.SecondMoment.Symbol}, I1 about the axis at {NumberText.Format(p.PrincipalAngle * 180 / Math.PI, 6)} deg from x"
            : $"  I1 = I2 (principal)       {I(p.I1),14} {u.SecondMoment.Symbol} (equal: every centroidal axis is principal)");
        w.WriteLine($"  polar moment Ip           {I(p.PolarMoment),14} {u.SecondMoment.Symbol}");
        w.WriteLine($"  torsion constant J        {I(r.TorsionConstant),14} {u.SecondMoment.Symbol}   J/Ip = {NumberText.Fixed(r.TorsionConstant / p.PolarMoment, 4)}   est. rel. error {E(r.EstimatedRelativeError.TorsionConstant)}");
        w.WriteLine(unbounded
            ? $"  peak shear per torque     {"unbounded",14} at a sharp re-entrant corner ({u.ShearPerTorque.Format(r.MaxShearPerTorque, 6)} {u.ShearPerTorque.Symbol} on this mesh, growing with refinement)"
            : $"  peak shear per torque     {u.ShearPerTorque.Format(r.MaxShearPerTorque, 6),14} {u.ShearPerTorque.Symbol}   est. rel. error {E(r.EstimatedRelativeError.MaxShear)}");
        w.WriteLine(unbounded
            ? $"  torsional modulus T/tau   {"n/a",14} (the peak shear is unbounded)"
            : $"  torsional modulus T/tau   {u.SectionModulus.Format(r.TorsionalModulus, 6),14} {u.SectionModulus.Symbol}");
        w.WriteLine($"  peak shear at             ({L(r.MaxShearLocation.X)}, {L(r.MaxShearLocation.Y)}) {u.Length.Symbol}");
        if (r.RegionTorsionConstants.Count > 1)
            for (int i = 0; i < r.RegionTorsionConstants.Count; i++)
                w.WriteLine($"  J of part {i + 1,-3}             {I(r.RegionTorsionConstants[i]),14} {u.SecondMoment.Symbol}");
        if (r.Warping is { } wr) WriteWarping(w, u, wr);
        w.WriteLine($"  mesh                      {r.Mesh.Nodes} nodes, {r.Mesh.Elements} quadratic triangles, min angle {NumberText.Fixed(r.Mesh.MinAngleDeg, 1)} deg");
        foreach (var warn in r.Warnings) w.WriteLine($"  warning [{warn.Code}]: {warn.Message}");
        }

    private static void WriteWarping(TextWriter w, UnitSystem u, Warping.WarpingResult wr)
    {
        string L(double m) => u.Length.Format(m, 6);
        string E(double v, DisplayUnit unit) => double.IsNaN(v) ? "n/a" : $"{NumberText.Exponent(unit.FromSi(v), 2)} {unit.Symbol}";
        var e = wr.EstimatedError;
        // a coordinate within its estimated error of zero (the shear centre on an axis of symmetry) prints as 0
        string Lz(double v) => L(double.IsFinite(e.ShearCentre) && Math.Abs(v) <= e.ShearCentre ? 0 : v);
        w.WriteLine($"  shear centre (x, y)       ({Lz(wr.ShearCentre.X)}, {Lz(wr.ShearCentre.Y)}) {u.Length.Symbol}   est. error {E(e.ShearCentre, u.Length)}");
        w.WriteLine($"  warping constant Iw       {u.WarpingConstant.Format(wr.WarpingConstant, 6),14} {u.WarpingConstant.Symbol}   est. error {E(e.WarpingConstant, u.WarpingConstant)} (about the shear centre)");
        w.WriteLine($"  max |sectorial coord.|    {u.Area.Format(wr.MaxSectorialCoordinate, 6),14} {u.Area.Symbol} at ({L(wr.MaxSectorialCoordinateLocation.X)}, {L(wr.MaxSectorialCoordinateLocation.Y)}) {u.Length.Symbol}   est. error {E(e.MaxSectorialCoordinate, u.Area)}");
        string shear = double.IsPositiveInfinity(e.WarpingShearFactor)
            ? "unbounded (a sharp re-entrant corner; model the real fillet radius)"
            : $"{u.SectionModulus.Format(wr.WarpingShearFactor, 6),14} {u.SectionModulus.Symbol} at ({L(wr.WarpingShearFactorLocation.X)}, {L(wr.WarpingShearFactorLocation.Y)}) {u.Length.Symbol}   est. error {E(e.WarpingShearFactor, u.SectionModulus)}";
        w.WriteLine($"  warping shear factor q_w  {shear}   (warping shear = E |phi'''| q_w)");
        w.WriteLine($"  J from warping function   {u.SecondMoment.Format(wr.TorsionConstantUpperBound, 6),14} {u.SecondMoment.Symbol} (upper bound; the J above is the lower-bound solve, extrapolated)");
        w.WriteLine($"  warping length a (steel)  {u.Length.Format(wr.SteelWarpingLength, 6),14} {u.Length.Symbol}   a = sqrt(E Iw / (G J)), E/G = 2.6");
        string verdict = wr.Classification == Warping.WarpingClass.WarpingSensitive
            ? "open thin-walled: restrained warping at supports and loads changes twist and adds normal stress; T L / (G J) alone can be far off"
            : "warping torsion negligible (solid or closed, or open with all walls meeting at one point: angle, tee, cruciform), Saint-Venant torsion applies";
        w.WriteLine($"  warping ratio Iw/(J rp^2) {NumberText.Format(wr.WarpingRatio, 6),14}   {verdict}");
        if (wr.Classification == Warping.WarpingClass.WarpingSensitive)
            w.WriteLine("  caution: lateral-torsional buckling, local buckling and connection design are not checked; follow the local steel design code");
    }
}
