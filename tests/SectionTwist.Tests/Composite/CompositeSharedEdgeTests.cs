using SectionTwist.Composite;
using SectionTwist.Torsion;
using Xunit.Abstractions;
using static SectionTwist.Tests.Composite.CompositeShapes;

namespace SectionTwist.Tests.Composite;

/// <summary>
/// Parts that meet along part of their outlines (layers, half-discs, a split tube, an insert on the edge, collinear
/// overlapping edges). With one shear modulus everywhere the composite is the homogeneous section: on the same mesh the
/// system is the homogeneous one exactly (weights of 1), and the analysed value must equal the homogeneous analysis of
/// the envelope within the analysis accuracy.
/// </summary>
public class CompositeSharedEdgeTests(ITestOutputHelper output)
{
    private static readonly SectionTwist.Shaft.Material Steel = CompositeExactTests.Steel;
    private static readonly SectionTwist.Shaft.Material Steel2 = CompositeExactTests.Steel with { Name = "steel-2" };
    private static readonly SectionTwist.Shaft.Material Steel3 = CompositeExactTests.Steel with { Name = "steel-3" };

    public static TheoryData<string> SameModulusCases => ["halves", "three layers", "half-discs", "split tube", "edge insert", "offset layers"];

    private static CompositeSection SameModulus(string name) => name switch
    {
        // two halves side by side: 20 x 10 mm and 20 x 10 mm, bonded along x = 20 mm
        "halves" => new CompositeSection([new CompositePart("a", Shape(Rect(0, 0, 0.02, 0.01)), Steel), new CompositePart("b", Shape(Rect(0.02, 0, 0.04, 0.01)), Steel2)], "halves"),
        "three layers" => Layers(0.03, (0.002, Steel), (0.003, Steel2), (0.001, Steel3)),
        "half-discs" => HalfDiscs(0.01, Steel, Steel2),
        "split tube" => SplitTube(0.02, 0.01, Steel, Steel2),
        "edge insert" => EdgeInsert(0.04, 0.02, 0.01, 0.005, Steel, Steel2),
        // the upper layer overhangs: its bottom edge shares only the piece 10..40 mm with the lower layer's top edge
        "offset layers" => new CompositeSection([new CompositePart("lower", Shape(Rect(0, 0, 0.04, 0.01)), Steel), new CompositePart("upper", Shape(Rect(0.01, 0.01, 0.05, 0.02)), Steel2)], "offset layers"),
        _ => throw new ArgumentException(name),
    };

    [Theory]
    [MemberData(nameof(SameModulusCases))]
    public void One_modulus_on_the_same_mesh_equals_the_homogeneous_solver_to_round_off(string name)
    {
        var s = SameModulus(name);
        var sol = CompositeAnalyzer.SolveAt(s, Steel, s.Envelope.Bounds.Diagonal / 15, default);
        var holeArea = sol.Mesh.Loops.Select(l => Math.Abs(l.Geometry.SignedArea)).ToArray();
        var plain = TorsionSolver.Solve(sol.Mesh, holeArea);
        Assert.True(sol.Mesh.InterfaceEdges.Length > 0, "the interface is an edge chain of the mesh");
        Assert.True(sol.Mesh.ZoneSample.Length >= s.Parts.Count, $"{sol.Mesh.ZoneSample.Length} zones for {s.Parts.Count} parts");
        // common practice, no source: weights of exactly 1 leave the assembled system unchanged
        Tol.Rel(plain.J, sol.J, 1e-10, "the homogeneous solver on the same mesh (derived in the test)");
        for (int i = 0; i < plain.Phi.Length; i++) Tol.Abs(plain.Phi[i], sol.Psi[i], 1e-10 * plain.Phi.Max(), "the homogeneous solver on the same mesh");
    }

    [Theory]
    [MemberData(nameof(SameModulusCases))]
    public void One_modulus_equals_the_analysed_homogeneous_envelope(string name)
    {
        var s = SameModulus(name);
        var r = CompositeAnalyzer.Analyze(s, Steel);
        var h = SectionAnalyzer.Analyze(s.Envelope);
        output.WriteLine($"{name}: composite J {r.EquivalentTorsionConstant:R} (estimate {r.EstimatedRelativeError:E2}, {r.Mesh.Elements} elements), homogeneous {h.TorsionConstant:R}, difference {Tol.RelErr(h.TorsionConstant, r.EquivalentTorsionConstant):E2}");
        // within the analysis accuracy, or twice the two-mesh estimate where a re-entrant corner (the split tube's bore, the
        // overhang of the offset layers) slows convergence
        Tol.Rel(h.TorsionConstant, r.EquivalentTorsionConstant, Math.Max(2e-6, 2 * r.EstimatedRelativeError), "homogeneous analysis of the envelope (common practice, no source)");
        Tol.Rel(s.Parts.Sum(p => p.Shape.Properties.Area), s.Envelope.Properties.Area, 1e-12, "the envelope is the union of the parts");
        Tol.Rel(1.0, r.Materials.Sum(m => m.TorqueShare), 1e-6, "the shares add to the whole torque (equilibrium)");
    }

