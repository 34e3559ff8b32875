using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>Connected outline pieces that do not close (drawing units).</summary>
/// <param name="Sources">The entities, once each.</param>
/// <param name="Layers">Their layers.</param>
/// <param name="FreeEnds">End points joined to nothing, with the entity ending there.</param>
/// <param name="Bounds">Bounding box.</param>
/// <param name="Straight">True when all pieces are lines on one straight line (a construction line).</param>
/// <param name="Segments">The pieces.</param>
internal sealed record LooseGroup(string[] Sources, string[] Layers, (Point2 Where, string Source)[] FreeEnds, Box2 Bounds, bool Straight, Segment[] Segments);

/// <summary>A group of pieces with a place where an odd number (three or more) of ends meet (drawing units).</summary>
/// <param name="Where">The meeting point with the most ends.</param>
/// <param name="Ends">Number of ends meeting there.</param>
/// <param name="Sources">Up to four entities meeting there.</param>
/// <param name="Bounds">Bounding box of the whole group.</param>
/// <param name="Pieces">Number of pieces in the group.</param>
/// <param name="Layers">Layers of the group.</param>
internal sealed record Junction(Point2 Where, int Ends, string[] Sources, Box2 Bounds, int Pieces, string[] Layers);
