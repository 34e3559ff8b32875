using SectionTwist.Geometry;

namespace SectionTwist.Torsion;

/// <summary>
/// The solved fields on the mesh, for plots: the Prandtl stress function (for unit G and unit twist rate, m^2) and the
/// recovered shear stress per unit torque (1/m^3) at every node. <see cref="Triangles"/> lists the 6-node mesh as
/// linear sub-triangles (four per element), three node indices each.
/// </summary>
public sealed class SectionField
{
    internal SectionField(double[] x, double[] y, int[] triangles, double[] phi, double[] shearX, double[] shearY,
        IReadOnlyList<IReadOnlyList<Point2>> boundaries, int[] elementCorners)
    {
        // Read-only views: a host cannot change a result through a cast back to the array.
        X = Array.AsReadOnly(x); Y = Array.AsReadOnly(y); Triangles = Array.AsReadOnly(triangles); Phi = Array.AsReadOnly(phi);
        ShearX = Array.AsReadOnly(shearX); ShearY = Array.AsReadOnly(shearY); Boundaries = boundaries;
        ElementCorners = Array.AsReadOnly(elementCorners);
    }

    /// <summary>Node x coordinates, m.</summary>
    public IReadOnlyList<double> X { get; }
    /// <summary>Node y coordinates, m.</summary>
    public IReadOnlyList<double> Y { get; }
    /// <summary>Linear sub-triangles, three node indices each, counter-clockwise.</summary>
    public IReadOnlyList<int> Triangles { get; }
    /// <summary>Corner nodes of the quadratic elements, three per element (for drawing the mesh).</summary>
    public IReadOnlyList<int> ElementCorners { get; }
    /// <summary>Prandtl stress function at each node for G * theta = 1, m^2.</summary>
    public IReadOnlyList<double> Phi { get; }
    /// <summary>Shear stress x component per unit torque at each node, 1/m^3.</summary>
    public IReadOnlyList<double> ShearX { get; }
    /// <summary>Shear stress y component per unit torque at each node, 1/m^3.</summary>
    public IReadOnlyList<double> ShearY { get; }
    /// <summary>Boundary loops as fine polylines (m), for outlines.</summary>
    public IReadOnlyList<IReadOnlyList<Point2>> Boundaries { get; }

    /// <summary>
    /// Boundary nodes of the mesh, one ordered chain per loop (corner and mid-side nodes along the loop); their shear is the
    /// smoothed consistent boundary flux. The combined-stress scan of the bending stage walks these.
    /// </summary>
    internal IReadOnlyList<int[]> BoundaryNodeChains { get; init; } = [];

    /// <summary>Shear stress magnitude per unit torque at node <paramref name="i"/>, 1/m^3.</summary>
    public double ShearMagnitude(int i) => Math.Sqrt(ShearX[i] * ShearX[i] + ShearY[i] * ShearY[i]);
}
