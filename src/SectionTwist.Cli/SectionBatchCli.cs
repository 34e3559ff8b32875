using System.Globalization;
using System.Text;
using System.Text.Json;
using SectionTwist.Import;
using SectionTwist.Torsion;
using SectionTwist.Units;

namespace SectionTwist.Cli;

/// <summary>
/// <c>sectiontwist section SOURCE SOURCE ...</c> (or a wildcard, or <c>--csv</c>): analyses every source on all cores
/// through the library's batch entry point (<see cref="SectionBatch"/>) and prints one table, CSV or JSON lines (one
/// object per source, docs/schemas/section-batch.schema.json). A failing source gets its own error row; the others
/// still run, and the command exits 2 at the end when any source failed.
/// </summary>
internal static class SectionBatchCli
{
    /// <summary>Most sources of one batch, after wildcards are expanded (checked before any work).</summary>
    internal const int MaxSources = 100_000;

    /// <summary>Output form of a batch.</summary>
    internal enum Form { Table, Csv, JsonLines }

    /// <summary>True when the arguments ask for a batch: several sources, a wildcard, or <c>--csv</c>.</summary>
    internal static bool IsBatch(IReadOnlyList<string> positional, bool csv) =>
        csv || positional.Count > 1 || positional.Any(HasWildcard);

    /// <summary>A path with * or ? (template specs, which have a colon after the name, are never patterns).</summary>
    private static bool HasWildcard(string s) => s.IndexOfAny(['*', '?']) >= 0 && s.IndexOf(':', StringComparison.Ordinal) is < 0 or 1;

    /// <summary>
    /// The sources with wildcards expanded (in the file name only, matches sorted by name); a pattern that matches
    /// nothing stays as written, so its row reports the missing file.
    /// </summary>
    internal static List<string> Expand(IReadOnlyList<string> positional)
    {
        var list = new List<string>();
        foreach (string s in positional)
        {
            if (!HasWildcard(s)) { list.Add(s); continue; }
            string dir = Path.GetDirectoryName(s) is { Length: > 0 } d ? d : ".";
            string pattern = Path.GetFileName(s);
            if (dir.IndexOfAny(['*', '?']) >= 0 || !Directory.Exists(dir)) { list.Add(s); continue; }
            var files = Directory.EnumerateFiles(dir, pattern, new EnumerationOptions { MatchCasing = MatchCasing.PlatformDefault, RecurseSubdirectories = false })
                .Select(f => dir == "." && !s.StartsWith('.') ? Path.GetFileName(f) : f)
                .Order(StringComparer.Ordinal).Take(MaxSources + 1).ToList();
            if (files.Count == 0) list.Add(s); else list.AddRange(files);
            if (list.Count > MaxSources) break;
        }
        if (list.Count > MaxSources)
            throw new UsageException($"more than {MaxSources} sources; split the batch into several runs");
        return list;
    }

    /// <summary>Runs the batch and prints it; returns the exit code (2 when any source failed).</summary>
    public static int Run(CliContext ctx, IReadOnlyList<string> sources, ProfileSourceOptions srcOptions, AnalysisOptions options,
        UnitSystem? units, Form form, int jobs)
    {
        int done = 0;
        IReadOnlyList<SectionBatchItem> items;
        using (var progress = new ProgressLine(ctx, $"section batch of {sources.Count}"))
        {
            items = SectionBatch.Analyze(sources, srcOptions, options, jobs, ctx.Cancellation,
                _ => progress.Report((double)Interlocked.Increment(ref done) / sources.Count, $"{done} of {sources.Count} done"));
            progress.Clear();
        }
        switch (form)
        {
            case Form.Csv: WriteCsv(ctx.Out, items); break;
            case Form.JsonLines: foreach (var item in items) ctx.Out.WriteLine(JsonLine(item)); break;
            default: WriteTable(ctx.Out, items, units ?? UnitSystem.For(items.FirstOrDefault(x => x.Result is not null)?.Result!.LengthUnit ?? LengthUnit.Millimetre)); break;
        }
        int failed = items.Count(x => x.Error is not null);
        if (failed == 0) return 0;
        ctx.Err.WriteLine($"sectiontwist section: error: {failed} of {items.Count} sources failed ({string.Join(", ", items.Where(x => x.Error is not null).Take(3).Select(x => x.Source))}{(failed > 3 ? ", ..." : "")}); see their rows");
        return 2;
    }

    private static bool Unbounded(SectionResult r) => double.IsPositiveInfinity(r.EstimatedRelativeError.MaxShear);

    private static string Err(double v) => double.IsNaN(v) ? "n/a" : double.IsInfinity(v) ? "unbounded" : NumberText.Exponent(v, 2);

