namespace SectionTwist.Sparse;

/// <summary>
/// Whether the factorization may put a second thread to work for the calling analysis (the two subtree halves of
/// <see cref="SupernodalFactorizer"/>, the split update of <see cref="SyrkKernel"/>). A batch that already runs one
/// analysis per core turns this off for its workers, so two levels of threads do not compete for the same cores; the
/// setting flows with the execution context into the worker tasks.
/// </summary>
internal static class KernelThreads
{
    private static readonly AsyncLocal<bool> OneThreadOnly = new();

    /// <summary>True when a second thread may be used: more than one core and no enclosing <see cref="OneThread"/> scope.</summary>
    public static bool MayUseMore => Environment.ProcessorCount >= 2 && !OneThreadOnly.Value;

    /// <summary>Runs <paramref name="work"/> with the kernels kept to the calling thread.</summary>
    public static T OneThread<T>(Func<T> work)
    {
        ArgumentNullException.ThrowIfNull(work);
        bool before = OneThreadOnly.Value;
        OneThreadOnly.Value = true;
        try { return work(); }
        finally { OneThreadOnly.Value = before; }
    }
}
