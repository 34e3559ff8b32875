using System.Reflection;
using SectionTwist;

namespace SectionTwist.Cli;

/// <summary>Entry point: finds the sub-command, runs it, turns input errors into one-line messages.</summary>
internal static class Program
{
    internal static IReadOnlyList<ICommand> Commands { get; } = typeof(Program).Assembly.GetTypes()
        .Where(t => typeof(ICommand).IsAssignableFrom(t) && t is { IsAbstract: false, IsInterface: false })
        .Select(t => (ICommand)Activator.CreateInstance(t)!)
        .OrderBy(c => c.Name, StringComparer.Ordinal)
        .ToArray();

    public static int Main(string[] argv)
    {
        var ctx = new CliContext(Console.Out, Console.Error, !Console.IsErrorRedirected);
        return Run(argv, ctx);
    }

    /// <summary>Runs a command line against the given writers (used by tests too).</summary>
    internal static int Run(string[] argv, CliContext ctx)
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
        try
        {
            var args = new Args(argv.Skip(1)) { Known = Args.OptionsIn(cmd.Usage) };
            if (args.Flag("help")) { ctx.Out.WriteLine(cmd.Usage); return 0; }
            return cmd.Run(args, ctx);
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
        catch (Exception e) when (Environment.GetEnvironmentVariable("SECTIONTWIST_DEBUG") != "1")
        {
            ctx.Err.WriteLine($"sectiontwist {cmd.Name}: internal error: {e.GetType().Name}: {e.Message} (please report it with the input; set SECTIONTWIST_DEBUG=1 for details)");
            return 70;
        }
    }

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
        w.WriteLine("'sectiontwist help COMMAND' shows a command's options.");
    }
}
