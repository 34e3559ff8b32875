using System.Globalization;
using System.Text;

namespace SectionTwist.Bending;

/// <summary>The bending samples along the shaft as CSV, SI units in the column names (written as <c>bending.csv</c>).</summary>
internal static class BendingCsv
{
    public static string Samples(BendingResult r)
    {
        var sb = new StringBuilder("position_m,segment,shear_y_N,shear_z_N,moment_y_Nm,moment_z_Nm,moment_Nm,deflection_y_m,deflection_z_m,slope_y_rad,slope_z_rad,axial_N,torque_Nm,von_mises_Pa,tresca_Pa,dominant,static_safety_factor,fatigue_safety_factor\n");
        foreach (var s in r.Samples)
            sb.Append(CultureInfo.InvariantCulture,
                $"{N(s.Position)},{Text(s.Segment)},{N(s.ShearY)},{N(s.ShearZ)},{N(s.MomentY)},{N(s.MomentZ)},{N(s.Moment)},{N(s.DeflectionY)},{N(s.DeflectionZ)},{N(s.SlopeY)},{N(s.SlopeZ)},{N(s.AxialForce)},{N(s.Torque)},{N(s.Stress.VonMises)},{N(s.Stress.Tresca)},{s.Stress.Dominant},{N(s.StaticSafetyFactor)},{N(s.FatigueSafetyFactor)}\n");
        return sb.ToString();
    }

    private static string N(double? v) => Shaft.ShaftResultCsv.N(v);

    private static string Text(string s) => Shaft.ShaftResultCsv.Text(s);
}
