using System.Reflection;
using System.Runtime.Loader;
using SectionTwist.Geometry;

namespace SectionTwist.Import;

/// <summary>
/// The registry of profile sources: the built-in ones (templates, DXF, point lists) plus any registered in code or
/// discovered in a plugins folder. <see cref="Load"/> picks the first source whose <see cref="IProfileSource.CanLoad"/>
/// accepts the input, the most recently registered first.
/// </summary>
public static class ProfileSources
{
    private static readonly object Gate = new();
    private static readonly List<IProfileSource> Registered = [];
    private static readonly Dictionary<string, IProfileSource[]> LoadedPlugins = new(StringComparer.Ordinal);
    private static bool _builtInsAdded;

    /// <summary>The sources known now, most recently registered first.</summary>
    public static IReadOnlyList<IProfileSource> All
    {
        get { lock (Gate) { EnsureBuiltIns(); return Registered.AsEnumerable().Reverse().ToArray(); } }
    }

    /// <summary>Adds a source; it takes precedence over the ones registered before it.</summary>
    public static void Register(IProfileSource source)
    {
        ArgumentNullException.ThrowIfNull(source);
        lock (Gate) { EnsureBuiltIns(); Registered.Add(source); }
    }

    /// <summary>Loads a profile from a path or a spec.</summary>
    public static Profile Load(string source, ProfileSourceOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(source);
        options ??= new ProfileSourceOptions();
        foreach (var s in All)
            if (s.CanLoad(source)) return s.Load(source, options);
        if (File.Exists(source))
        {
            string ext = Path.GetExtension(source);
            string shaft = ext.Equals(".yaml", StringComparison.OrdinalIgnoreCase) || ext.Equals(".yml", StringComparison.OrdinalIgnoreCase)
                ? $"; a shaft file is read by 'sectiontwist shaft {source}' (or 'modes')" : "";
            throw new SectionTwistException("unknown-source",
                $"{source}: no profile source reads '{ext}' files; known: {string.Join(", ", All.SelectMany(s => s.Extensions).Distinct())}{shaft}");
        }
        throw NotFound(source);
    }

    /// <summary>
    /// Why <paramref name="source"/> could not be loaded, told apart: a folder, a spec with an unknown template name (with
    /// the nearest one), a path to a missing file (with the nearest file name), or a bare word (with the nearest template).
    /// </summary>
    private static SectionTwistException NotFound(string source)
    {
        string text = source.Trim();
        var templates = Profiles.ProfileTemplates.All.SelectMany(t => t.Aliases.Prepend(t.Name)).ToList();
        if (Directory.Exists(text))
            return new("not-a-file", $"'{source}' is a folder; give a drawing (.dxf), a point list (.csv, .pts) or a template spec such as keyed:d=40");
        int colon = text.IndexOf(':', StringComparison.Ordinal);
        bool path = text.Contains('/', StringComparison.Ordinal) || text.Contains('\\', StringComparison.Ordinal) || colon == 1;
        if (colon > 0 && !path)
        {
            string name = text[..colon].Trim();
            return new("unknown-template",
                $"'{source}': unknown template '{name}'{Suggest.DidYouMean(name, templates)}; run 'sectiontwist templates' for the list");
        }
        if (path || Path.HasExtension(text))
            return new("file-not-found", FileHints.Missing(text, "file") + "; check the path and the file name");
        string near = Suggest.DidYouMean(text, templates, "; did you mean the template ", " (written NAME:key=value, e.g. keyed:d=40)?");
        return new("unknown-source",
            $"'{source}': no such file here and not a template spec (NAME:key=value, e.g. keyed:d=40){near}; run 'sectiontwist templates' for the templates");
    }

