using SectionTwist.Geometry;
using SectionTwist.Meshing;

namespace SectionTwist.Plastic;

/// <summary>
/// The fully plastic torque per unit shear yield stress of a profile without the elastic-plastic curve: the sand-heap
/// integral of <see cref="FullyPlasticTorque"/> on one mesh and its uniform refinement, the finer value reported and the
/// change between the two taken as the error estimate (as in <see cref="PlasticAnalysis"/>).
/// </summary>
internal static class ProfilePlasticTorque
{
    /// <summary>T_p / tau_y, m^3, and its estimated relative error.</summary>
    public static (double PerYield, double Error) Compute(Profile profile, double accuracy = 1e-3, int maxElements = 200_000, CancellationToken ct = default)
    {
        ArgumentNullException.ThrowIfNull(profile);
        double acc = Math.Clamp(accuracy, 1e-5, 0.1);
        double h = Math.Min(0.5 * Math.Sqrt(profile.Properties.Area) * Math.Pow(acc, 0.25), profile.Bounds.Diagonal / 8);
        var loopArea = profile.Regions.SelectMany(r => r.Loops).Select(l => Math.Abs(l.SignedArea)).ToArray();
        var coarse = Mesher.Generate(profile, new MeshOptions { MaxEdgeLength = h, MaxArcAngleDegrees = 10, MaxTriangles = maxElements }, ct);
        var (tc, _) = FullyPlasticTorque.Compute(coarse, loopArea, ct);
        if (4L * coarse.ElementCount > maxElements) return (tc, double.NaN);
        var (tf, _) = FullyPlasticTorque.Compute(MeshRefinement.Uniform(coarse), loopArea, ct);
        return (tf, Math.Abs(tf - tc) / tf);
    }
}