    [Fact]
    public void Two_half_discs_of_one_modulus_give_the_exact_circle()
    {
        double d = 0.02;
        var r = CompositeAnalyzer.Analyze(HalfDiscs(d / 2, Steel, Steel2), Steel);
        double exact = Math.PI * Math.Pow(d, 4) / 32; // Timoshenko and Goodier, Theory of Elasticity, sec. 101: J = pi d^4 / 32
        output.WriteLine($"half-discs: J {r.EquivalentTorsionConstant:R}, exact {exact:R}, error {Tol.RelErr(exact, r.EquivalentTorsionConstant):E2}");
        Tol.Rel(exact, r.EquivalentTorsionConstant, 1e-6, "Timoshenko and Goodier sec. 101, J = pi d^4 / 32");
        // by symmetry each half carries half the torque (derived in the test)
        Tol.Rel(0.5, r.Materials[0].TorqueShare, 1e-5, "symmetry (derived in the test)");
        // the peak shear of a circle, 16 T / (pi d^3), is on the rim (Timoshenko and Goodier sec. 101)
        Tol.Rel(16 / (Math.PI * d * d * d), r.Materials.Max(m => m.MaxShearPerTorque), 5e-3, "Timoshenko and Goodier sec. 101, tau = 16 T / (pi d^3)");
    }

    [Fact]
    public void Split_tube_keeps_its_bore_as_a_hole_bounded_by_both_parts()
    {
        var s = SplitTube(0.02, 0.01, Steel, CompositeExactTests.Brass);
        Assert.Single(s.Envelope.Regions);
        Assert.Single(s.Envelope.Regions[0].Holes);
        var r = CompositeAnalyzer.Analyze(s, Steel);
        Tol.Rel(1.0, r.Materials.Sum(m => m.TorqueShare), 1e-6, "the shares add to the whole torque (equilibrium)");
        // softer brass in half the wall: stiffness between the all-brass and the all-steel tube (common practice, no source)
        double jSteel = SectionAnalyzer.Analyze(s.Envelope).TorsionConstant;
        Assert.InRange(r.EquivalentTorsionConstant, jSteel * CompositeExactTests.Brass.ShearModulus / Steel.ShearModulus, jSteel);
    }

    [Fact]
    public void Edge_insert_takes_the_materials_of_its_parts()
    {
        var s = EdgeInsert(0.04, 0.02, 0.01, 0.005, Steel, CompositeExactTests.Brass);
        var r = CompositeAnalyzer.Analyze(s, Steel);
        Tol.Rel(0.01 * 0.005, r.Materials[1].Area, 1e-9, "the insert's area");
        Tol.Rel(0.04 * 0.02 - 0.01 * 0.005, r.Materials[0].Area, 1e-9, "the bar's area");
        Tol.Rel(1.0, r.Materials.Sum(m => m.TorqueShare), 1e-6, "the shares add to the whole torque (equilibrium)");
        Assert.Equal(3, s.Interfaces.Count);
    }

    [Theory]
    [InlineData("edge insert")]
    [InlineData("half-discs")]
    [InlineData("split tube")]
    public void Every_element_has_the_material_of_the_part_containing_its_centroid(string name)
    {
        var s = name switch
        {
            "edge insert" => EdgeInsert(0.04, 0.02, 0.01, 0.005, Steel, CompositeExactTests.Brass),
            "half-discs" => HalfDiscs(0.01, Steel, CompositeExactTests.Brass),
            _ => SplitTube(0.02, 0.01, Steel, CompositeExactTests.Brass),
        };
        var sol = CompositeAnalyzer.SolveAt(s, Steel, s.Envelope.Bounds.Diagonal / 15, default);
        var mesh = sol.Mesh;
        for (int e = 0; e < mesh.ElementCount; e++)
        {
            var a = mesh.Node(mesh.Elements[6 * e]); var b = mesh.Node(mesh.Elements[6 * e + 1]); var c = mesh.Node(mesh.Elements[6 * e + 2]);
            var centroid = new SectionTwist.Geometry.Point2((a.X + b.X + c.X) / 3, (a.Y + b.Y + c.Y) / 3);
            // parts and materials are in the same order here (two parts, two materials); derived in the test
            Assert.Equal(s.PartAt(centroid), sol.ZoneMaterial[mesh.ElementZone[e]]);
        }
    }
}
