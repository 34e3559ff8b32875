using System.Reflection;
using SectionTwist;

namespace SectionTwist.Cli;

/// <summary>Entry point: finds the sub-command, runs it, turns input errors into one-line messages.</summary>
internal static class Program
{
    /// <summary>
    /// The commands, listed here rather than found by reflection so that start-up loads no more than it needs
    /// (<c>CommandListTests</c> checks that every <see cref="ICommand"/> in the assembly is listed).
    /// </summary>
    internal static IReadOnlyList<ICommand> Commands { get; } = new ICommand[]
    {
        new BenchCommand(), new DemoCommand(), new InspectCommand(), new ModesCommand(), new SectionCommand(), new ShaftCommand(),
        new SweepCommand(), new TemplatesCommand(), new VerifyCommand(),
    }.OrderBy(c => c.Name, StringComparer.Ordinal).ToArray();

    public static int Main(string[] argv)
    {
        if (PluginRelay.Needed(argv)) return PluginRelay.Run(argv, Console.Error);
        var ctx = new CliContext(Console.Out, Console.Error, !Console.IsErrorRedirected);
        using var interrupt = new CancellationTokenSource();
        Console.CancelKeyPress += (_, e) => { e.Cancel = true; interrupt.Cancel(); };
        // The watchdog: a command that has not stopped GraceSeconds after its time limit is ended with the message.
        var watchdog = new Thread(() =>
        {
            while (true)
            {
                Thread.Sleep(1000);
                if (Deadline is { } d && DateTime.UtcNow > d.At.AddSeconds(CliLimits.GraceSeconds))
                {
                    Console.Error.WriteLine(d.Message);
                    Environment.Exit(2);
                }
            }
        }) { IsBackground = true };
        watchdog.Start();
        return Run(argv, ctx, interrupt.Token);
    }

    /// <summary>When the current command's time limit passes, and the message then.</summary>
    private static volatile DeadlineInfo? Deadline;

    private sealed record DeadlineInfo(DateTime At, string Message);

    /// <summary>Runs a command line against the given writers (used by tests too).</summary>
    internal static int Run(string[] argv, CliContext ctx, CancellationToken interrupt = default)
    {
        if (argv.Length == 0 || argv[0] is "help" or "--help" or "-h")
        {
            if (argv.Length > 1)
            {
                if (Find(argv[1]) is { } c) { ctx.Out.WriteLine(c.Usage); return 0; }
                ctx.Err.WriteLine($"sectiontwist help: unknown command '{argv[1]}'{Hint(argv[1])}; the commands are {string.Join(", ", Commands.Select(x => x.Name))}");
                return 2;
            }
            PrintHelp(ctx.Out);
            return argv.Length == 0 ? 2 : 0;
        }
        if (argv[0] is "--version")
        {
            ctx.Out.WriteLine(typeof(Program).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion ?? "0");
            return 0;
        }
        var cmd = Find(argv[0]);
        if (cmd is null)
        {
            ctx.Err.WriteLine($"sectiontwist: unknown command '{argv[0]}'{Hint(argv[0])}; run 'sectiontwist help' for the list");
            return 2;
        }
        CliLimits? limits = null;
        try
        {
            var args = new Args(argv.Skip(1)) { Known = Args.OptionsIn(cmd.Usage) };
            if (args.Flag("help")) { ctx.Out.WriteLine(cmd.Usage); return 0; }
            limits = new CliLimits(args, ctx, interrupt);
            if (limits.TimeoutSeconds > 0) Deadline = new DeadlineInfo(DateTime.UtcNow.AddSeconds(limits.TimeoutSeconds), limits.TimeoutMessage(cmd.Name));
            return cmd.Run(args, ctx);
        }
        catch (OperationCanceledException) when (limits?.TimedOut == true)
        {
            ctx.Err.WriteLine(limits.TimeoutMessage(cmd.Name));
            return 2;
        }
        catch (UsageException e)
        {
            ctx.Err.WriteLine($"sectiontwist {cmd.Name}: {e.Message}");
            ctx.Err.WriteLine($"usage: {cmd.Usage.Split('\n')[0]}");
            return 2;
        }
        catch (SectionTwistException e)
        {
            ctx.Err.WriteLine($"sectiontwist {cmd.Name}: error: {e.Message}");
            return 2;
        }
        catch (OperationCanceledException)
        {
            ctx.Err.WriteLine($"sectiontwist {cmd.Name}: cancelled");
            return 130;
        }
        catch (IOException e)
        {
            ctx.Err.WriteLine($"sectiontwist {cmd.Name}: error: {e.Message}");
            return 2;
        }
        catch (UnauthorizedAccessException e)
        {
            ctx.Err.WriteLine($"sectiontwist {cmd.Name}: error: {e.Message}");
            return 2;
        }
        catch (InsufficientExecutionStackException)
        {
            ctx.Err.WriteLine($"sectiontwist {cmd.Name}: error: the input nests too deeply to read; simplify it");
            return 2;
        }
        catch (OutOfMemoryException)
        {
            ctx.Err.WriteLine($"sectiontwist {cmd.Name}: error: out of memory; give a smaller --memory-budget MB or a coarser --accuracy, or close other programs");
            return 2;
        }
        catch (Exception e) when (Environment.GetEnvironmentVariable("SECTIONTWIST_DEBUG") != "1")
        {
            ctx.Err.WriteLine($"sectiontwist {cmd.Name}: internal error: {e.GetType().Name}: {Short(e.Message)} (please report it with the input; set SECTIONTWIST_DEBUG=1 for details)");
            return 70;
        }
        finally
        {
            Deadline = null;
            limits?.Dispose();
        }
    }

    private static string Short(string s) => s.Length <= 300 ? s : s[..300] + "...";

    private static ICommand? Find(string name) => Commands.FirstOrDefault(c => c.Name == name);

    /// <summary><c>; did you mean 'section'?</c> for a mistyped command, or nothing.</summary>
    private static string Hint(string word) => Suggest.DidYouMean(word, Commands.Select(c => c.Name));

    private static void PrintHelp(TextWriter w)
    {
        w.WriteLine("sectiontwist: torsion constant, peak shear and shaft twist for real cross-sections");
        w.WriteLine();
        w.WriteLine("commands:");
        foreach (var c in Commands) w.WriteLine($"  {c.Name,-10} {c.Summary}");
        w.WriteLine();
        w.WriteLine("'sectiontwist help COMMAND' shows a command's options. Every command also takes:");
        w.WriteLine($"  --timeout SECONDS     stop with a message after this time (default {CliLimits.DefaultTimeoutSeconds:0} s when not run from a terminal; 0: no limit)");
        w.WriteLine("  --memory-budget MB    memory for one section analysis (default 4096 or half the available memory)");
    }
}