    /// <summary>
    /// Loads every assembly in <paramref name="folder"/> into its own isolated <see cref="AssemblyLoadContext"/> and
    /// registers each public, non-abstract <see cref="IProfileSource"/> with a parameterless constructor. Returns the
    /// sources the folder supplies. An assembly already loaded from the same path is not loaded or registered again.
    /// A missing folder is an error (a mistyped path should not pass silently).
    /// </summary>
    /// <exception cref="SectionTwistException">The folder does not exist, or a file in it is not a usable .NET assembly.</exception>
    public static IReadOnlyList<IProfileSource> LoadPlugins(string folder)
    {
        ArgumentNullException.ThrowIfNull(folder);
        if (!System.Runtime.CompilerServices.RuntimeFeature.IsDynamicCodeSupported)
            throw new SectionTwistException("plugins-unsupported",
                $"plugins folder '{folder}': this program is compiled ahead of time and cannot load plugin assemblies; use a framework-dependent build (the portable tool package SectionTwist.Cli.any, or the library from a normal .NET application)");
        if (!Directory.Exists(folder))
            throw new SectionTwistException("no-plugin-folder", $"plugins folder '{folder}' does not exist; give a folder that holds the plugin .dll files");
        var found = new List<IProfileSource>();
        foreach (var path in Directory.EnumerateFiles(folder, "*.dll").Select(Path.GetFullPath).OrderBy(p => p, StringComparer.Ordinal))
        {
            lock (Gate)
            {
                if (!LoadedPlugins.TryGetValue(path, out var sources))
                {
                    sources = LoadPluginAssembly(path);
                    foreach (var src in sources) Register(src);
                    LoadedPlugins[path] = sources;
                }
                found.AddRange(sources);
            }
        }
        return found;
    }

    [System.Diagnostics.CodeAnalysis.UnconditionalSuppressMessage("Trimming", "IL2026", Justification = "Plugins load only with a JIT: LoadPlugins refuses in an ahead-of-time build before this runs.")]
    [System.Diagnostics.CodeAnalysis.UnconditionalSuppressMessage("Trimming", "IL2062", Justification = "As IL2026: plugin types come whole from their own assembly.")]
    [System.Diagnostics.CodeAnalysis.UnconditionalSuppressMessage("Trimming", "IL2065", Justification = "As IL2026: plugin types come whole from their own assembly.")]
    [System.Diagnostics.CodeAnalysis.UnconditionalSuppressMessage("Trimming", "IL2072", Justification = "As IL2026: plugin types come whole from their own assembly.")]
    [System.Diagnostics.CodeAnalysis.UnconditionalSuppressMessage("Trimming", "IL2075", Justification = "As IL2026: plugin types come whole from their own assembly.")]
    private static IProfileSource[] LoadPluginAssembly(string path)
    {
        Assembly asm;
        Type[] types;
        try
        {
            asm = new PluginLoadContext(path).LoadFromAssemblyPath(path);
            types = asm.GetExportedTypes();
        }
        catch (BadImageFormatException e)
        {
            throw new SectionTwistException("bad-plugin", $"{path}: not a .NET assembly ({e.Message}); remove it from the plugins folder");
        }
        catch (Exception e) when (e is FileLoadException or FileNotFoundException or TypeLoadException or ReflectionTypeLoadException)
        {
            throw new SectionTwistException("bad-plugin", $"{path}: cannot load the plugin ({e.Message}); build it against this SectionTwist version and copy its dependencies beside it");
        }
        var list = new List<IProfileSource>();
        foreach (var t in types)
        {
            if (t.IsAbstract || !typeof(IProfileSource).IsAssignableFrom(t) || t.GetConstructor(Type.EmptyTypes) is null) continue;
            try { list.Add((IProfileSource)Activator.CreateInstance(t)!); }
            catch (TargetInvocationException e)
            {
                throw new SectionTwistException("bad-plugin", $"{path}: {t.FullName} failed to start ({e.InnerException?.Message ?? e.Message})", e);
            }
        }
        return [.. list];
    }

    private static void EnsureBuiltIns()
    {
        if (_builtInsAdded) return;
        _builtInsAdded = true;
        Registered.InsertRange(0, BuiltInSources.Create());
    }

    /// <summary>
    /// Isolates a plugin's own dependencies while sharing SectionTwist's types with the host, so the plugin's
    /// <see cref="IProfileSource"/> is the host's interface.
    /// </summary>
    private sealed class PluginLoadContext(string pluginPath) : AssemblyLoadContext(isCollectible: false)
    {
        private readonly AssemblyDependencyResolver _resolver = new(pluginPath);

        protected override Assembly? Load(AssemblyName name)
        {
            // Share the contract (SectionTwist.Core) and the framework with the host; everything else the plugin
            // brings beside it is its own. Returning null falls back to the host's (default) context.
            if (name.Name is { } n && (n == typeof(IProfileSource).Assembly.GetName().Name || n.StartsWith("System", StringComparison.Ordinal)))
                return null;
            string? path = _resolver.ResolveAssemblyToPath(name);
            return path is null ? null : LoadFromAssemblyPath(path);
        }
    }
}
