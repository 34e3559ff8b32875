using SectionTwist.Geometry;
using SectionTwist.Shaft;

namespace SectionTwist.Composite;

/// <summary>
/// One part of a composite section: a shape (one or more regions) made of one material. Parts that meet share whole
/// closed loops (the core's outline is the sleeve's inner loop) and are bonded there.
/// </summary>
/// <param name="Name">The part's name: a drawing layer, or a template part such as <c>core</c> or <c>sleeve</c>.</param>
/// <param name="Shape">The part's outline, metres.</param>
/// <param name="Material">The part's material (its shear modulus and, for checks, its allowable shear).</param>
public sealed record CompositePart(string Name, Profile Shape, Material Material);
