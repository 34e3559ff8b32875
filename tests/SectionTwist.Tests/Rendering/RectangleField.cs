using SectionTwist.Geometry;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Rendering;

/// <summary>
/// A known field for picture tests: the exact Saint-Venant solution of a solid rectangle |x| &lt;= L, |y| &lt;= s
/// (L &gt;= s), Prandtl stress function as the series of S. P. Timoshenko and J. N. Goodier, Theory of Elasticity,
/// 3rd ed., McGraw-Hill 1970, section 109 (eqs. for the rectangular bar), for G * theta = 1:
/// phi = (32 s^2 / pi^3) sum_{n odd} (-1)^((n-1)/2) / n^3 [1 - cosh(n pi x / 2s) / cosh(n pi L / 2s)] cos(n pi y / 2s),
/// J = (1/3)(2s)^3 (2L) [1 - (192/pi^5)(s/L) sum_{n odd} tanh(n pi L / 2s) / n^5], shear per unit torque = |grad phi| / J.
/// The peak is at the middle of the long sides, (0, +-s). Sampled on a structured grid of linear triangles.
/// </summary>
internal static class RectangleField
{
    public static (SectionField Field, double J, double PeakPerTorque) Build(double halfLong, double halfShort, int nx, int ny)
    {
        double L = halfLong, s = halfShort;
        int nodes = (nx + 1) * (ny + 1);
        var x = new double[nodes]; var y = new double[nodes];
        var phi = new double[nodes]; var tx = new double[nodes]; var ty = new double[nodes];
        double J = TorsionConstant(L, s);
        for (int j = 0; j <= ny; j++)
            for (int i = 0; i <= nx; i++)
            {
                int k = j * (nx + 1) + i;
                x[k] = -L + 2 * L * i / nx; y[k] = -s + 2 * s * j / ny;
                var (p, dpx, dpy) = Phi(L, s, x[k], y[k]);
                phi[k] = p; tx[k] = dpy / J; ty[k] = -dpx / J;
            }
        var tri = new List<int>();
        for (int j = 0; j < ny; j++)
            for (int i = 0; i < nx; i++)
            {
                int a = j * (nx + 1) + i, b = a + 1, c = a + nx + 1, d = c + 1;
                tri.AddRange([a, b, d, a, d, c]);
            }
        int[] t = tri.ToArray();
        var outline = new List<Point2> { new(-L, -s), new(L, -s), new(L, s), new(-L, s) };
        var field = new SectionField(x, y, t, phi, tx, ty, [outline], t);
        double peak = Math.Abs(Phi(L, s, 0, s).Dy) / J;
        return (field, J, peak);
    }

    public static double TorsionConstant(double L, double s)
    {
        double sum = 0;
        for (int n = 1; n < 400; n += 2) sum += Math.Tanh(n * Math.PI * L / (2 * s)) / Math.Pow(n, 5);
        return Math.Pow(2 * s, 3) * (2 * L) / 3.0 * (1 - 192 / Math.Pow(Math.PI, 5) * (s / L) * sum);
    }

    /// <summary>phi and its gradient at (x, y).</summary>
    public static (double Phi, double Dx, double Dy) Phi(double L, double s, double x, double y)
    {
        double p = 0, dx = 0, dy = 0;
        for (int n = 1; n < 400; n += 2)
        {
            double k = n * Math.PI / (2 * s);
            double sign = ((n - 1) / 2) % 2 == 0 ? 1 : -1;
            double c = sign * 32 * s * s / (Math.Pow(Math.PI, 3) * n * n * n);
            // cosh(kx)/cosh(kL) and sinh(kx)/cosh(kL) without overflow
            double ch = (Math.Exp(k * (Math.Abs(x) - L)) + Math.Exp(-k * (Math.Abs(x) + L))) / (1 + Math.Exp(-2 * k * L));
            double sh = Math.Sign(x) * (Math.Exp(k * (Math.Abs(x) - L)) - Math.Exp(-k * (Math.Abs(x) + L))) / (1 + Math.Exp(-2 * k * L));
            p += c * (1 - ch) * Math.Cos(k * y);
            dx += -c * k * sh * Math.Cos(k * y);
            dy += -c * (1 - ch) * k * Math.Sin(k * y);
        }
        return (p, dx, dy);
    }
}
