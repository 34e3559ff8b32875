using System.Globalization;

namespace SectionTwist.Fuzz;

/// <summary>
/// sectiontwist's own fuzz harness (docs/verification.md, "Hostile input"):
/// <c>run [--count N] [--seed S] [--out DIR] [--budget-ms MS] [--batch N] [--memory-mb MB] [--targets dxf,points,shaft] [--resume]</c>
/// runs a campaign in worker processes; <c>quick [--count N]</c> runs in-process and prints the counts.
/// </summary>
public static class Program
{
    /// <summary>Entry point.</summary>
    public static int Main(string[] args)
    {
        if (args.Length == 0) { Console.Error.WriteLine("usage: SectionTwist.Fuzz run|quick|worker|replay [options] (see docs/verification.md)"); return 2; }
        var opt = new Dictionary<string, string>(StringComparer.Ordinal);
        for (int i = 1; i < args.Length; i++)
            if (args[i].StartsWith("--", StringComparison.Ordinal)) opt[args[i][2..]] = i + 1 < args.Length && !args[i + 1].StartsWith("--", StringComparison.Ordinal) ? args[++i] : "true";
        long L(string k, long d) => opt.TryGetValue(k, out var v) ? long.Parse(v, CultureInfo.InvariantCulture) : d;
        switch (args[0])
        {
            case "worker":
                return Worker.Run(opt["target"], (int)L("seed", 1), L("from", 0), L("count", 1000), (int)L("budget-ms", 5000));
            case "dump":
                File.WriteAllBytes(opt["file"], Runner.Make(opt["target"], (int)L("seed", 1), L("index", 0)));
                return 0;
            case "replay":
                return Worker.Replay(opt["target"], opt["file"], (int)L("budget-ms", 5000));
            case "quick":
                {
                    long failures = 0;
                    foreach (var t in FuzzTarget.All)
                    {
                        var counts = new Dictionary<Outcome, int>();
                        for (int i = 0; i < L("count", 200); i++)
                        {
                            var (o, m) = Runner.RunOne(t, Runner.Make(t.Name, (int)L("seed", 1), i), (int)L("budget-ms", 5000));
                            counts[o] = counts.GetValueOrDefault(o) + 1;
                            if (o.IsFailure() || o == Outcome.Slow) { failures += o.IsFailure() ? 1 : 0; Console.WriteLine($"{t.Name} #{i}: {o.Name()}: {m}"); }
                        }
                        Console.WriteLine($"{t.Name}: {string.Join(", ", counts.OrderBy(kv => kv.Key).Select(kv => $"{kv.Key.Name()} {kv.Value}"))}");
                    }
                    return failures == 0 ? 0 : 1;
                }
            case "run":
                {
                    var o = new CampaignOptions
                    {
                        Count = L("count", 1_000_000),
                        Seed = (int)L("seed", 1),
                        Out = opt.GetValueOrDefault("out", "fuzz-out"),
                        BudgetMs = (int)L("budget-ms", 5000),
                        Batch = (int)L("batch", 20_000),
                        MemoryMb = (int)L("memory-mb", 3072),
                        Targets = opt.TryGetValue("targets", out var ts) ? ts.Split(',') : ["dxf", "points", "shaft"],
                        Resume = opt.ContainsKey("resume"),
                        Lanes = (int)L("lanes", 1),
                        GraceSeconds = (int)L("grace-s", 10),
                    };
                    long failures = new Campaign(o, Console.Out).Run("SectionTwist.Fuzz " + string.Join(' ', args));
                    Console.WriteLine($"done: {failures} failing inputs; summary in {Path.Combine(o.Out, "summary.md")}");
                    return failures == 0 ? 0 : 1;
                }
            default:
                Console.Error.WriteLine($"unknown mode '{args[0]}'");
                return 2;
        }
    }
}
