using System.Diagnostics;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearAlgebra.Double;
using MathNet.Numerics.LinearAlgebra.Double.Solvers;
using MathNet.Numerics.LinearAlgebra.Solvers;
using SectionTwist.Sparse;

namespace SectionTwist.Benchmarks;

/// <summary>The stock-library baseline: Math.NET Numerics 5 BiCgStab with an ILU(0) preconditioner.</summary>
public static class MathNetBaseline
{
    /// <summary>Converts our CSC matrix (symmetric, so also CSR) into a Math.NET sparse matrix.</summary>
    internal static SparseMatrix ToMathNet(CscMatrix a)
    {
        var entries = new List<Tuple<int, int, double>>(a.NonZeros);
        for (int c = 0; c < a.N; c++)
            for (int p = a.ColPtr[c]; p < a.ColPtr[c + 1]; p++) entries.Add(Tuple.Create(a.RowIdx[p], c, a.Values[p]));
        return SparseMatrix.OfIndexed(a.N, a.N, entries);
    }

    /// <summary>
    /// Solves A x = b with BiCgStab + ILU0 until Math.NET's residual criterion (infinity norms) reports
    /// <paramref name="tolerance"/>; returns (set-up seconds, solve seconds, iterations, our 2-norm relative residual).
    /// </summary>
    internal static (double Setup, double Solve, int Iterations, double Residual) Solve(CscMatrix a, double[] b, double tolerance,
        bool stockIlu0)
    {
        var sw = Stopwatch.StartNew();
        var m = ToMathNet(a);
        IPreconditioner<double> pre = stockIlu0 ? new ILU0Preconditioner() : new CsrIlu0Preconditioner(a);
        pre.Initialize(m);
        double setup = sw.Elapsed.TotalSeconds;
        var iterCount = new CountingCriterion();
        var iterator = new Iterator<double>(iterCount, new IterationCountStopCriterion<double>(100_000), new ResidualStopCriterion<double>(tolerance), new DivergenceStopCriterion<double>());
        var bv = Vector<double>.Build.DenseOfArray(b);
        var xv = Vector<double>.Build.Dense(a.N);
        sw.Restart();
        new BiCgStab().Solve(m, bv, xv, iterator, pre);
        double solve = sw.Elapsed.TotalSeconds;
        var x = xv.ToArray();
        return (setup, solve, iterCount.Iterations, a.RelativeResidual(x, b));
    }

    /// <summary>Never stops; records the last iteration number Math.NET reported.</summary>
    private sealed class CountingCriterion : IIterationStopCriterion<double>
    {
        public int Iterations { get; private set; }

        public IterationStatus Status => IterationStatus.Continue;

        public IterationStatus DetermineStatus(int iterationNumber, Vector<double> solutionVector,
            Vector<double> sourceVector, Vector<double> residualVector)
        {
            Iterations = iterationNumber + 1;
            return IterationStatus.Continue;
        }

        public void Reset() => Iterations = 0;

        public IIterationStopCriterion<double> Clone() => new CountingCriterion();
    }
}
