namespace SectionTwist.Keys;

/// <summary>Evaluates key and spline checks (formulas and sources on <see cref="ParallelKey"/> and <see cref="SplineConnection"/>).</summary>
public static class ConnectionCalculator
{
    /// <summary>Checks <paramref name="check"/> under torque <paramref name="torque"/> (N*m) on a shaft of diameter <paramref name="sectionDiameter"/> (m).</summary>
    public static ConnectionResult Evaluate(ConnectionCheck check, double torque, double sectionDiameter)
    {
        ArgumentNullException.ThrowIfNull(check);
        double t = Math.Abs(torque);
        switch (check)
        {
            case ParallelKey k:
                {
                    double d = k.Diameter ?? sectionDiameter;
                    if (!(k.Width > 0 && k.Height > 0 && k.Length > 0 && d > 0 && k.ShaftDepth > 0 && k.ShaftDepth < k.Height))
                        throw new SectionTwistException("bad-key", $"key on segment '{k.Segment}': width, height, length and diameter must be positive and the shaft depth t1 between 0 and the height");
                    if (k.Count is < 1 or > 2)
                        throw new SectionTwistException("bad-key", $"key on segment '{k.Segment}': count {k.Count}: one or two keys (more do not share the torque reliably)");
                    double share = k.Count == 1 ? 1 : 2 * 0.75;
                    double f = 2 * t / d / share;
                    return new ConnectionResult
                    {
                        Label = k.Name ?? $"key {k.Segment}",
                        Kind = "parallel key",
                        Segment = k.Segment,
                        Torque = t,
                        Shear = f / (k.Length * k.Width),
                        Pressure = f / (k.Length * (k.Height - k.ShaftDepth)),
                        ShaftPressure = f / (k.Length * k.ShaftDepth),
                        AllowablePressure = k.AllowablePressure,
                        AllowableShear = k.AllowableShear,
                        Method = "shear 2T/(d l b), hub 2T/(d l (h - t1)), shaft 2T/(d l t1) (Shigley 10th ed. sec. 7-7; DIN 6892 method C; from memory)" +
                                 (k.Count == 2 ? "; two keys carry 2 x 0.75 of one (DIN 6892, from memory)" : ""),
                    };
                }
            case SplineConnection s:
                {
                    if (!(s.Teeth > 0 && s.MeanDiameter > 0 && s.ContactHeight > 0 && s.Length > 0 && s.LoadShare > 0 && s.LoadShare <= 1))
                        throw new SectionTwistException("bad-spline", $"spline on segment '{s.Segment}': teeth, mean diameter, contact height and length must be positive and the load share in (0, 1]");
                    return new ConnectionResult
                    {
                        Label = s.Name ?? $"spline {s.Segment}",
                        Kind = $"{s.Kind} spline",
                        Segment = s.Segment,
                        Torque = t,
                        Pressure = 2 * t / (s.MeanDiameter * s.Length * s.ContactHeight * s.Teeth * s.LoadShare),
                        AllowablePressure = s.AllowablePressure,
                        Method = $"p = 2T/(d_m l h z phi), phi = {s.LoadShare} (load share; 0.75 common practice, Roloff/Matek, from memory)",
                    };
                }
            default:
                throw new SectionTwistException("bad-connection", $"unsupported connection {check.GetType().Name}");
        }
    }
}
