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
            throw new SectionTwistException("unknown-source",
                $"{source}: no profile source reads '{Path.GetExtension(source)}' files; known: {string.Join(", ", All.SelectMany(s => s.Extensions).Distinct())}");
        throw new SectionTwistException("unknown-source",
            $"'{source}' is neither a readable file nor a template spec like keyed:d=40; run 'sectiontwist templates' for the list");
    }

    /// <summary>
    /// Loads every assembly in <paramref name="folder"/> into its own isolated <see cref="AssemblyLoadContext"/> and
    /// registers each public, non-abstract <see cref="IProfileSource"/> with a parameterless constructor. Returns the
    /// sources added.
    /// </summary>
    public static IReadOnlyList<IProfileSource> LoadPlugins(string folder)
    {
        var added = new List<IProfileSource>();
        if (!Directory.Exists(folder)) return added;
        foreach (var path in Directory.EnumerateFiles(folder, "*.dll").OrderBy(p => p, StringComparer.Ordinal))
        {
            Assembly asm;
            try
            {
                var ctx = new PluginLoadContext(Path.GetFullPath(path));
                asm = ctx.LoadFromAssemblyPath(Path.GetFullPath(path));
            }
            catch (BadImageFormatException e)
            {
                throw new SectionTwistException("bad-plugin", $"{path}: not a .NET assembly ({e.Message}); remove it from the plugins folder");
            }
            foreach (var t in asm.GetExportedTypes())
            {
                if (t.IsAbstract || !typeof(IProfileSource).IsAssignableFrom(t) || t.GetConstructor(Type.EmptyTypes) is null) continue;
                var src = (IProfileSource)Activator.CreateInstance(t)!;
                Register(src);
                added.Add(src);
            }
        }
        return added;
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
            if (name.Name is { } n && (n.StartsWith("SectionTwist", StringComparison.Ordinal) || n.StartsWith("System", StringComparison.Ordinal)))
                return null; // share with the host
            string? path = _resolver.ResolveAssemblyToPath(name);
            return path is null ? null : LoadFromAssemblyPath(path);
        }
    }
}
