using System.Globalization;
using SectionTwist.Geometry;
using SectionTwist.Import;

namespace SectionTwist.Cli;

/// <summary>The drawing options shared by <c>section</c> and <c>inspect</c>: layers, part choice, hatch, facets, snap.</summary>
internal static class DrawingOptions
{
    /// <summary>Usage lines for the options.</summary>
    public const string Usage = """
          --layer     use only these layers: a name, a comma list or a pattern with * and ? (case-insensitive); repeatable
                      (entities on layer 0 inside blocks take the insert's layer)
          --part N    use only the N-th part (largest first, as 'inspect' lists them)
          --at X,Y    use the part around this point (drawing units): the innermost closed loop, its inner loops as holes
          --window X1,Y1,X2,Y2  use only entities lying wholly inside this box (one view of a drawing sheet)
          --hatch     take the outline from the boundaries of HATCH entities (the hatched cut of a section view)
          --fit-arcs REL  replace curves drawn as facets by arcs through their corners, within REL x the part size
                      (0 < REL <= 0.01, e.g. 1e-4)
          --skip-open leave out entities that do not close (they are named) instead of refusing the drawing
          --snap REL  join end points closer than REL x the drawing's size (0 <= REL < 0.1, default 1e-6)
        """;

    /// <summary>Reads the options into <paramref name="o"/>.</summary>
    public static ProfileSourceOptions Read(Args args, ProfileSourceOptions o)
    {
        var layers = args.Options("layer");
        var at = args.Option("at");
        var window = args.Option("window");
        return o with
        {
            Layer = layers.Count == 0 ? null : string.Join(",", layers),
            Part = args.Int("part"),
            At = at is null ? null : Point(at),
            Window = window is null ? null : Window(window),
            UseHatches = args.Flag("hatch"),
            FitArcs = args.Double("fit-arcs"),
            SkipOpen = args.Flag("skip-open"),
            SnapTolerance = args.Double("snap"),
        };
    }

    private static double[] Numbers(string text, int count, string option, string example)
    {
        var parts = text.Split(',', StringSplitOptions.TrimEntries);
        var v = new double[parts.Length];
        if (parts.Length != count || !parts.Select((p, i) => double.TryParse(p, NumberStyles.Float, CultureInfo.InvariantCulture, out v[i]) && double.IsFinite(v[i])).All(ok => ok))
            throw new UsageException($"--{option}: '{text}' is not {count} numbers separated by commas (drawing units, decimal point), e.g. --{option} {example}");
        return v;
    }

    private static Point2 Point(string text)
    {
        var v = Numbers(text, 2, "at", "20,15");
        return new Point2(v[0], v[1]);
    }

    private static Box2 Window(string text)
    {
        var v = Numbers(text, 4, "window", "0,0,120,80");
        var b = new Box2(Math.Min(v[0], v[2]), Math.Min(v[1], v[3]), Math.Max(v[0], v[2]), Math.Max(v[1], v[3]));
        if (!(b.Width > 0 && b.Height > 0)) throw new UsageException($"--window: '{text}' has no width or no height; give two opposite corners, e.g. --window 0,0,120,80");
        return b;
    }
}
