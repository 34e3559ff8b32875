using System.Globalization;

namespace SectionTwist.Fuzz;

/// <summary>
/// The child process of a campaign: runs inputs [from, from + count) of one target and writes "&gt; i" before and
/// "&lt; i outcome ms message" after each, flushed, so the parent knows which input was running if the process dies.
/// </summary>
public static class Worker
{
    /// <summary>Runs the batch; returns the process exit code.</summary>
    public static int Run(string target, int seed, long from, long count, int budgetMs)
    {
        var t = FuzzTarget.Get(target);
        var output = Console.Out;
        // warm up (JIT, caches) on the seeds, so that the first inputs are not charged for compilation
        foreach (var s in Seeds.For(target)) Runner.RunOne(t, s, 60_000);
        for (long i = from; i < from + count; i++)
        {
            var input = Runner.Make(target, seed, i);
            output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"> {i}"));
            output.Flush();
            long start = Environment.TickCount64;
            var (o, message) = Runner.RunOne(t, input, budgetMs);
            output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"< {i} {o.Name()} {Environment.TickCount64 - start} {message}"));
            output.Flush();
        }
        return 0;
    }

    /// <summary>Runs one saved file (used by the minimizer); prints the outcome name.</summary>
    public static int Replay(string target, string file, int budgetMs)
    {
        var (o, message) = Runner.RunOne(FuzzTarget.Get(target), File.ReadAllBytes(file), budgetMs);
        Console.Out.WriteLine($"{o.Name()} {message}");
        return 0;
    }
}
