using SectionTwist.Composite;
using SectionTwist.Geometry;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Composite;

/// <summary>A composite section whose parts share one shear modulus is the homogeneous section.</summary>
public class CompositeHomogeneousTests
{
    [Fact]
    public void One_modulus_on_the_same_mesh_equals_the_homogeneous_solver_to_round_off()
    {
        var s = CompositeExactTests.CoreAndSleeve(0.008, 0.02, CompositeExactTests.Steel, CompositeExactTests.Steel with { Name = "steel-2" });
        var sol = CompositeAnalyzer.SolveAt(s, CompositeExactTests.Steel, 0.004, default);
        var holeArea = sol.Mesh.Loops.Select(l => Math.Abs(l.Geometry.SignedArea)).ToArray();
        var plain = TorsionSolver.Solve(sol.Mesh, holeArea);
        // common practice, no source: weights of exactly 1 leave the assembled system unchanged
        Tol.Rel(plain.J, sol.J, 1e-12, "the homogeneous solver on the same mesh");
        for (int i = 0; i < plain.Phi.Length; i++) Tol.Abs(plain.Phi[i], sol.Psi[i], 1e-12 * plain.Phi.Max(), "the homogeneous solver on the same mesh");
    }

    [Fact]
    public void One_modulus_equals_the_analysed_homogeneous_section_and_the_exact_circle()
    {
        var s = CompositeExactTests.CoreAndSleeve(0.008, 0.02, CompositeExactTests.Steel, CompositeExactTests.Steel with { Name = "steel-2" });
        var r = CompositeAnalyzer.Analyze(s);
        var h = SectionAnalyzer.Analyze(s.Envelope);
        double exact = Math.PI * Math.Pow(0.02, 4) / 2; // Timoshenko and Goodier, sec. 101: J = pi r^4 / 2
        Tol.Rel(exact, r.EquivalentTorsionConstant, 1e-6, "Timoshenko and Goodier sec. 101");
        Tol.Rel(h.TorsionConstant, r.EquivalentTorsionConstant, 1e-6, "homogeneous analysis of the envelope");
        Tol.Rel(h.MaxShearPerTorque, r.Materials.Max(m => m.MaxShearPerTorque), 5e-3, "homogeneous analysis of the envelope");
        Tol.Rel(Math.Pow(0.008 / 0.02, 4), r.Materials[0].TorqueShare, 1e-5, "exact: the core carries (a/b)^4 of the torque");
    }
}
