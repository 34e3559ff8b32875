using System.Collections;
using System.Reflection;
using System.Runtime.CompilerServices;
using SectionTwist.Profiles;
using SectionTwist.Shaft;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Api;

/// <summary>
/// Results handed to a host are immutable: no public type of the core has a public setter other than <c>init</c>, and
/// the lists inside results are read-only views (a cast back to an array or list cannot change them).
/// </summary>
public class ImmutabilityTests
{
    [Fact]
    public void No_public_core_type_has_a_public_mutable_setter()
    {
        var core = typeof(SectionAnalyzer).Assembly;
        var mutable = core.GetExportedTypes()
            .SelectMany(t => t.GetProperties(BindingFlags.Public | BindingFlags.Instance | BindingFlags.Static | BindingFlags.DeclaredOnly)
                .Where(p => p.SetMethod is { IsPublic: true } set
                            && !set.ReturnParameter.GetRequiredCustomModifiers().Contains(typeof(IsExternalInit)))
                .Select(p => $"{t.FullName}.{p.Name}"))
            .ToList();
        Assert.True(mutable.Count == 0, "public setters (use init): " + string.Join(", ", mutable));
        var fields = core.GetExportedTypes()
            .SelectMany(t => t.GetFields(BindingFlags.Public | BindingFlags.Instance | BindingFlags.Static | BindingFlags.DeclaredOnly)
                .Where(f => !f.IsInitOnly && !f.IsLiteral && !t.IsEnum)
                .Select(f => $"{t.FullName}.{f.Name}"))
            .ToList();
        Assert.True(fields.Count == 0, "public writable fields: " + string.Join(", ", fields));
    }

    private static void ReadOnly(object list, string what) =>
        Assert.True(list is IList { IsReadOnly: true } l && l.GetType().IsGenericType && !l.GetType().IsArray,
            $"{what} is a {list.GetType().Name}, not a read-only view");

    [Fact]
    public void Section_result_lists_are_read_only_views()
    {
        var r = SectionAnalyzer.Analyze(ProfileTemplates.Create("rect:b=20,h=10"), new AnalysisOptions { Accuracy = 1e-3 });
        ReadOnly(r.Warnings, "Warnings");
        ReadOnly(r.RegionTorsionConstants, "RegionTorsionConstants");
        ReadOnly(r.Field.X, "Field.X");
        ReadOnly(r.Field.Phi, "Field.Phi");
        ReadOnly(r.Field.ShearX, "Field.ShearX");
        ReadOnly(r.Field.Triangles, "Field.Triangles");
    }

    [Fact]
    public void Shaft_result_lists_are_read_only_views()
    {
        var steel = ShaftMaterials.All["steel-1045-cd"];
        var model = new ShaftModel
        {
            Stations = [new Station("A", 0), new Station("B", 0.5)],
            Segments = [new ShaftSegment("A", "B", SectionStiffness.Round(0.03), steel)],
            FixedStations = ["A"],
            Loads = [new PointTorque("B", 100)],
        };
        var r = ShaftSolver.Solve(model);
        ReadOnly(r.Stations, "Stations");
        ReadOnly(r.Segments, "Segments");
        ReadOnly(r.Reactions, "Reactions");
        ReadOnly(r.Springs, "Springs");
    }
}
