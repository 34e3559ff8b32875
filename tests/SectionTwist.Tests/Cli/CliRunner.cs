using SectionTwist.Cli;

namespace SectionTwist.Tests.Cli;

/// <summary>Runs the sectiontwist command in-process and captures its output streams.</summary>
internal static class CliRunner
{
    public static (int Code, string Out, string Err) Run(params string[] args) => Run(false, args);

    /// <summary>Runs with standard error treated as a terminal (progress displays allowed) or not.</summary>
    public static (int Code, string Out, string Err) Run(bool terminal, params string[] args)
    {
        var o = new StringWriter(); var e = new StringWriter();
        // on a "terminal" the progress line shows at once, so tests see it
        int code = Program.Run(args, new CliContext(o, e, terminal) { ProgressDelay = TimeSpan.Zero });
        return (code, o.ToString(), e.ToString());
    }

    /// <summary>A fresh temporary folder for one test.</summary>
    public static string TempDir()
    {
        string d = Path.Combine(Path.GetTempPath(), "sectiontwist-tests", Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(d);
        return d;
    }
}
