using SectionTwist.Sparse;
using SectionTwist.Geometry;
using SectionTwist.Import;

namespace SectionTwist.Torsion;

/// <summary>
/// Analyses many sections at once on all cores (one section per worker; each analysis is independent and deterministic,
/// so a batch gives the same numbers as one-by-one runs). A section that fails with an input error does not stop the
/// others: its item carries the error instead of a result. The workers share the memory budget: each analysis gets
/// <see cref="AnalysisOptions.MemoryBudgetBytes"/> divided by the number of workers (<see cref="WorkerBudget"/>), so a
/// batch needs no more memory than one analysis with the same options.
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
        return Run(profiles.Count, i => profiles[i].Name ?? $"#{i + 1}", i => (profiles[i].Name ?? $"#{i + 1}", profiles[i], null), options, maxParallelism, cancellationToken, completed);
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
    /// <remarks>The reader's notes on a source (parts analysed together, entities left out) are added to its result's
    /// warnings with the code <c>drawing</c>; a <see cref="ProfileSourceOptions.Notes"/> callback also receives them,
    /// from the worker threads.</remarks>
    public static IReadOnlyList<SectionBatchItem> Analyze(IReadOnlyList<string> sources, ProfileSourceOptions? sourceOptions,
        AnalysisOptions? options = null, int maxParallelism = 0, CancellationToken cancellationToken = default,
        Action<SectionBatchItem>? completed = null)
    {
        ArgumentNullException.ThrowIfNull(sources);
        var baseOptions = sourceOptions ?? new ProfileSourceOptions();
        return Run(sources.Count, i => sources[i], i =>
        {
            var notes = new List<string>();
            var own = baseOptions with { Notes = n => { notes.Add(n); baseOptions.Notes?.Invoke(n); } };
            return (sources[i], ProfileSources.Load(sources[i], own), notes);
        }, options, maxParallelism, cancellationToken, completed);
    }

    /// <summary>
    /// The memory budget of each of <paramref name="workers"/> parallel analyses that share <paramref name="total"/>
    /// bytes: an equal share (common practice, no source), at least 16 MiB.
    /// </summary>
    internal static long WorkerBudget(long total, int workers) => Math.Max(16L << 20, total / Math.Max(1, workers));

    private static SectionBatchItem[] Run(int count, Func<int, string> name, Func<int, (string Source, Profile Profile, List<string>? Notes)> load, AnalysisOptions? options,
        int maxParallelism, CancellationToken ct, Action<SectionBatchItem>? completed)
    {
        var opts = options ?? AnalysisOptions.Default;
        var items = new SectionBatchItem[count];
        int workers = Math.Max(1, Math.Min(count, maxParallelism > 0 ? maxParallelism : Environment.ProcessorCount));
        if (workers > 1) opts = opts with { MemoryBudgetBytes = WorkerBudget(opts.MemoryBudgetBytes, workers) };
        var parallel = new ParallelOptions { MaxDegreeOfParallelism = workers, CancellationToken = ct };
        try
        {
            Parallel.For(0, count, parallel, i =>
            {
                string source = name(i);
                SectionBatchItem item;
                try
                {
                    (source, var profile, var notes) = load(i);
                    // one analysis per core already: the factorization keeps to this worker's thread
                    var result = workers > 1 ? KernelThreads.OneThread(() => SectionAnalyzer.Analyze(profile, opts, ct)) : SectionAnalyzer.Analyze(profile, opts, ct);
                    if (notes is { Count: > 0 })
                        result = result with { Warnings = notes.Select(n => new AnalysisWarning("drawing", n)).Concat(result.Warnings).ToList().AsReadOnly() };
                    item = new SectionBatchItem(i, source, result, null);
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
