using SectionTwist.Geometry;
using SectionTwist.Import;

namespace SectionTwist.Torsion;

/// <summary>
/// Analyses many sections at once on all cores (one section per worker; each analysis is independent and deterministic,
/// so a batch gives the same numbers as one-by-one runs). A section that fails with an input error does not stop the
/// others: its item carries the error instead of a result.
/// </summary>
public static class SectionBatch
{
    /// <summary>Analyses every profile with the same options; the items come back in input order.</summary>
    /// <param name="profiles">The cross-sections (coordinates in metres).</param>
    /// <param name="options">Accuracy and limits for every analysis; null for the defaults.</param>
    /// <param name="maxParallelism">Workers at most; 0 or less for one per core.</param>
    /// <param name="cancellationToken">Stops the whole batch (an <see cref="OperationCanceledException"/> is thrown).</param>
    /// <param name="completed">Called once per finished item, from the worker threads, in completion order.</param>
    public static IReadOnlyList<SectionBatchItem> Analyze(IReadOnlyList<Profile> profiles, AnalysisOptions? options = null,
        int maxParallelism = 0, CancellationToken cancellationToken = default, Action<SectionBatchItem>? completed = null)
    {
        ArgumentNullException.ThrowIfNull(profiles);
        return Run(profiles.Count, i => (profiles[i].Name ?? $"#{i + 1}", profiles[i]), options, maxParallelism, cancellationToken, completed);
    }

    /// <summary>
    /// Loads every source (a template spec, a DXF or point-list path, or a plugin source; see
    /// <see cref="ProfileSources.Load"/>) and analyses it; loading errors are reported per item like analysis errors.
    /// </summary>
    /// <param name="sources">Template specs or file paths.</param>
    /// <param name="sourceOptions">Unit, layer and other reading options for every source; null for the defaults.</param>
    /// <param name="options">Accuracy and limits for every analysis; null for the defaults.</param>
    /// <param name="maxParallelism">Workers at most; 0 or less for one per core.</param>
    /// <param name="cancellationToken">Stops the whole batch (an <see cref="OperationCanceledException"/> is thrown).</param>
    /// <param name="completed">Called once per finished item, from the worker threads, in completion order.</param>
    public static IReadOnlyList<SectionBatchItem> Analyze(IReadOnlyList<string> sources, ProfileSourceOptions? sourceOptions,
        AnalysisOptions? options = null, int maxParallelism = 0, CancellationToken cancellationToken = default,
        Action<SectionBatchItem>? completed = null)
    {
        ArgumentNullException.ThrowIfNull(sources);
        return Run(sources.Count, i => (sources[i], ProfileSources.Load(sources[i], sourceOptions)), options, maxParallelism, cancellationToken, completed);
    }

    private static SectionBatchItem[] Run(int count, Func<int, (string Source, Profile Profile)> load, AnalysisOptions? options,
        int maxParallelism, CancellationToken ct, Action<SectionBatchItem>? completed)
    {
        var opts = options ?? AnalysisOptions.Default;
        var items = new SectionBatchItem[count];
        var parallel = new ParallelOptions
        {
            MaxDegreeOfParallelism = maxParallelism > 0 ? maxParallelism : Environment.ProcessorCount,
            CancellationToken = ct,
        };
        try
        {
            Parallel.For(0, count, parallel, i =>
            {
                string source = $"#{i + 1}";
                SectionBatchItem item;
                try
                {
                    (source, var profile) = load(i);
                    item = new SectionBatchItem(i, source, SectionAnalyzer.Analyze(profile, opts, ct), null);
                }
                catch (SectionTwistException e)
                {
                    item = new SectionBatchItem(i, source, null, e);
                }
                items[i] = item;
                completed?.Invoke(item);
            });
        }
        catch (AggregateException e) when (e.InnerExceptions.All(x => x is OperationCanceledException))
        {
            throw new OperationCanceledException(ct);
        }
        return items;
    }
}
