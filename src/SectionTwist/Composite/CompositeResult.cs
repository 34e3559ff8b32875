using SectionTwist.Shaft;
using SectionTwist.Torsion;

namespace SectionTwist.Composite;

/// <summary>
/// Torsion of a composite section: the effective torsional rigidity, an equivalent torsion constant for a reference
/// material, and per material the peak shear per unit torque, where it occurs and the share of torque carried.
/// Perfect bonding at the interfaces is assumed: slip and residual (shrink-fit) stresses are not modelled.
/// </summary>
public sealed record CompositeResult
{
    /// <summary>The analysed section.</summary>
    public required CompositeSection Section { get; init; }

    /// <summary>The material the equivalent torsion constant refers to.</summary>
    public required Material Reference { get; init; }

    /// <summary>Effective torsional rigidity (G J)_eff = T / theta, N m^2.</summary>
    public required double TorsionalRigidity { get; init; }

    /// <summary>Equivalent torsion constant J_ref = (G J)_eff / G_ref, m^4: a homogeneous section of the reference material with this J is as stiff.</summary>
    public required double EquivalentTorsionConstant { get; init; }

    /// <summary>Per material, in the order of <see cref="CompositeSection.Materials"/>.</summary>
    public required IReadOnlyList<CompositeMaterialResult> Materials { get; init; }

    /// <summary>Estimated relative error of the rigidity (difference between the two meshes).</summary>
    public required double EstimatedRelativeError { get; init; }

    /// <summary>The finer of the two meshes.</summary>
    public required MeshSummary Mesh { get; init; }

    /// <summary>Cautions about the result (unconverged peaks, the bonding idealisation).</summary>
    public required IReadOnlyList<AnalysisWarning> Warnings { get; init; }

    /// <summary>The solution on the finer mesh (for pictures).</summary>
    internal CompositeSolution? Solution { get; init; }


    /// <summary>The caution every output of a composite section prints beside its results.</summary>
    public const string Caution =
        "Composite section: the parts are taken as perfectly bonded (an idealisation); interface slip and residual (shrink-fit) stresses are not modelled. Check the interface and each material against the applicable code and licensed engineering practice.";
}
