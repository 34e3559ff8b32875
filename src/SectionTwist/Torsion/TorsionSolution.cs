using SectionTwist.Meshing;

namespace SectionTwist.Torsion;

/// <summary>The Prandtl stress function solved on one mesh, with J and the boundary shear.</summary>
internal sealed class TorsionSolution
{
    public required Mesh Mesh { get; init; }
    /// <summary>Stress function at every node for G theta = 1, m^2 (outer boundaries 0, holes their constants).</summary>
    public required double[] Phi { get; init; }
    /// <summary>Constant value of the stress function on each loop (0 on outer loops).</summary>
    public required double[] LoopValue { get; init; }
    /// <summary>Torsion constant, m^4.</summary>
    public required double J { get; init; }
    /// <summary>Torsion constant of each region, m^4.</summary>
    public required double[] RegionJ { get; init; }
    /// <summary>Outward normal derivative of phi at boundary nodes (NaN elsewhere); |value| = |grad phi| there.</summary>
    public required double[] BoundaryFlux { get; init; }
    /// <summary>Largest |grad phi| on the boundary (peak shear per unit torque is this divided by J), m.</summary>
    public required double MaxGradient { get; init; }
    /// <summary>Where the largest gradient occurs, m.</summary>
    public required Geometry.Point2 MaxGradientLocation { get; init; }
    /// <summary>Relative residual of the linear solve.</summary>
    public required double Residual { get; init; }

    /// <summary>
    /// The direct factorization of this mesh's matrix with its node-to-unknown map, kept for the solve on the uniform
    /// refinement (<see cref="TorsionSolver.Solve"/>); null when not kept. Set to null once used so the memory is freed.
    /// </summary>
    public Factorization? Factor { get; set; }

    /// <summary>A direct solver of the matrix and the unknown of each node (-1: fixed).</summary>
    internal sealed record Factorization(int[] Dof, int N, Sparse.ISpdSolver Solver);

    /// <summary>The mesh's Laplacian over all nodes with its fill-reducing order, when the solve was asked to share it (for the warping solve), else null.</summary>
    public MeshLaplacian? Laplacian { get; init; }
}
