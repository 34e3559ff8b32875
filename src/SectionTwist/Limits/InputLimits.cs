namespace SectionTwist.Limits;

/// <summary>
/// The fixed limits on input files and values (docs/user-guide.md, "Limits"). Inputs beyond them are refused with a
/// one-line <see cref="SectionTwistException"/> before the work is done, so a hostile or damaged file cannot crash,
/// hang or exhaust the machine. Time and memory budgets are options (<c>--timeout</c>, <see cref="Torsion.AnalysisOptions.MemoryBudgetBytes"/>).
/// </summary>
public static class InputLimits
{
    /// <summary>Largest shaft file, bytes.</summary>
    public const long MaxShaftFileBytes = 8L << 20;

    /// <summary>Largest point-list file, bytes.</summary>
    public const long MaxPointListBytes = 64L << 20;

    /// <summary>Largest DXF file, bytes.</summary>
    public const long MaxDxfBytes = 512L << 20;

    /// <summary>Most YAML nodes in a shaft file, counting every use of an alias with the size of what it refers to.</summary>
    public const int MaxYamlNodes = 200_000;

    /// <summary>Deepest nesting of lists and mappings in a shaft file.</summary>
    public const int MaxYamlDepth = 32;

    /// <summary>Longest single value (scalar) in a shaft file, characters.</summary>
    public const int MaxYamlValueLength = 1000;

    /// <summary>Most stations of one shaft (the solve is dense: memory grows with the square, time with the cube).</summary>
    public const int MaxStations = 2000;

    /// <summary>Most segments, loads or springs of one shaft (each).</summary>
    public const int MaxShaftItems = 10_000;

    /// <summary>Most entities one DXF drawing may hold (all sections, blocks included).</summary>
    public const int MaxDxfEntities = 2_000_000;

    /// <summary>Most outline pieces a DXF drawing may expand to (after block inserts and arrays).</summary>
    public const int MaxDxfPieces = 500_000;

    /// <summary>Deepest nesting of block inserts in a DXF drawing.</summary>
    public const int MaxDxfBlockDepth = 32;

    /// <summary>Most closed loops in one profile.</summary>
    public const int MaxLoops = 5_000;

    /// <summary>Most straight pieces (curves flattened finely) the outline check of a profile examines for crossings.</summary>
    public const int MaxOutlineEdges = 2_000_000;

    /// <summary>Most pair tests the outline crossing check makes (a few seconds); more means pieces crowded into one place.</summary>
    public const long MaxCrossingPairTests = 150_000_000;

    /// <summary>Most points of a point list.</summary>
    public const int MaxPoints = 2_000_000;

    /// <summary>Orders of magnitude between the section size and its smallest feature (a loop's mean thickness) that the mesher resolves.</summary>
    public const double MaxFeatureSpanDecades = 6;

    /// <summary>Smallest section size (bounding-box diagonal), metres.</summary>
    public const double MinSectionSize = 1e-9;

    /// <summary>Largest section size (bounding-box diagonal), metres.</summary>
    public const double MaxSectionSize = 1e6;

    /// <summary>Most holes in a section given to the plastic analysis (its time grows with the square of the holes).</summary>
    public const int MaxPlasticHoles = 16;

    /// <summary>Largest ratio of segment stiffnesses in one shaft; beyond it the solve loses all digits.</summary>
    public const double MaxStiffnessRatio = 1e12;
}
