using SectionTwist.Shaft;

namespace SectionTwist.Bending;

/// <summary>One element of a plane beam model: its ends are nodes i and i + 1.</summary>
/// <param name="Ei">EI at local position s, N*m^2.</param>
/// <param name="Kga">k G A at s, N, or null (Euler-Bernoulli).</param>
/// <param name="Load">Uniform transverse load, N/m, along the plane's axis.</param>
internal readonly record struct BeamPiece(Func<double, double> Ei, Func<double, double>? Kga, double Load);

/// <summary>The solution of one plane: nodal deflection and slope, element end shear and moment, support reactions.</summary>
internal sealed class BeamPlaneSolution
{
    public required double[] Deflection { get; init; }
    public required double[] Slope { get; init; }
    /// <summary>Shear and moment just right of node i (element i's first end) and just left of node i + 1 (its second end).</summary>
    public required double[] ShearStart { get; init; }
    public required double[] MomentStart { get; init; }
    public required double[] ShearEnd { get; init; }
    public required double[] MomentEnd { get; init; }
    /// <summary>Per support: the force and moment the support applies to the shaft.</summary>
    public required (double Force, double Moment)[] Reactions { get; init; }
}

/// <summary>
/// The stiffness-method solve of a continuous beam in one plane (two unknowns per node, supports removed from the unknowns,
/// dense Cholesky): statically determinate and indeterminate shafts alike (Przemieniecki, Theory of Matrix Structural
/// Analysis, ch. 5 and 6).
/// </summary>
internal static class BeamPlaneSolver
{
    /// <param name="x">Node positions, increasing, m.</param>
    /// <param name="pieces">One piece per element (x.Length - 1).</param>
    /// <param name="force">Point force at each node, N.</param>
    /// <param name="moment">Point moment at each node (counter-clockwise in the plane, i.e. the sense of a positive slope), N*m.</param>
    /// <param name="supports">Supported nodes; <c>Clamp</c> also holds the slope.</param>
    public static BeamPlaneSolution Solve(double[] x, BeamPiece[] pieces, double[] force, double[] moment, (int Node, bool Clamp)[] supports)
    {
        int nn = x.Length, n = 2 * nn;
        var k = new double[n * n];
        var f = new double[n];
        for (int i = 0; i < nn; i++) { f[2 * i] = force[i]; f[2 * i + 1] = moment[i]; }
        var ke = new double[16 * pieces.Length];
        var fe = new double[4 * pieces.Length];
        for (int e = 0; e < pieces.Length; e++)
        {
            var p = pieces[e];
            BeamElement.Build(x[e + 1] - x[e], p.Ei, p.Kga, p.Load, ke.AsSpan(16 * e, 16), fe.AsSpan(4 * e, 4));
            for (int a = 0; a < 4; a++)
            {
                f[2 * e + a] -= fe[4 * e + a];
                for (int b = 0; b < 4; b++) k[(2 * e + a) * n + 2 * e + b] += ke[16 * e + 4 * a + b];
            }
        }
        var held = new bool[n];
        foreach (var (node, clamp) in supports) { held[2 * node] = true; if (clamp) held[2 * node + 1] = true; }
        int[] free = [.. Enumerable.Range(0, n).Where(i => !held[i])];
        int m = free.Length;
        var kr = new double[m * m];
        var fr = new double[m];
        for (int i = 0; i < m; i++)
        {
            fr[i] = f[free[i]];
            for (int j = 0; j < m; j++) kr[i * m + j] = k[free[i] * n + free[j]];
        }
        if (m > 0 && DenseCholesky.Solve(kr, m, fr) >= 0)
            throw new SectionTwistException("bending-mechanism",
                "the shaft is not held against sideways movement or tilting: give at least two bearings, or one bearing with 'clamped: true'");
        var u = new double[n];
        for (int i = 0; i < m; i++) u[free[i]] = fr[i];

        int ne = pieces.Length;
        var vs = new double[ne]; var ms = new double[ne]; var ve = new double[ne]; var me = new double[ne];
        Span<double> end = stackalloc double[4];
        for (int e = 0; e < ne; e++)
        {
            for (int a = 0; a < 4; a++)
            {
                double s = fe[4 * e + a];
                for (int b = 0; b < 4; b++) s += ke[16 * e + 4 * a + b] * u[2 * e + b];
                end[a] = s;
            }
            double l = x[e + 1] - x[e], q = pieces[e].Load;
            vs[e] = end[0]; ms[e] = -end[1];
            ve[e] = end[0] + q * l; me[e] = -end[1] + end[0] * l + q * l * l / 2;
        }
        var reactions = new (double, double)[supports.Length];
        for (int s = 0; s < supports.Length; s++)
        {
            int node = supports[s].Node;
            double Reaction(int dof)
            {
                double r = -f[dof];
                for (int j = 0; j < n; j++) r += k[dof * n + j] * u[j];
                return r;
            }
            reactions[s] = (Reaction(2 * node), supports[s].Clamp ? Reaction(2 * node + 1) : 0);
        }
        var v = new double[nn]; var th = new double[nn];
        for (int i = 0; i < nn; i++) { v[i] = u[2 * i]; th[i] = u[2 * i + 1]; }
        return new BeamPlaneSolution { Deflection = v, Slope = th, ShearStart = vs, MomentStart = ms, ShearEnd = ve, MomentEnd = me, Reactions = reactions };
    }
}
