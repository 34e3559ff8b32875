using System.Diagnostics;
using SectionTwist.Sparse;
using SectionTwist.Sparse.Amg;

namespace SectionTwist.Tests.Hostile;

/// <summary>
/// Late cancellation (hostile-input table): the multigrid set-up observes the token inside its long loops (aggregation,
/// prolongator smoothing, Galerkin products), so it returns within a second of the token firing. The bound is common
/// practice for an interactive host, no source.
/// </summary>
public class LateCancellationTests
{
    [Fact]
    public void Multigrid_setup_returns_promptly_after_cancellation()
    {
        // P2 Laplacian on a 240 x 240 grid: about 230 000 unknowns, a set-up of several seconds on 2 loaded cores
        var a = ReferenceProblems.P2Laplacian(240, out _);
        using var cts = new CancellationTokenSource();
        var clock = Stopwatch.StartNew();
        long firedAt = -1;
        // a thread of its own, not a timer: a timer's callback waits for the thread pool, which the other tests may hold
        var canceller = new Thread(() => { Thread.Sleep(100); firedAt = clock.ElapsedMilliseconds; cts.Cancel(); }) { IsBackground = true };
        canceller.Start();
        try
        {
            SmoothedAggregation.Build(a, ct: cts.Token);
            Assert.Fail("the set-up finished before the token fired; the test matrix is too small");
        }
        catch (OperationCanceledException) { }
        long returnedAt = clock.ElapsedMilliseconds;
        canceller.Join();
        long late = returnedAt - firedAt;
        Assert.True(firedAt >= 0);
        Assert.True(late < 1000, $"the set-up returned {late} ms after the token fired (limit 1000 ms)");
    }

    [Fact]
    public void A_drawing_read_observes_a_cancelled_token()
    {
        var d = new Import.DxfText().Header().Entities();
        for (int i = 0; i < 20_000; i++) d.Line(i, 0, i + 1, 0);
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        Assert.ThrowsAny<OperationCanceledException>(() => SectionTwist.Import.Dxf.DxfProfiles.Read(d.End().Bytes(), "long.dxf", Import.DxfText.Mm, cts.Token));
    }
}
