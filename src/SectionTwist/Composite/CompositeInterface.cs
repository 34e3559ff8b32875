using SectionTwist.Geometry;

namespace SectionTwist.Composite;

/// <summary>One piece of boundary shared by two parts: a constraint of the mesh, material on both sides.</summary>
/// <param name="Curve">The shared curve, run with part <paramref name="Left"/> on its left.</param>
/// <param name="Region">The region of the envelope it lies in.</param>
/// <param name="Left">Index of the part on the left of <paramref name="Curve"/>.</param>
/// <param name="Right">Index of the part on the right.</param>
internal readonly record struct CompositeInterface(Segment Curve, int Region, int Left, int Right);
