using SectionTwist.Geometry;
using SectionTwist.Torsion;

namespace SectionTwist.Warping;

/// <summary>Builds a <see cref="WarpingResult"/> from the warping solves on the last two meshes of a section analysis.</summary>
internal static class WarpingProperties
{
    /// <summary>
    /// Solves on the fine mesh (and on the coarse one for the error estimate, unless it is the same mesh); null for
    /// profiles of more than one region. With <paramref name="singular"/> (sharp re-entrant corners) the warping shear
    /// factor is the mesh value of a singular peak and its estimate is infinite.
    /// </summary>
    public static WarpingResult? Compute(TorsionSolution coarse, TorsionSolution fine, SectionProperties props, double j, bool singular, CancellationToken ct)
    {
        // the coarse solve first: its factorization serves the fine solve as the two-grid coarse level on meshes whose
        // fill-reducing order would be nested dissection (measured: cheaper than ordering and factorizing there, dearer
        // below, where the approximate-minimum-degree order is cheap)
        bool two = !ReferenceEquals(coarse.Mesh, fine.Mesh);
        var c = two ? WarpingSolver.Solve(coarse.Mesh, props.Centroid, ct, coarse.Laplacian, keepSolver: true) : null;
        var f = WarpingSolver.Solve(fine.Mesh, props.Centroid, ct, fine.Laplacian, c, twoGridThreshold: Sparse.SymbolicCholesky.NestedDissectionThreshold);
        if (c is not null) c.Solver = null;
        if (f is null) return null;
        // Whole change between the meshes (not divided by 2^p - 1: the order of Iw is not known at corners), plus a
        // floor at the round-off level of the quantity's own scale.
        double size = Math.Sqrt(props.Area);
        double iwScale = Math.Max(f.WarpingConstant, 1e-12 * props.PolarMoment * props.Area);
        var err0 = c is null
            ? new WarpingErrorEstimate(double.NaN, double.NaN, double.NaN)
            : new WarpingErrorEstimate(
                Point2.Distance(c.ShearCentre, f.ShearCentre) + 1e-9 * size,
                Math.Abs(c.WarpingConstant - f.WarpingConstant) + 1e-9 * iwScale,
                Math.Abs(c.MaxOmega - f.MaxOmega) + 1e-9 * props.Area)
            {
                WarpingShearFactor = Math.Abs(c.MaxShearFactor - f.MaxShearFactor) + 1e-9 * props.Area * size,
            };
        var err = singular ? err0 with { WarpingShearFactor = double.PositiveInfinity } : err0;
        double ratio = f.WarpingConstant / (j * props.PolarMoment / props.Area);
        return new WarpingResult
        {
            ShearCentre = f.ShearCentre,
            WarpingConstant = f.WarpingConstant,
            MaxSectorialCoordinate = f.MaxOmega,
            MaxSectorialCoordinateLocation = f.MaxOmegaLocation,
            WarpingShearFactor = f.MaxShearFactor,
            WarpingShearFactorLocation = f.MaxShearFactorLocation,
            TorsionConstantUpperBound = f.TorsionConstantUpper,
            EstimatedError = err,
            WarpingRatio = ratio,
            Classification = ratio >= WarpingResult.SensitiveRatio ? WarpingClass.WarpingSensitive : WarpingClass.WarpingNegligible,
            SteelWarpingLength = Math.Sqrt(WarpingResult.SteelModulusRatio * f.WarpingConstant / j),
            Omega = Array.AsReadOnly(f.Omega),
        };
    }
}
