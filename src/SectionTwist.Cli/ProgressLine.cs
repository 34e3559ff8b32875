using System.Diagnostics;
using SectionTwist.Torsion;

namespace SectionTwist.Cli;

/// <summary>
/// One progress line on standard error for work that can take more than a second: what runs, the fraction done, the time
/// so far and an estimate of the time left (elapsed x (1 - f) / f). Shown only when standard error is a terminal
/// (<see cref="CliContext.IsTerminal"/>) and only after the first second, redrawn at most five times a second with a
/// carriage return, and wiped when disposed, so results on standard output and redirected logs stay clean.
/// </summary>
internal sealed class ProgressLine : IDisposable
{
    private readonly TextWriter? _err;
    private readonly string _what;
    private readonly Stopwatch _clock = Stopwatch.StartNew();
    private readonly object _gate = new();
    private TimeSpan _lastDraw = TimeSpan.Zero;
    private int _width;

    private readonly TimeSpan _delay;

    public ProgressLine(CliContext context, string what)
    {
        _err = context.IsTerminal ? context.Err : null;
        _what = what;
        _delay = context.ProgressDelay;
    }

    /// <summary>Reports <paramref name="fraction"/> (0..1) of the whole job done, with an optional stage text.</summary>
    public void Report(double fraction, string? stage = null)
    {
        if (_err is null) return;
        lock (_gate)
        {
            var now = _clock.Elapsed;
            // the final state is always drawn; others after the delay and at most five times a second
            if (!(fraction >= 1) && (now < _delay || now - _lastDraw < TimeSpan.FromMilliseconds(200))) return;
            _lastDraw = now;
            string text = Text(_what, stage, fraction, now);
            _err.Write("\r" + text.PadRight(_width));
            _width = text.Length;
            _err.Flush();
        }
    }

    /// <summary>
    /// A progress sink for one section analysis that fills the part <paramref name="from"/>..<paramref name="to"/> of
    /// the whole job, naming <paramref name="stage"/> (e.g. the section).
    /// </summary>
    public IProgress<AnalysisProgress> Analysis(string stage, double from = 0, double to = 1) =>
        new Sink(p => Report(from + (to - from) * p.Fraction, $"{stage}: {p.Stage}"));

    /// <summary>
    /// Redraws the line twice a second with the time so far (no fraction) while work without its own progress reports runs
    /// (a solver without a progress callback, waiting for a background task); dispose the result when it ends.
    /// </summary>
    public IDisposable Pulse(string stage) => new PulseTimer(new Timer(_ => Report(double.NaN, stage), null, TimeSpan.Zero, TimeSpan.FromMilliseconds(500)));

    /// <summary>Stops the timer and waits for a callback in flight, so no redraw follows the caller's <see cref="Clear"/>.</summary>
    private sealed class PulseTimer(Timer timer) : IDisposable
    {
        public void Dispose()
        {
            using var done = new ManualResetEvent(false);
            if (timer.Dispose(done)) done.WaitOne();
        }
    }

    /// <summary>The line for a state of the job (tested without a terminal); a NaN fraction shows only the time so far.</summary>
    internal static string Text(string what, string? stage, double fraction, TimeSpan elapsed)
    {
        if (double.IsNaN(fraction)) return $"{what}{(stage is null ? "" : " (" + stage + ")")}: {Seconds(elapsed.TotalSeconds)} so far";
        fraction = Math.Clamp(fraction, 0, 1);
        string eta = fraction >= 0.02 && fraction < 1
            ? $", about {Seconds(elapsed.TotalSeconds * (1 - fraction) / fraction)} left"
            : "";
        return $"{what}{(stage is null ? "" : " (" + stage + ")")}: {fraction * 100:F0} %, {Seconds(elapsed.TotalSeconds)} so far{eta}";
    }

    private static string Seconds(double s) => s < 90 ? $"{Math.Ceiling(s):F0} s" : $"{Math.Ceiling(s / 60):F0} min";

    public void Dispose() => Clear();

    /// <summary>Wipes the line (before a result line is printed); a later <see cref="Report"/> draws it again.</summary>
    public void Clear()
    {
        if (_err is null) return;
        lock (_gate)
        {
            if (_width > 0) { _err.Write("\r" + new string(' ', _width) + "\r"); _err.Flush(); }
            _width = 0;
        }
    }

    /// <summary>Reports synchronously on the calling thread (Progress&lt;T&gt; would post to the thread pool, late and out of order).</summary>
    private sealed class Sink(Action<AnalysisProgress> report) : IProgress<AnalysisProgress>
    {
        public void Report(AnalysisProgress value) => report(value);
    }
}
