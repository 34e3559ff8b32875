using System.Globalization;
using SectionTwist;
using SectionTwist.Geometry;
using SectionTwist.Import;
using SectionTwist.Units;

namespace SectionTwist.TestPlugin;

/// <summary>
/// A test plugin source for specs like <c>sq:20</c>: a solid square of side 20 (millimetres unless the options give
/// another unit), centred on the origin.
/// </summary>
public sealed class SquareSource : IProfileSource
{
    /// <inheritdoc />
    public string Name => "square-plugin";

    /// <inheritdoc />
    public IReadOnlyList<string> Extensions => [];

    /// <inheritdoc />
    public bool CanLoad(string source) => source.StartsWith("sq:", StringComparison.OrdinalIgnoreCase);

    /// <inheritdoc />
    public Profile Load(string source, ProfileSourceOptions options)
    {
        var unit = options.Unit ?? LengthUnit.Millimetre;
        if (!double.TryParse(source.AsSpan(3), NumberStyles.Float, CultureInfo.InvariantCulture, out double side) || !(side > 0))
            throw new SectionTwistException("bad-square", $"'{source}': write sq:SIDE with a positive side, e.g. sq:20");
        double h = unit.ToMetres(side) / 2;
        var loop = LoopBuilder.Polygon([new(-h, -h), new(h, -h), new(h, h), new(-h, h)]);
        return Profile.FromLoops([loop], unit, source);
    }
}
