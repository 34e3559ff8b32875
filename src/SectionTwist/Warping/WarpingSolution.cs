using SectionTwist.Geometry;

namespace SectionTwist.Warping;

/// <summary>The warping function solved on one mesh, normalized about the shear centre (internal).</summary>
internal sealed class WarpingSolution
{
    /// <summary>Normalized warping function at every mesh node for unit twist rate, m^2 (about the shear centre, zero mean).</summary>
    public required double[] Omega { get; init; }
    /// <summary>Shear centre (Trefftz), m.</summary>
    public required Point2 ShearCentre { get; init; }
    /// <summary>Warping constant about the shear centre, integral of Omega^2 dA, m^6.</summary>
    public required double WarpingConstant { get; init; }
    /// <summary>Largest |Omega| over the nodes, m^2.</summary>
    public required double MaxOmega { get; init; }
    /// <summary>Node where |Omega| is largest, m.</summary>
    public required Point2 MaxOmegaLocation { get; init; }
    /// <summary>Largest |grad chi| of the warping shear function (<see cref="WarpingShear"/>), m^3: tau_w = E |phi'''| times this.</summary>
    public required double MaxShearFactor { get; init; }
    /// <summary>Node where |grad chi| is largest, m.</summary>
    public required Point2 MaxShearFactorLocation { get; init; }
    /// <summary>Torsion constant from the warping function, Ip - integral |grad psi|^2 (an upper bound), m^4.</summary>
    public required double TorsionConstantUpper { get; init; }

    /// <summary>The node fixed at psi = 0 (for a solve on the uniform refinement, which keeps the node numbers).</summary>
    public int FixedNode { get; init; }
    /// <summary>Node to unknown map of the solve (-1 for the fixed node).</summary>
    public int[] Map { get; init; } = [];
    /// <summary>The unknowns' solution psi (in <see cref="Map"/> numbering).</summary>
    public double[] Unknowns { get; init; } = [];
    /// <summary>The solver of this mesh's system, kept for the two-grid solve on its refinement (null when not kept).</summary>
    public Sparse.ISpdSolver? Solver { get; set; }
    /// <summary>The mesh solved on.</summary>
    public Meshing.Mesh? Mesh { get; init; }
}
