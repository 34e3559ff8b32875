using SectionTwist.Torsion;

namespace SectionTwist.Cli;

/// <summary>
/// Where a command writes (standard output for results, standard error for messages) and the limits every command
/// observes: the cancellation token (Ctrl+C and <c>--timeout</c>) and the memory budget of section analyses (<c>--memory-budget</c>).
/// </summary>
internal sealed class CliContext(TextWriter output, TextWriter error, bool isTerminal = false)
{
    public TextWriter Out { get; } = output;
    public TextWriter Err { get; } = error;

    /// <summary>True when standard error is an interactive terminal (progress display allowed; no default time limit).</summary>
    public bool IsTerminal { get; } = isTerminal;

    /// <summary>How long work runs before a progress line appears (default 1 s: quick commands print none).</summary>
    public TimeSpan ProgressDelay { get; init; } = TimeSpan.FromSeconds(1);

    /// <summary>Cancelled by Ctrl+C or when the time limit passes; every long operation observes it.</summary>
    public CancellationToken Cancellation { get; set; }

    /// <summary>The memory budget of each section analysis, bytes (null: the library default).</summary>
    public long? MemoryBudget { get; set; }

    /// <summary>Analysis options at <paramref name="accuracy"/> within the memory budget.</summary>
    public AnalysisOptions Analysis(double? accuracy = null) => new()
    {
        Accuracy = accuracy ?? AnalysisOptions.Default.Accuracy,
        MemoryBudgetBytes = MemoryBudget ?? AnalysisOptions.DefaultMemoryBudget,
    };
}
