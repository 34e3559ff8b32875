using System.Globalization;
using SectionTwist.Geometry;
using SectionTwist.Units;

namespace SectionTwist.Import;

/// <summary>
/// A plain-text point list (<c>.csv</c>, <c>.pts</c>): one <c>x, y</c> vertex per line; a blank line ends a loop;
/// <c>arc, xm, ym, xe, ye</c> adds an arc from the previous point through (xm, ym) to (xe, ye); <c>unit, in</c> sets
/// the length unit (default mm); <c>#</c> starts a comment. Loops close themselves; nesting decides outer loops and
/// holes. Curves given as many short lines are named in a note, or fitted by arcs with
/// <see cref="ProfileSourceOptions.FitArcs"/>. This source is also the worked example of writing an <see cref="IProfileSource"/>.
/// </summary>
public sealed class PointListSource : IProfileSource
{
    /// <inheritdoc />
    public string Name => "point-list";

    /// <inheritdoc />
    public IReadOnlyList<string> Extensions { get; } = [".csv", ".pts"];

    /// <inheritdoc />
    public bool CanLoad(string source) =>
        Extensions.Contains(Path.GetExtension(source).ToLowerInvariant()) && File.Exists(source);

    /// <inheritdoc />
    public Profile Load(string source, ProfileSourceOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        string text = Limits.InputFile.ReadAllText(source, Limits.InputLimits.MaxPointListBytes, "point list", options.Cancellation);
        return FacetFit.Apply(Parse(new StringReader(text), Path.GetFileName(source), options.Unit, options.Cancellation), options);
    }

    /// <summary>Parses point-list text; <paramref name="name"/> is used in messages.</summary>
    /// <param name="reader">The text.</param>
    /// <param name="name">Name used in messages.</param>
    /// <param name="unitOverride">Unit that overrides the file's own 'unit' line.</param>
    /// <param name="cancellationToken">Stops reading a long list.</param>
    public static Profile Parse(TextReader reader, string name, LengthUnit? unitOverride = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(reader);
        int points = 0;
        var unit = LengthUnit.Millimetre;
        var loops = new List<Loop>();
        LoopBuilder? current = null;
        int lineNo = 0, loopStartLine = 0;
        string? line;
        void Finish()
        {
            if (current is null) return;
            try { loops.Add(current.Close()); }
            catch (SectionTwistException e) { throw new SectionTwistException(e.Code, $"{name}:{loopStartLine}: {e.Message}"); }
            current = null;
        }
        while ((line = reader.ReadLine()) is not null)
        {
            lineNo++;
            if ((lineNo & 4095) == 0) cancellationToken.ThrowIfCancellationRequested();
            if (line.Length > 10_000)
                throw new SectionTwistException("bad-point-list", $"{name}:{lineNo}: a line of {line.Length} characters; a point list holds one short 'x, y' per line");
            int hash = line.IndexOf('#', StringComparison.Ordinal);
            if (hash >= 0) line = line[..hash];
            line = line.Trim();
            if (line.Length == 0) { Finish(); continue; }
            var parts = line.Split([',', ';', ' ', '\t'], StringSplitOptions.RemoveEmptyEntries);
            if (parts.Length == 0) throw new SectionTwistException("bad-point-list", $"{name}:{lineNo}: expected 'x, y' but found only separators");
            string head = parts[0].ToLowerInvariant();
            if (head == "unit")
            {
                if (parts.Length != 2) throw new SectionTwistException("bad-point-list", $"{name}:{lineNo}: write 'unit, mm' (or in, cm, m)");
                unit = LengthUnit.Parse(parts[1], $"{name}:{lineNo}");
                continue;
            }
            double m = (unitOverride ?? unit).Metres;
            if (head == "arc")
            {
                if (parts.Length != 5) throw new SectionTwistException("bad-point-list", $"{name}:{lineNo}: an arc line is 'arc, xm, ym, xe, ye' (through point, end point)");
                if (current is null) throw new SectionTwistException("bad-point-list", $"{name}:{lineNo}: an arc needs a start point on the line before it");
                var mid = new Point2(Num(parts[1], lineNo) * m, Num(parts[2], lineNo) * m);
                var end = new Point2(Num(parts[3], lineNo) * m, Num(parts[4], lineNo) * m);
                try { current.ArcThrough(mid, end); }
                catch (SectionTwistException e) { throw new SectionTwistException(e.Code, $"{name}:{lineNo}: {e.Message}"); }
                continue;
            }
            if (parts.Length != 2) throw new SectionTwistException("bad-point-list", $"{name}:{lineNo}: expected 'x, y' but found {parts.Length} values");
            if (++points > Limits.InputLimits.MaxPoints)
                throw new SectionTwistException("bad-point-list", $"{name}:{lineNo}: more than {Limits.InputLimits.MaxPoints} points; thin the outline out");
            var p = new Point2(Num(parts[0], lineNo) * m, Num(parts[1], lineNo) * m);
            if (current is null) { current = new LoopBuilder(p); loopStartLine = lineNo; }
            else if (p != current.Current) current.LineTo(p);
        }
        Finish();
        if (loops.Count == 0) throw new SectionTwistException("bad-point-list", $"{name}: no points found; write one 'x, y' per line");
        if (loops.Count > Limits.InputLimits.MaxLoops)
            throw new SectionTwistException("bad-point-list", $"{name}: {loops.Count} loops, more than the {Limits.InputLimits.MaxLoops} SectionTwist analyses together; keep only the section's outline and holes");
        return Profile.FromLoops(loops, unitOverride ?? unit, name);

        double Num(string s, int ln) =>
            double.TryParse(s, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) && double.IsFinite(v)
                ? v : throw new SectionTwistException("bad-point-list", $"{name}:{ln}: '{(s.Length > 40 ? s[..40] + "..." : s)}' is not a number");
    }
}
