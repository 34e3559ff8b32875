using SectionTwist.Units;

namespace SectionTwist.Import;

/// <summary>Options passed to a profile source.</summary>
public sealed record ProfileSourceOptions
{
    /// <summary>Length unit of the input (overrides the file's own unit; default unit for specs). Null: the source's default.</summary>
    public LengthUnit? Unit { get; init; }

    /// <summary>Take only the entities on this layer (drawings).</summary>
    public string? Layer { get; init; }

    /// <summary>Take only part N (1-based) when the drawing holds several separate parts.</summary>
    public int? Part { get; init; }

    /// <summary>Requested relative accuracy; sources that flatten curves tie their chord tolerance to it.</summary>
    public double Accuracy { get; init; } = 1e-4;

    /// <summary>Relative snap tolerance for joining segment ends (fraction of the part size). Null: the source's default.</summary>
    public double? SnapTolerance { get; init; }

    /// <summary>Receives non-fatal notes (skipped entities, gaps closed).</summary>
    public Action<string>? Notes { get; init; }

    /// <summary>Stops reading a large input; sources observe it in their long loops.</summary>
    public CancellationToken Cancellation { get; init; }
}
