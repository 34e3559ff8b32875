namespace SectionTwist.Tests;

/// <summary>
/// Cancels a token source after a delay from a thread of its own. A timer (or <c>new CancellationTokenSource(delay)</c>)
/// calls back on the thread pool, which the tests running beside one another keep busy: the cancellation then comes
/// late by however long the pool takes to add a thread, and a test of prompt cancellation fails for the wrong reason.
/// </summary>
internal static class CancelSoon
{
    /// <summary>Starts the thread; it cancels <paramref name="cts"/> after <paramref name="milliseconds"/> and calls <paramref name="fired"/> first.</summary>
    public static Thread After(CancellationTokenSource cts, int milliseconds, Action? fired = null)
    {
        var t = new Thread(() =>
        {
            Thread.Sleep(milliseconds);
            fired?.Invoke();
            try { cts.Cancel(); }
            catch (ObjectDisposedException) { } // the test already ended
        }) { IsBackground = true };
        t.Start();
        return t;
    }
}
