using SectionTwist.Dynamics;

namespace SectionTwist.Tests.Dynamics;

/// <summary>
/// Three-disc systems checked by an independent Holzer tabulation written here (H. Holzer, Die Berechnung der Drehschwingungen,
/// Springer, 1921; the method as taught in vibration texts; common practice, no source for the numbers, which are test data):
/// for a trial frequency omega, start at one end with unit rotation, carry the inertia torques I omega^2 theta along the
/// chain and the twist torque / k across each spring; the residual at the far end (the torque past a free end, the
/// rotation at a fixed end) is zero exactly at a natural frequency. The roots are bracketed on a fine scan and bisected to
/// round-off, then compared with the eigen-solver. No published worked example is quoted: none could be checked here.
/// </summary>
public class HolzerTests
{
    /// <summary>Residual torque past the last disc of a free-free chain (theta_1 = 1).</summary>
    private static double FreeFreeResidual(double[] inertia, double[] k, double w)
    {
        double theta = 1, torque = 0;
        for (int j = 0; j < inertia.Length; j++)
        {
            torque += inertia[j] * w * w * theta;
            if (j < k.Length) theta -= torque / k[j];
        }
        return torque;
    }

    /// <summary>
    /// Rotation at the fixed end of a chain ground -k[0]- disc 0 -k[1]- disc 1 ... (last disc free), tabulated from the
    /// free end with unit rotation there.
    /// </summary>
    private static double FixedFreeResidual(double[] inertia, double[] k, double w)
    {
        double theta = 1, torque = 0;
        for (int j = inertia.Length - 1; j >= 0; j--)
        {
            torque += inertia[j] * w * w * theta;
            theta -= torque / k[j];
        }
        return theta;
    }

    /// <summary>Roots of <paramref name="f"/> on (0, top]: sign changes on a scan of <paramref name="steps"/> points, then bisection.</summary>
    private static List<double> Roots(Func<double, double> f, double top, int steps = 20000)
    {
        var roots = new List<double>();
        double a = top / steps * 1e-3, fa = f(a);
        for (int i = 1; i <= steps; i++)
        {
            double b = top * i / steps, fb = f(b);
            if (Math.Sign(fa) != Math.Sign(fb) && fa != 0)
            {
                double lo = a, hi = b, flo = fa;
                for (int it = 0; it < 200 && hi - lo > 1e-15 * hi; it++)
                {
                    double mid = 0.5 * (lo + hi), fm = f(mid);
                    if (Math.Sign(fm) == Math.Sign(flo)) { lo = mid; flo = fm; } else hi = mid;
                }
                roots.Add(0.5 * (lo + hi));
            }
            a = b; fa = fb;
        }
        return roots;
    }

    [Fact]
    public void Free_free_three_discs_match_a_Holzer_tabulation_with_bisection()
    {
        double[] inertia = [2.0, 0.6, 1.1], k = [4.2e4, 1.5e4];
        var model = new DrivetrainModel
        {
            Shafts = [TrainModels.SpringChain("s", ["a", "b", "c"], k)],
            Inertias = TrainModels.Inertias(("a", inertia[0]), ("b", inertia[1]), ("c", inertia[2])),
        };
        var r = ModalAnalysis.Solve(model, new ModalOptions { ModeCount = 2 });
        Assert.Equal(1, r.RigidBodyModes);
        // the scan's top: above the largest frequency, bounded by the largest sqrt(2 k / I_min) (Gershgorin)
        var roots = Roots(w => FreeFreeResidual(inertia, k, w), Math.Sqrt(2 * (k[0] + k[1]) / inertia.Min()));
        Assert.Equal(2, roots.Count);   // two elastic modes of three discs
        Tol.Rel(roots[0], r.Modes[1].AngularFrequency, 1e-9, "Holzer tabulation and bisection (Holzer 1921; common practice, no source)");
        Tol.Rel(roots[1], r.Modes[2].AngularFrequency, 1e-9, "Holzer tabulation and bisection (Holzer 1921; common practice, no source)");
        // the Holzer amplitudes are the mode shape: theta_2 / theta_1 = 1 - I1 w^2 / k1
        var shape = r.Modes[1].Stations;
        double ratio = 1 - inertia[0] * roots[0] * roots[0] / k[0];
        Tol.Rel(ratio, shape.Single(s => s.Station == "b").Rotation / shape.Single(s => s.Station == "a").Rotation, 1e-7, "Holzer amplitudes");
    }

    [Fact]
    public void Fixed_free_three_discs_match_a_Holzer_tabulation_with_bisection()
    {
        double[] inertia = [0.5, 0.25, 0.1], k = [1e5, 5e4, 2e4];
        var model = new DrivetrainModel
        {
            Shafts = [TrainModels.SpringChain("s", ["g", "a", "b", "c"], k)],
            Inertias = TrainModels.Inertias(("a", inertia[0]), ("b", inertia[1]), ("c", inertia[2])),
            FixedStations = ["g"],
        };
        var r = ModalAnalysis.Solve(model, new ModalOptions { ModeCount = 3 });
        Assert.Equal(0, r.RigidBodyModes);
        var roots = Roots(w => FixedFreeResidual(inertia, k, w), Math.Sqrt(2 * k.Max() / inertia.Min()) * 1.5);
        Assert.Equal(3, roots.Count);
        for (int q = 0; q < 3; q++)
            Tol.Rel(roots[q], r.Modes[q].AngularFrequency, 1e-9, "Holzer tabulation and bisection (Holzer 1921; common practice, no source)");
    }
}