    private static void WriteTable(TextWriter w, IReadOnlyList<SectionBatchItem> items, UnitSystem u)
    {
        int width = Math.Clamp(items.Max(x => x.Source.Length), 6, 60);
        w.WriteLine($"section batch of {items.Count} sources  (units {u.Name})");
        w.WriteLine($"  {"source".PadRight(width)}  {"J [" + u.SecondMoment.Symbol + "]",14}  {"J/Ip",6}  {"tau/T [" + u.ShearPerTorque.Symbol + "]",22}  {"err(J)",8}  {"err(tau)",9}  {"elements",8}");
        foreach (var item in items)
        {
            string src = item.Source.Length > width ? "..." + item.Source[^(width - 3)..] : item.Source.PadRight(width);
            if (item.Result is not { } r)
            {
                w.WriteLine($"  {src}  error: {item.Error!.Message}");
                continue;
            }
            string tau = Unbounded(r) ? "unbounded" : u.ShearPerTorque.Format(r.MaxShearPerTorque, 6);
            w.WriteLine($"  {src}  {u.SecondMoment.Format(r.TorsionConstant, 6),14}  {NumberText.Fixed(r.TorsionConstant / r.PolarMoment, 4),6}  {tau,22}  {Err(r.EstimatedRelativeError.TorsionConstant),8}  {Err(r.EstimatedRelativeError.MaxShear),9}  {r.Mesh.Elements,8}");
        }
        foreach (var item in items.Where(x => x.Result is not null))
            foreach (var warn in item.Result!.Warnings)
                w.WriteLine($"  warning ({item.Source}) [{warn.Code}]: {warn.Message}");
    }

    private static string R(double v) => double.IsFinite(v) ? v.ToString("R", CultureInfo.InvariantCulture) : "";

    private static string Quote(string s) => "\"" + s.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"";

    private static void WriteCsv(TextWriter w, IReadOnlyList<SectionBatchItem> items)
    {
        w.WriteLine("source,status,area_m2,polarMoment_m4,torsionConstant_m4,maxShearPerTorque_per_m3,peakShearUnbounded,estimatedRelativeErrorJ,estimatedRelativeErrorShear,elements,error,warnings");
        foreach (var item in items)
        {
            if (item.Result is not { } r)
            {
                w.WriteLine(string.Join(",", Quote(item.Source), "error", "", "", "", "", "", "", "", "", Quote($"[{item.Error!.Code}] {item.Error.Message}"), "\"\""));
                continue;
            }
            w.WriteLine(string.Join(",", Quote(item.Source), "ok", R(r.Properties.Area), R(r.PolarMoment), R(r.TorsionConstant),
                R(r.MaxShearPerTorque), Unbounded(r) ? "yes" : "no", R(r.EstimatedRelativeError.TorsionConstant),
                R(r.EstimatedRelativeError.MaxShear), r.Mesh.Elements.ToString(CultureInfo.InvariantCulture), "\"\"",
                Quote(string.Join("; ", r.Warnings.Select(x => $"[{x.Code}] {x.Message}")))));
        }
    }

    /// <summary>One JSON line (docs/schemas/section-batch.schema.json), SI base units.</summary>
    internal static string JsonLine(SectionBatchItem item)
    {
        using var stream = new MemoryStream();
        using (var j = new Utf8JsonWriter(stream))
        {
            j.WriteStartObject();
            j.WriteNumber("index", item.Index);
            j.WriteString("source", item.Source);
            if (item.Result is { } r)
            {
                j.WriteString("status", "ok");
                j.WriteString("lengthUnit", r.LengthUnit.Symbol);
                j.WriteNumber("area", r.Properties.Area);
                j.WriteNumber("polarMoment", r.PolarMoment);
                j.WriteNumber("torsionConstant", r.TorsionConstant);
                j.WriteNumber("maxShearPerTorque", r.MaxShearPerTorque);
                j.WriteBoolean("maxShearUnbounded", Unbounded(r));
                j.WriteStartObject("estimatedRelativeError");
                Number(j, "torsionConstant", r.EstimatedRelativeError.TorsionConstant);
                Number(j, "maxShear", r.EstimatedRelativeError.MaxShear);
                j.WriteEndObject();
                j.WriteNumber("elements", r.Mesh.Elements);
                j.WriteStartArray("warnings");
                foreach (var x in r.Warnings) { j.WriteStartObject(); j.WriteString("code", x.Code); j.WriteString("message", x.Message); j.WriteEndObject(); }
                j.WriteEndArray();
            }
            else
            {
                j.WriteString("status", "error");
                j.WriteStartObject("error");
                j.WriteString("code", item.Error!.Code);
                j.WriteString("message", item.Error.Message);
                j.WriteEndObject();
            }
            j.WriteEndObject();
        }
        return Encoding.UTF8.GetString(stream.ToArray());
    }

    private static void Number(Utf8JsonWriter j, string name, double v)
    {
        if (double.IsFinite(v)) j.WriteNumber(name, v); else j.WriteNull(name);
    }
}
