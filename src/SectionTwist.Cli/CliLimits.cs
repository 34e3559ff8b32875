namespace SectionTwist.Cli;

/// <summary>
/// The options every command takes: <c>--timeout SECONDS</c> (default <see cref="DefaultTimeoutSeconds"/> when standard
/// error is not a terminal, none when it is; 0: no limit) and <c>--memory-budget MB</c> for section analyses. They are
/// taken off the command line before the command sees it.
/// </summary>
internal sealed class CliLimits : IDisposable
{
    /// <summary>Time limit of a non-interactive run (scripts, CI), seconds.</summary>
    public const double DefaultTimeoutSeconds = 600;

    /// <summary>Seconds after the time limit at which a command that did not stop is ended by the watchdog of <see cref="Program.Main"/>.</summary>
    public const double GraceSeconds = 30;

    private readonly CancellationTokenSource _time = new();
    private readonly CancellationTokenSource _linked;
    private readonly ManualResetEventSlim _finished = new();

    public CliLimits(Args args, CliContext ctx, CancellationToken external)
    {
        double? timeout = args.Double("timeout");
        if (timeout is < 0) throw new UsageException($"--timeout {timeout}: give the time limit in seconds (0: no limit)");
        double? mb = args.Double("memory-budget");
        if (mb is { } m && !(m >= 16 && m <= 1 << 24)) throw new UsageException($"--memory-budget {m}: give the memory for one section analysis in MB, from 16 to 16777216 (e.g. 2048)");
        TimeoutSeconds = timeout ?? (ctx.IsTerminal ? 0 : DefaultTimeoutSeconds);
        if (TimeoutSeconds > 0)
        {
            // A thread of its own, not a timer: timer callbacks run on the thread pool, which a command's parallel loops
            // can keep busy, so the limit would fire late by however long the pool takes to add a thread.
            var limit = TimeSpan.FromSeconds(Math.Min(TimeoutSeconds, int.MaxValue / 1000.0));
            new Thread(() =>
            {
                try
                {
                    if (!_finished.Wait(limit)) _time.Cancel();
                }
                catch (ObjectDisposedException) { } // the command ended as the limit passed
            }) { IsBackground = true, Name = "time limit" }.Start();
        }
        _linked = CancellationTokenSource.CreateLinkedTokenSource(_time.Token, external);
        ctx.Cancellation = _linked.Token;
        if (mb is { } budget) ctx.MemoryBudget = (long)(budget * (1 << 20));
    }

    /// <summary>The time limit in seconds, 0 for none.</summary>
    public double TimeoutSeconds { get; }

    /// <summary>True when the time limit (not Ctrl+C) stopped the command.</summary>
    public bool TimedOut => _time.IsCancellationRequested;

    /// <summary>The one-line message for a command stopped by the time limit.</summary>
    public string TimeoutMessage(string command) =>
        $"sectiontwist {command}: error: stopped at the time limit of {Units.NumberText.Format(TimeoutSeconds, 4)} s; " +
        "give a longer --timeout SECONDS (0: no limit), or a coarser --accuracy where the command has one";

    public void Dispose()
    {
        _finished.Set();
        _finished.Dispose();
        _linked.Dispose();
        _time.Dispose();
    }
}
