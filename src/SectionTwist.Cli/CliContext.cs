namespace SectionTwist.Cli;

/// <summary>Where a command writes: standard output for results, standard error for messages.</summary>
internal sealed class CliContext(TextWriter output, TextWriter error, bool isTerminal = false)
{
    public TextWriter Out { get; } = output;
    public TextWriter Err { get; } = error;

    /// <summary>True when standard error is an interactive terminal (progress display allowed).</summary>
    public bool IsTerminal { get; } = isTerminal;

    /// <summary>How long work runs before a progress line appears (default 1 s: quick commands print none).</summary>
    public TimeSpan ProgressDelay { get; init; } = TimeSpan.FromSeconds(1);
}
