using SectionTwist.Sparse;
using Xunit;

namespace SectionTwist.Tests.Sparse;

/// <summary>
/// The batch's one-thread scope: inside it the factorization keeps to the calling thread (also in tasks started from it),
/// outside it the setting is back, and the answer is the same either way (the two-thread split changes only the order of
/// independent subtrees; common practice, no source).
/// </summary>
public class KernelThreadsTests
{
    [Fact]
    public void The_scope_flows_into_tasks_and_ends_with_the_work()
    {
        bool outside = KernelThreads.MayUseMore;
        var (inside, inTask) = KernelThreads.OneThread(() => (KernelThreads.MayUseMore, Task.Run(() => KernelThreads.MayUseMore).Result));
        Assert.False(inside);
        Assert.False(inTask);
        Assert.Equal(outside, KernelThreads.MayUseMore);
        Assert.Equal(Environment.ProcessorCount >= 2, outside);
    }

    [Fact]
    public void One_thread_and_two_threads_give_the_same_factor()
    {
        var a = ReferenceProblems.P2Laplacian(60, out _); // large enough for the two-thread split (flops above its threshold)
        var (x, b) = SparseTestUtil.Manufactured(a);
        var s = SymbolicCholesky.Analyze(a, FillOrdering.Amd);
        Assert.True(s.Flops >= SupernodalFactorizer.ParallelWork);
        var x1 = new double[a.N];
        var x2 = new double[a.N];
        SupernodalCholesky.Factorize(s, a).Solve(b, x1);
        KernelThreads.OneThread(() => { SupernodalCholesky.Factorize(s, a).Solve(b, x2); return 0; });
        Assert.True(SparseTestUtil.RelativeError(x2, x1) < 1e-13);
        Assert.True(SparseTestUtil.RelativeError(x2, x) < 1e-10);
    }
}
