namespace SectionTwist.Sparse;

/// <summary>
/// Reproducible test matrices. The fixed reference problem of issue 3: the P2 (6-node triangle) Laplacian on the unit
/// square, a structured m x m grid of squares each cut into two triangles by the diagonal (0,0)-(1,1), Dirichlet
/// boundary nodes removed; the unknowns are the (2m-1)^2 interior nodes of the (2m+1)^2 node lattice.
/// </summary>
internal static class ReferenceProblems
{
    /// <summary>Number of unknowns of <see cref="P2Laplacian"/> for grid size <paramref name="m"/>.</summary>
    public static long Unknowns(int m) => (2L * m - 1) * (2L * m - 1);

    /// <summary>
    /// Assembles the P2 Laplacian stiffness matrix on the unit square (see the type summary).
    /// </summary>
    /// <param name="m">Squares per side (m &gt;= 1).</param>
    /// <param name="coordinates">Interior node coordinates x0, y0, x1, y1, ... in unknown order.</param>
    public static CscMatrix P2Laplacian(int m, out double[] coordinates)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(m, 1);
        int side = 2 * m + 1, inner = 2 * m - 1;
        int n = inner * inner;
        coordinates = new double[2 * n];
        double h = 1.0 / m, hl = 0.5 * h;
        for (int r = 0; r < inner; r++)
            for (int c = 0; c < inner; c++)
            {
                int k = r * inner + c;
                coordinates[2 * k] = (c + 1) * hl;
                coordinates[2 * k + 1] = (r + 1) * hl;
            }
        // the two element orientations, lattice offsets of v0, v1, v2, e01, e12, e20
        int[][] offX = [[0, 2, 2, 1, 2, 1], [0, 2, 0, 1, 1, 0]];
        int[][] offY = [[0, 0, 2, 0, 1, 1], [0, 2, 2, 1, 2, 1]];
        var ke = new double[2][];
        for (int t = 0; t < 2; t++)
        {
            ke[t] = new double[36];
            P2Stiffness(
                [offX[t][0] * hl, offX[t][1] * hl, offX[t][2] * hl],
                [offY[t][0] * hl, offY[t][1] * hl, offY[t][2] * hl], ke[t]);
        }
        var dofs = new int[2 * m * m * 6];
        for (int sr = 0, e = 0; sr < m; sr++)
            for (int sc = 0; sc < m; sc++)
                for (int t = 0; t < 2; t++, e++)
                    for (int a = 0; a < 6; a++)
                    {
                        int lx = 2 * sc + offX[t][a], ly = 2 * sr + offY[t][a];
                        dofs[6 * e + a] = lx == 0 || ly == 0 || lx == side - 1 || ly == side - 1 ? -1 : (ly - 1) * inner + (lx - 1);
                    }
        var asm = new ElementAssembler(n, dofs, 6);
        for (int e = 0; e < 2 * m * m; e++) asm.Add(e, ke[e & 1]);
        return asm.ToCsc();
    }

    /// <summary>
    /// Stiffness matrix of the 6-node triangle for the Laplacian, K_ab = integral of grad(phi_a) . grad(phi_b), node
    /// order v0, v1, v2, mid(v0 v1), mid(v1 v2), mid(v2 v0). Shape functions in barycentric coordinates
    /// (lambda_i (2 lambda_i - 1), 4 lambda_i lambda_j); the edge-midpoint rule integrates the quadratic integrand exactly
    /// (Zienkiewicz and Taylor, The Finite Element Method, vol. 1, sec. 6.3 and table 6.3).
    /// </summary>
    public static void P2Stiffness(ReadOnlySpan<double> x, ReadOnlySpan<double> y, Span<double> k)
    {
        double twoA = (x[1] - x[0]) * (y[2] - y[0]) - (x[2] - x[0]) * (y[1] - y[0]);
        double area = 0.5 * Math.Abs(twoA);
        Span<double> gx = stackalloc double[3];
        Span<double> gy = stackalloc double[3];
        for (int i = 0; i < 3; i++)
        {
            int j = (i + 1) % 3, l = (i + 2) % 3;
            gx[i] = (y[j] - y[l]) / twoA;
            gy[i] = (x[l] - x[j]) / twoA;
        }
        k[..36].Clear();
        Span<double> lam = stackalloc double[3];
        Span<double> dx = stackalloc double[6];
        Span<double> dy = stackalloc double[6];
        for (int q = 0; q < 3; q++)
        {
            lam.Clear();
            lam[q] = 0.5; lam[(q + 1) % 3] = 0.5;
            for (int i = 0; i < 3; i++)
            {
                double s = 4 * lam[i] - 1;
                dx[i] = s * gx[i]; dy[i] = s * gy[i];
                int j = (i + 1) % 3;
                dx[3 + i] = 4 * (lam[j] * gx[i] + lam[i] * gx[j]);
                dy[3 + i] = 4 * (lam[j] * gy[i] + lam[i] * gy[j]);
            }
            double wq = area / 3;
            for (int a = 0; a < 6; a++)
                for (int b = 0; b < 6; b++) k[6 * a + b] += wq * (dx[a] * dx[b] + dy[a] * dy[b]);
        }
    }

    /// <summary>A random sparse symmetric positive definite matrix (strictly diagonally dominant), full storage.</summary>
    public static CscMatrix RandomSpd(int n, int offDiagonalPerRow, int seed)
    {
        var rng = new Random(seed);
        var trip = new TripletMatrix(n, 2 * n * offDiagonalPerRow + n);
        var diag = new double[n];
        for (int i = 0; i < n; i++)
            for (int t = 0; t < offDiagonalPerRow; t++)
            {
                int j = rng.Next(n);
                if (j == i) continue;
                double v = rng.NextDouble() - 0.5;
                trip.Add(i, j, v); trip.Add(j, i, v);
                diag[i] += Math.Abs(v); diag[j] += Math.Abs(v);
            }
        for (int i = 0; i < n; i++) trip.Add(i, i, diag[i] + 0.1 + rng.NextDouble());
        return trip.ToCsc();
    }
}
