using SectionTwist.Bending;

namespace SectionTwist.Fatigue;

/// <summary>
/// The distortion-energy fatigue check point by point around a section of a rotating shaft (Budynas and Nisbett, Shigley's
/// Mechanical Engineering Design, 10th ed., sec. 7-4): at each boundary point the fully reversed bending amplitude
/// sigma_a = |M| |c(p)| and the steady stresses sigma_m = N / A, tau_m = |T| tau(p) give sigma_a' = K_f sigma_a and
/// sigma_m' = sqrt((K_f sigma_m)^2 + 3 (K_fs tau_m)^2); Goodman 1/n = sigma_a'/S_e + sigma_m'/S_ut (eq. 7-7) or ASME elliptic
/// 1/n = sqrt((sigma_a'/S_e)^2 + (sigma_m'/S_y)^2) (eq. 7-11); the smallest n over the boundary governs. For a round section this
/// is exactly the textbook 16 / (pi d^3) form.
/// </summary>
internal static class FatigueEvaluator
{
    public static (double N, double NYield, double SigmaA, double SigmaM, BoundarySample Where) Evaluate(
        BendingSection s, double axial, double moment, double torque, double kf, double kfs, double se, double sut, double? sy, FatigueCriterion criterion)
    {
        double best = double.PositiveInfinity, bestYield = double.PositiveInfinity, ba = 0, bm = 0;
        BoundarySample where = default;
        double sn = axial / s.Area;
        foreach (var p in s.PointSpan)
        {
            var (cx, cy) = s.Coefficients(p.X, p.Y);
            double sa = kf * Math.Abs(moment) * Math.Sqrt(cx * cx + cy * cy);
            double tm = kfs * Math.Abs(torque) * p.ShearPerTorque;
            double sm = Math.Sqrt(kf * sn * kf * sn + 3 * tm * tm);
            double inv = criterion == FatigueCriterion.Goodman
                ? sa / se + sm / sut
                : Math.Sqrt(sa / se * (sa / se) + (sy is { } y ? sm / y * (sm / y) : double.PositiveInfinity));
            double n = inv > 0 ? 1 / inv : double.PositiveInfinity;
            double smax = Math.Sqrt((sa + kf * Math.Abs(sn)) * (sa + kf * Math.Abs(sn)) + 3 * tm * tm);
            double ny = sy is { } yy && smax > 0 ? yy / smax : double.PositiveInfinity;
            if (n < best || (n == best && ny < bestYield)) { best = n; ba = sa; bm = sm; where = p; }
            bestYield = Math.Min(bestYield, ny);
        }
        return (best, bestYield, ba, bm, where);
    }
}
