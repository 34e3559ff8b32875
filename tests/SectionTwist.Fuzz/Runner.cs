namespace SectionTwist.Fuzz;

/// <summary>Makes the inputs of a campaign deterministically and runs one input in-process with a time budget.</summary>
public static class Runner
{
    private static readonly Dictionary<string, IReadOnlyList<byte[]>> SeedCache = [];

    /// <summary>Input number <paramref name="index"/> of <paramref name="target"/> for campaign seed <paramref name="seed"/>.</summary>
    public static byte[] Make(string target, int seed, long index)
    {
        IReadOnlyList<byte[]> seeds;
        lock (SeedCache)
            if (!SeedCache.TryGetValue(target, out seeds!)) SeedCache[target] = seeds = Seeds.For(target);
        var rng = new Random(Mix(seed, target, index));
        var s = seeds[rng.Next(seeds.Count)];
        // one input in 20 is an unmutated seed, so the ok path stays exercised
        if (rng.Next(20) == 0) return s;
        return Mutator.Mutate(rng, s, seeds[rng.Next(seeds.Count)], target);
    }

    /// <summary>A seed for input <paramref name="index"/> that is the same in every process (SplitMix64 finalizer; HashCode is randomized per process).</summary>
    public static int Mix(int seed, string target, long index)
    {
        ulong z = (ulong)seed * 0x9E3779B97F4A7C15UL ^ (ulong)index * 0xBF58476D1CE4E5B9UL;
        foreach (char c in target) z = (z ^ c) * 0x94D049BB133111EBUL;
        z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
        z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
        z ^= z >> 31;
        return (int)(z & 0x7fffffff);
    }

    /// <summary>Runs one input; the message is the error's first line (or why the outcome is a failure).</summary>
    public static (Outcome Outcome, string Message) RunOne(FuzzTarget target, byte[] input, int budgetMs)
    {
        using var cts = new CancellationTokenSource(budgetMs);
        try
        {
            return target.Run(input, cts.Token) ? (Outcome.Ok, "") : (Outcome.NonFinite, "a result holds NaN or infinity");
        }
        catch (SectionTwistException e)
        {
            // the documented input error: one line that does not echo megabytes of input
            if (e.Message.Contains('\n', StringComparison.Ordinal) || e.Message.Length > 1500)
                return (Outcome.Crash, $"SectionTwistException with a message of {e.Message.Length} characters or several lines: {Head(e.Message)}");
            if (e.Code == "dxf-internal") return (Outcome.Crash, $"the DXF safety net caught: {Head(e.Message)}");
            return (Outcome.CleanError, $"{e.Code}: {Head(e.Message)}");
        }
        catch (OperationCanceledException) when (cts.IsCancellationRequested)
        {
            return (Outcome.Slow, $"cancelled at the {budgetMs} ms budget");
        }
        catch (OutOfMemoryException e)
        {
            return (Outcome.Memory, Head(e.Message));
        }
        catch (Exception e)
        {
            return (Outcome.Crash, $"{e.GetType().Name}: {Head(e.Message)} at {Head(e.StackTrace?.Split('\n').FirstOrDefault()?.Trim() ?? "")}");
        }
    }

    private static string Head(string s)
    {
        s = s.Replace('\n', ' ').Replace('\r', ' ');
        return s.Length <= 200 ? s : s[..200] + "...";
    }
}
