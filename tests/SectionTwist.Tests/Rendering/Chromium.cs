using System.Diagnostics;

namespace SectionTwist.Tests.Rendering;

/// <summary>Headless Chromium (Debian package <c>chromium</c>, installed by .ci/run): loads a local HTML file and returns its DOM.</summary>
internal static class Chromium
{
    /// <summary>The browser on the PATH, or null.</summary>
    public static string? Find()
    {
        foreach (string dir in (Environment.GetEnvironmentVariable("PATH") ?? "").Split(':'))
            foreach (string name in new[] { "chromium", "chromium-browser" })
            {
                string p = Path.Combine(dir, name);
                if (File.Exists(p)) return p;
            }
        return null;
    }

    /// <summary>
    /// Opens <paramref name="htmlPath"/> with <c>--dump-dom</c>; returns the serialised DOM and the page's console lines
    /// (Chromium logs them as <c>:CONSOLE</c> lines, uncaught errors as <c>Uncaught</c>).
    /// </summary>
    public static (string Dom, IReadOnlyList<string> ConsoleLines) DumpDom(string chromium, string htmlPath, string scratchDir)
    {
        var psi = new ProcessStartInfo(chromium) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (string a in new[]
                 {
                     "--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update",
                     "--disable-sync", "--no-first-run", "--enable-logging=stderr", "--v=0",
                     "--user-data-dir=" + Path.Combine(scratchDir, "chromium-profile"), "--dump-dom", new Uri(Path.GetFullPath(htmlPath)).AbsoluteUri,
                 })
            psi.ArgumentList.Add(a);
        using var p = Process.Start(psi)!;
        var stderrTask = p.StandardError.ReadToEndAsync();
        string dom = p.StandardOutput.ReadToEnd();
        Assert.True(p.WaitForExit(90_000), "chromium did not finish within 90 s");
        var console = stderrTask.Result.Split('\n')
            .Where(l => l.Contains("Uncaught", StringComparison.Ordinal) || l.Contains(":CONSOLE", StringComparison.Ordinal)).ToList();
        return (dom, console);
    }
}
