using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearAlgebra.Solvers;
using SectionTwist.Sparse;

namespace SectionTwist.Benchmarks;

/// <summary>
/// ILU(0) in compressed-row form (Saad, Iterative Methods for Sparse Linear Systems, 2nd ed., alg. 10.4), O(nnz) per
/// application. Math.NET's own ILU0Preconditioner walks every row with dense index loops and indexed look-ups, which
/// is quadratic in n; this is the same preconditioner without that cost, so the Math.NET BiCgStab baseline can run
/// at 1e5 unknowns.
/// </summary>
internal sealed class CsrIlu0Preconditioner(CscMatrix a) : IPreconditioner<double>
{
    private readonly int[] _rp = a.ColPtr, _ci = a.RowIdx; // symmetric: CSC of A = CSR of A
    private readonly double[] _lu = (double[])a.Values.Clone();
    private readonly int[] _diag = new int[a.N];

    public void Initialize(Matrix<double> matrix)
    {
        int n = _diag.Length;
        var pos = new int[n];
        Array.Fill(pos, -1);
        for (int i = 0; i < n; i++)
        {
            for (int p = _rp[i]; p < _rp[i + 1]; p++) { pos[_ci[p]] = p; if (_ci[p] == i) _diag[i] = p; }
            for (int p = _rp[i]; p < _rp[i + 1] && _ci[p] < i; p++)
            {
                int k = _ci[p];
                double lik = _lu[p] / _lu[_diag[k]];
                _lu[p] = lik;
                for (int q = _diag[k] + 1; q < _rp[k + 1]; q++)
                {
                    int at = pos[_ci[q]];
                    if (at >= 0) _lu[at] -= lik * _lu[q];
                }
            }
            for (int p = _rp[i]; p < _rp[i + 1]; p++) pos[_ci[p]] = -1;
        }
    }

    public void Approximate(Vector<double> rhs, Vector<double> lhs)
    {
        int n = _diag.Length;
        var y = new double[n];
        for (int i = 0; i < n; i++)
        {
            double s = rhs[i];
            for (int p = _rp[i]; p < _diag[i]; p++) s -= _lu[p] * y[_ci[p]];
            y[i] = s;
        }
        for (int i = n - 1; i >= 0; i--)
        {
            double s = y[i];
            for (int p = _diag[i] + 1; p < _rp[i + 1]; p++) s -= _lu[p] * y[_ci[p]];
            y[i] = s / _lu[_diag[i]];
        }
        for (int i = 0; i < n; i++) lhs[i] = y[i];
    }
}
