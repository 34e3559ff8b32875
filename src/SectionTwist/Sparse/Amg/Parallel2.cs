namespace SectionTwist.Sparse.Amg;

/// <summary>Splits row loops into contiguous blocks over the available cores when the work is large enough to pay.</summary>
internal static class Parallel2
{
    /// <summary>Work (nonzeros touched) below which a loop stays on the calling thread.</summary>
    public const int MinWork = 200_000;

    public static ParallelOptions Options { get; } = new() { MaxDegreeOfParallelism = Environment.ProcessorCount };

    /// <summary>Number of blocks for a loop over <paramref name="rows"/> rows touching <paramref name="work"/> entries.</summary>
    public static int Blocks(int rows, long work)
        => work < MinWork || Environment.ProcessorCount == 1 ? 1 : Math.Min(Environment.ProcessorCount, Math.Max(1, rows));

    /// <summary>Row range of block <paramref name="b"/> of <paramref name="blocks"/>.</summary>
    public static (int Start, int End) Range(int rows, int blocks, int b)
        => ((int)((long)rows * b / blocks), (int)((long)rows * (b + 1) / blocks));

    /// <summary>Runs body(start, end) over contiguous row blocks.</summary>
    public static void For(int rows, long work, Action<int, int> body)
    {
        int blocks = Blocks(rows, work);
        if (blocks == 1) { body(0, rows); return; }
        Parallel.For(0, blocks, Options, b => { var (s, e) = Range(rows, blocks, b); body(s, e); });
    }
}
