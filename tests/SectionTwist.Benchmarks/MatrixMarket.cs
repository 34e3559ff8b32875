using System.Globalization;
using System.Text;
using SectionTwist.Sparse;

namespace SectionTwist.Benchmarks;

/// <summary>
/// Writes a symmetric sparse matrix in the Matrix Market coordinate format (NIST, "The Matrix Market exchange formats:
/// initial design", 1996): header <c>matrix coordinate real symmetric</c>, the lower triangle, 1-based indices, values
/// in round-trip form so that a reader gets the same doubles.
/// </summary>
public static class MatrixMarket
{
    internal static void WriteSymmetric(CscMatrix a, string path)
    {
        int n = a.N;
        long lower = 0;
        for (int c = 0; c < n; c++)
            for (int p = a.ColPtr[c]; p < a.ColPtr[c + 1]; p++) if (a.RowIdx[p] >= c) lower++;
        using var w = new StreamWriter(path, false, new UTF8Encoding(false), 1 << 20);
        w.NewLine = "\n";
        w.WriteLine("%%MatrixMarket matrix coordinate real symmetric");
        w.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{n} {n} {lower}"));
        var inv = CultureInfo.InvariantCulture;
        for (int c = 0; c < n; c++)
            for (int p = a.ColPtr[c]; p < a.ColPtr[c + 1]; p++)
            {
                int r = a.RowIdx[p];
                if (r < c) continue;
                w.Write((r + 1).ToString(inv));
                w.Write(' ');
                w.Write((c + 1).ToString(inv));
                w.Write(' ');
                w.WriteLine(a.Values[p].ToString("R", inv));
            }
    }
}
