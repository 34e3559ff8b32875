using SectionTwist.Composite;
using SectionTwist.Geometry;
using SectionTwist.Torsion;
using Xunit.Abstractions;

namespace SectionTwist.Tests.Composite;

/// <summary>
/// A steel bar 40 x 20 mm with a bonded brass insert 20 x 10 mm in its middle, against an independent solution written
/// here: linear triangles on a uniform grid whose lines follow the insert (each square split by its diagonal), the
/// coefficient 1 / G per triangle, solved by conjugate gradients on three grids and extrapolated (Richardson with the
/// observed order). Common practice, no source; it shares no code with the library's mesher or solver.
/// </summary>
public class CompositeRectangleTests(ITestOutputHelper output)
{
    private static Loop Rect(double w, double h) => LoopBuilder.Polygon([new(-w / 2, -h / 2), new(w / 2, -h / 2), new(w / 2, h / 2), new(-w / 2, h / 2)]);

    [Fact]
    public void Bar_with_an_insert_matches_an_independent_grid_solution()
    {
        const double W = 0.040, H = 0.020, w = 0.020, h = 0.010;
        var s = new CompositeSection(
        [
            new CompositePart("bar", new Profile([new Region(Rect(W, H), [Rect(w, h)])]), CompositeExactTests.Steel),
            new CompositePart("insert", new Profile([new Region(Rect(w, h))]), CompositeExactTests.Brass),
        ], "bar with insert");
        var r = CompositeAnalyzer.Analyze(s, CompositeExactTests.Steel, new AnalysisOptions { Accuracy = 1e-5 });
        double gRatio = CompositeExactTests.Steel.ShearModulus / CompositeExactTests.Brass.ShearModulus;
        var j = new double[3];
        for (int level = 0; level < 3; level++) j[level] = GridJ(W, H, w, h, 0.001 / (1 << level), gRatio);
        double p = Math.Log2((j[1] - j[0]) / (j[2] - j[1]));
        double extrapolated = j[2] + (j[2] - j[1]) / (Math.Pow(2, p) - 1);
        double spread = Math.Abs(extrapolated - j[2]);
        output.WriteLine($"grid J: {j[0]:R} {j[1]:R} {j[2]:R}; order {p:F2}; extrapolated {extrapolated:R}; FE {r.EquivalentTorsionConstant:R}, estimate {r.EstimatedRelativeError:E2}");
        Assert.InRange(p, 1.2, 2.5);
        // the FE value must agree with the extrapolated grid value within the extrapolation's own size
        Tol.Abs(extrapolated, r.EquivalentTorsionConstant, Math.Max(spread, 1e-4 * extrapolated), "independent grid solution, extrapolated (common practice, no source)");
        // the homogeneous bar is stiffer: the softer insert lowers J_ref (Saint-Venant; common practice, no source)
        Assert.True(r.EquivalentTorsionConstant < SectionAnalyzer.Analyze(s.Envelope, new AnalysisOptions { Accuracy = 1e-4 }).TorsionConstant);
        Tol.Rel(1.0, r.Materials.Sum(m => m.TorqueShare), 1e-6, "the shares add to the whole torque (equilibrium)");
    }

    /// <summary>J_ref of the bar by linear triangles on a uniform grid (reference material: the bar; the insert's coefficient is G_bar / G_insert).</summary>
    private static double GridJ(double W, double H, double w, double h, double step, double insertWeight) =>
        GridJ(W, H, step, (cx, cy) => Math.Abs(cx) < w / 2 && Math.Abs(cy) < h / 2 ? insertWeight : 1.0);

    /// <summary>
    /// J_ref of a W x H rectangle centred on the origin by linear triangles on a uniform grid of the given step, the
    /// coefficient G_ref / G of each grid cell given by <paramref name="weight"/> at the cell's centre (x, y).
    /// </summary>
    internal static double GridJ(double W, double H, double step, Func<double, double, double> weight)
    {
        int nx = (int)Math.Round(W / step), ny = (int)Math.Round(H / step);
        int N(int i, int k) => (i - 1) * (ny - 1) + (k - 1); // interior nodes only; the boundary has psi = 0
        int n = (nx - 1) * (ny - 1);
        // cell weights
        double Weight(int i, int k) => weight(-W / 2 + (i + 0.5) * step, -H / 2 + (k + 0.5) * step);
        // y = A x with the assembled P1 stiffness (each cell: two right triangles along the diagonal (i,k)-(i+1,k+1))
        void Apply(double[] x, double[] y)
        {
            Array.Clear(y);
            for (int i = 0; i < nx; i++)
                for (int k = 0; k < ny; k++)
                {
                    double c = 0.5 * Weight(i, k);
                    // triangle 1: right angle at (i+1,k): nodes (i+1,k), (i,k), (i+1,k+1); triangle 2: right angle at (i,k+1)
                    Tri(i + 1, k, i, k, i + 1, k + 1, c, x, y);
                    Tri(i, k + 1, i + 1, k + 1, i, k, c, x, y);
                }
        }
        void Tri(int i0, int k0, int i1, int k1, int i2, int k2, double c, double[] x, double[] y)
        {
            // stiffness of a right isosceles triangle, right angle at node 0: c [[2,-1,-1],[-1,1,0],[-1,0,1]]
            double v0 = Val(i0, k0, x), v1 = Val(i1, k1, x), v2 = Val(i2, k2, x);
            Add(i0, k0, c * (2 * v0 - v1 - v2), y);
            Add(i1, k1, c * (v1 - v0), y);
            Add(i2, k2, c * (v2 - v0), y);
        }
        bool Inside(int i, int k) => i > 0 && i < nx && k > 0 && k < ny;
        double Val(int i, int k, double[] x) => Inside(i, k) ? x[N(i, k)] : 0;
        void Add(int i, int k, double v, double[] y) { if (Inside(i, k)) y[N(i, k)] += v; }
        // load 2 * integral(N_i): every interior node touches six triangles of area step^2 / 2, a third each
        var f = new double[n];
        Array.Fill(f, 2 * step * step);
        var u = new double[n];
        var res = (double[])f.Clone();
        var d = (double[])f.Clone();
        var ad = new double[n];
        double rr = Dot(res, res), r0 = rr;
        for (int it = 0; it < 20 * n && rr > 1e-26 * r0; it++)
        {
            Apply(d, ad);
            double alpha = rr / Dot(d, ad);
            for (int m = 0; m < n; m++) { u[m] += alpha * d[m]; res[m] -= alpha * ad[m]; }
            double rr2 = Dot(res, res);
            for (int m = 0; m < n; m++) d[m] = res[m] + rr2 / rr * d[m];
            rr = rr2;
        }
        return Dot(u, f);
    }

    private static double Dot(double[] a, double[] b) { double s = 0; for (int i = 0; i < a.Length; i++) s += a[i] * b[i]; return s; }
}
