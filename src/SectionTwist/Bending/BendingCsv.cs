using System.Globalization;
using System.Text;
using SectionTwist.Units;

namespace SectionTwist.Bending;

/// <summary>
/// The bending samples along the shaft as CSV (written as <c>bending.csv</c>) in the same <see cref="UnitSystem"/> as the
/// other shaft CSV files, the unit in each column name (<c>moment_Nm</c>, <c>deflection_y_in</c>, <c>von_mises_psi</c>);
/// slopes in rad. Numbers keep full precision.
/// </summary>
internal static class BendingCsv
{
    public static string Samples(BendingResult r, UnitSystem u)
    {
        string L(string name) => Shaft.ShaftResultCsv.Col(name, u.Length);
        string F(string name) => Shaft.ShaftResultCsv.Col(name, u.Force);
        string M(string name) => Shaft.ShaftResultCsv.Col(name, u.Torque);
        string S(string name) => Shaft.ShaftResultCsv.Col(name, u.Stress);
        var sb = new StringBuilder(
            $"{L("position")},segment,{F("shear_y")},{F("shear_z")},{M("moment_y")},{M("moment_z")},{M("moment")},{L("deflection_y")},{L("deflection_z")}," +
            $"slope_y_rad,slope_z_rad,{F("axial")},{M("torque")},{S("von_mises")},{S("tresca")},dominant,static_safety_factor,fatigue_safety_factor\n");
        foreach (var s in r.Samples)
            sb.Append(CultureInfo.InvariantCulture,
                $"{N(u.Length.FromSi(s.Position))},{Text(s.Segment)},{N(u.Force.FromSi(s.ShearY))},{N(u.Force.FromSi(s.ShearZ))},{N(u.Torque.FromSi(s.MomentY))},{N(u.Torque.FromSi(s.MomentZ))},{N(u.Torque.FromSi(s.Moment))}," +
                $"{N(u.Length.FromSi(s.DeflectionY))},{N(u.Length.FromSi(s.DeflectionZ))},{N(s.SlopeY)},{N(s.SlopeZ)},{N(u.Force.FromSi(s.AxialForce))},{N(u.Torque.FromSi(s.Torque))}," +
                $"{N(u.Stress.FromSi(s.Stress.VonMises))},{N(u.Stress.FromSi(s.Stress.Tresca))},{s.Stress.Dominant},{N(s.StaticSafetyFactor)},{N(s.FatigueSafetyFactor)}\n");
        return sb.ToString();
    }

    private static string N(double? v) => Shaft.ShaftResultCsv.N(v);

    private static string Text(string s) => Shaft.ShaftResultCsv.Text(s);
}
