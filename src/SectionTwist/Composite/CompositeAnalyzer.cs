using System.Globalization;
using SectionTwist.Meshing;
using SectionTwist.Shaft;
using SectionTwist.Torsion;

namespace SectionTwist.Composite;

/// <summary>
/// Torsion of composite sections: the stress function with piecewise shear modulus (<see cref="CompositeSolver"/>) on a
/// mesh whose element edges follow every interface, solved on two meshes (edge length h and h / 2). The finer gives the
/// results; the difference between the two is the error estimate (conservative for quadratic elements, whose error falls
/// at least four times per halving away from singular corners; common practice, no source).
/// </summary>
public static class CompositeAnalyzer
{
    /// <summary>Largest change of a peak shear between the two meshes reported without a warning.</summary>
    public const double PeakTolerance = 0.02;

    /// <summary>Analyses <paramref name="section"/>.</summary>
    /// <param name="section">The composite section.</param>
    /// <param name="reference">The material the equivalent torsion constant refers to; null: the first part's material.</param>
    /// <param name="options">Accuracy (sets the mesh size: h = 0.5 accuracy^(1/3) of the section's diagonal, between 1/300 and 1/10 of it), element limit and memory budget.</param>
    /// <param name="ct">Cancellation.</param>
    public static CompositeResult Analyze(CompositeSection section, Material? reference = null, AnalysisOptions? options = null, CancellationToken ct = default)
    {
        ArgumentNullException.ThrowIfNull(section);
        options ??= AnalysisOptions.Default;
        reference ??= section.Materials[0];
        reference.Validate();
        double acc = options.Accuracy;
        if (!(acc >= AnalysisOptions.FinestAccuracy) || double.IsNaN(acc))
            throw new SectionTwistException("bad-accuracy", $"accuracy {acc} is finer than {AnalysisOptions.FinestAccuracy}; ask for a coarser accuracy");
        var env = section.Envelope;
        double diag = env.Bounds.Diagonal;
        double h = diag * Math.Clamp(0.5 * Math.Cbrt(acc), 1.0 / 300, 0.1);
        long maxElements = Math.Min(options.MaxElements, Math.Max(1000, options.MemoryBudgetBytes / 8000));
        double need = MeshFeasibility.EstimateElements(env, h / 2);
        if (need > maxElements)
            throw new SectionTwistException("memory-budget",
                $"{section.Name}: the composite analysis at accuracy {acc.ToString("G2", CultureInfo.InvariantCulture)} needs about {need.ToString("G3", CultureInfo.InvariantCulture)} elements, more than the limit of {maxElements.ToString(CultureInfo.InvariantCulture)}; ask for a coarser accuracy (--accuracy) or raise --memory-budget MB");
        var materials = section.Materials;
        // the estimate counts the envelope only: a thin part (a 5 mm sleeve on a 1 km core) needs far more elements, so the
        // mesher gets the limit too and refuses instead of growing past the memory budget
        int cap = (int)Math.Min(int.MaxValue / 4, maxElements);
        var coarse = SolveAt(section, reference, h, ct, cap);
        var fine = SolveAt(section, reference, h / 2, ct, cap);
        double gjRef = reference.ShearModulus;
        double jErr = Math.Abs(fine.J - coarse.J) / fine.J;
        var warnings = new List<AnalysisWarning>();
        foreach (var p in section.Parts)
            foreach (var w in p.Shape.Warnings) warnings.Add(new AnalysisWarning(w.Code, $"{p.Name}: {w.Message}"));
        var perMaterial = new List<CompositeMaterialResult>();
        for (int m = 0; m < materials.Count; m++)
        {
            double pf = fine.PeakGradient[m] / fine.J, pc = coarse.PeakGradient[m] / coarse.J;
            double err = pf > 0 ? Math.Abs(pf - pc) / pf : 0;
            if (err > PeakTolerance)
                warnings.Add(new AnalysisWarning("composite-peak-unconverged",
                    $"{materials[m].Name}: the peak shear changes by {(100 * err).ToString("0.#", CultureInfo.InvariantCulture)} % between the two meshes (a sharp corner of the outline or of an interface makes it singular), so it is no bound and no allowable torque is given; round the corner in the drawing"));
            perMaterial.Add(new CompositeMaterialResult
            {
                Material = materials[m],
                Parts = section.Parts.Where(p => MaterialIndex(section, p) == m).Select(p => p.Name).ToList().AsReadOnly(),
                Area = fine.Area[m],
                MaxShearPerTorque = pf,
                MaxShearLocation = fine.PeakLocation[m],
                TorqueShare = fine.Torque[m] / fine.J,
                EstimatedRelativeError = err,
                MaxShearUnbounded = err > PeakTolerance,
            });
        }
        if (jErr > Math.Max(10 * acc, 1e-3))
            warnings.Add(new AnalysisWarning("composite-j-unconverged",
                $"{section.Name}: the torsional rigidity changes by {(100 * jErr).ToString("0.###", CultureInfo.InvariantCulture)} % between the two meshes; ask for a finer accuracy"));
        return new CompositeResult
        {
            Section = section, Reference = reference,
            TorsionalRigidity = gjRef * fine.J, EquivalentTorsionConstant = fine.J,
            Materials = perMaterial.AsReadOnly(), EstimatedRelativeError = jErr,
            Mesh = new MeshSummary(fine.Mesh.NodeCount, fine.Mesh.ElementCount, MeshQuality.MinAngleDegrees(fine.Mesh)),
            Warnings = warnings.AsReadOnly(), Solution = fine,
        };
    }

    private static int MaterialIndex(CompositeSection s, CompositePart p)
    {
        for (int m = 0; m < s.Materials.Count; m++)
            if (string.Equals(s.Materials[m].Name, p.Material.Name, StringComparison.OrdinalIgnoreCase)) return m;
        return -1;
    }

    /// <summary>Meshes with edge length <paramref name="h"/>, finds each zone's part and solves.</summary>
    internal static CompositeSolution SolveAt(CompositeSection section, Material reference, double h, CancellationToken ct, int maxTriangles = 4_000_000)
    {
        var env = section.Envelope;
        var mesh = Mesher.Generate(env, section.Interfaces.Select(i => (i.Curve, i.Region)).ToList(), new MeshOptions { MaxEdgeLength = h, MaxTriangles = maxTriangles }, out _, ct);
        int zones = mesh.ZoneSample.Length;
        var weight = new double[zones];
        var material = new int[zones];
        for (int z = 0; z < zones; z++)
        {
            int part = section.PartAt(mesh.ZoneSample[z]);
            if (part < 0)
                throw new SectionTwistException("mesh-failed", $"{section.Name}: a piece of the mesh near {mesh.ZoneSample[z]} lies in no part; draw every piece of the section as part of one material");
            material[z] = MaterialIndex(section, section.Parts[part]);
            weight[z] = reference.ShearModulus / section.Parts[part].Material.ShearModulus;
        }
        var holeArea = mesh.Loops.Select(l => Math.Abs(l.Geometry.SignedArea)).ToArray();
        return CompositeSolver.Solve(mesh, holeArea, weight, material, section.Materials.Count, env.Properties.Centroid, ct);
    }
}
