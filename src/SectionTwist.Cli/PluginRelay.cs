using System.Diagnostics;
using System.Runtime.CompilerServices;

namespace SectionTwist.Cli;

/// <summary>
/// The ahead-of-time compiled tool (the linux-x64 package) starts fast but cannot load plugin assemblies: it has no
/// just-in-time compiler. When a command asks for plugins (<c>--plugins DIR</c> or the <c>SECTIONTWIST_PLUGINS</c>
/// variable), that build hands the whole command line to the framework-dependent build packed beside it
/// (<c>managed/sectiontwist.dll</c>, run by <c>dotnet</c>) and returns its exit code. Every other build runs the command itself.
/// </summary>
internal static class PluginRelay
{
    /// <summary>The folder, under the tool's own folder, that holds the framework-dependent build.</summary>
    internal const string ManagedFolder = "managed";

    /// <summary>True when this process cannot load plugins itself and the command line (or the environment) asks for them.</summary>
    public static bool Needed(string[] argv) =>
        !RuntimeFeature.IsDynamicCodeSupported &&
        (argv.Contains("--plugins") || !string.IsNullOrWhiteSpace(Environment.GetEnvironmentVariable(SectionCommand.PluginsVariable)));

    /// <summary>Runs the command line with the framework-dependent build; returns its exit code, or 2 with a one-line error.</summary>
    public static int Run(string[] argv, TextWriter err)
    {
        string dll = Path.Combine(AppContext.BaseDirectory, ManagedFolder, "sectiontwist.dll");
        const string Remedy = "install the portable package instead (dotnet tool install --tool-path DIR SectionTwist.Cli.any) and run DIR/sectiontwist";
        if (!File.Exists(dll))
        {
            err.WriteLine($"sectiontwist: this build is compiled ahead of time and cannot load plugins, and the managed build it hands them to is missing ({dll}); {Remedy}");
            return 2;
        }
        string? dotnet = FindDotnet();
        if (dotnet is null)
        {
            err.WriteLine($"sectiontwist: plugins need the .NET runtime ('dotnet'), which is not on PATH and not in DOTNET_ROOT; put it on PATH or {Remedy}");
            return 2;
        }
        var psi = new ProcessStartInfo(dotnet) { UseShellExecute = false };
        psi.ArgumentList.Add(dll);
        foreach (var a in argv) psi.ArgumentList.Add(a);
        try
        {
            using var p = Process.Start(psi);
            if (p is null) throw new InvalidOperationException("no process");
            p.WaitForExit();
            return p.ExitCode;
        }
        catch (Exception e) when (e is System.ComponentModel.Win32Exception or InvalidOperationException)
        {
            err.WriteLine($"sectiontwist: could not start '{dotnet}' for the plugins ({e.Message}); {Remedy}");
            return 2;
        }
    }

    private static string? FindDotnet()
    {
        string exe = OperatingSystem.IsWindows() ? "dotnet.exe" : "dotnet";
        foreach (var root in new[] { Environment.GetEnvironmentVariable("DOTNET_HOST_PATH") is { Length: > 0 } h ? Path.GetDirectoryName(h) : null,
                     Environment.GetEnvironmentVariable("DOTNET_ROOT") })
            if (root is { Length: > 0 } && File.Exists(Path.Combine(root, exe))) return Path.Combine(root, exe);
        foreach (var dir in (Environment.GetEnvironmentVariable("PATH") ?? "").Split(Path.PathSeparator, StringSplitOptions.RemoveEmptyEntries))
            if (File.Exists(Path.Combine(dir, exe))) return Path.Combine(dir, exe);
        return null;
    }
}
