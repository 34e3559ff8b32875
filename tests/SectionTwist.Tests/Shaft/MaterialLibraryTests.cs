using SectionTwist.Shaft;
using Xunit;

namespace SectionTwist.Tests.Shaft;

/// <summary>
/// The material library against this test's own copy of the published values: editing a value in src/ fails here. Each row
/// names its source; "from memory" where it is quoted from memory (the library says the same in each material's source).
/// </summary>
public class MaterialLibraryTests
{
    // key, S_y MPa, S_u MPa, E GPa, G GPa, basis, source
    public static TheoryData<string, double, double, double, double, MaterialBasis> Rows => new()
    {
        { "steel-s235", 235, 360, 210, 79.3, MaterialBasis.SpecifiedMinimum },       // EN 10025-2, t <= 16 mm (from memory); E: EN 1993-1-1 3.2.6
        { "steel-s355", 355, 470, 210, 79.3, MaterialBasis.SpecifiedMinimum },       // EN 10025-2, t <= 16 mm (from memory)
        { "steel-a36", 250, 400, 200, 79.3, MaterialBasis.SpecifiedMinimum },        // ASTM A36 (from memory)
        { "steel-1018-cd", 370, 440, 207, 79.3, MaterialBasis.SpecifiedMinimum },    // Shigley, Table A-20 (from memory); E, G: Table A-5
        { "steel-1045-cd", 530, 630, 207, 79.3, MaterialBasis.SpecifiedMinimum },    // Shigley, Table A-20 (from memory)
        { "steel-4140-qt", 650, 900, 207, 79.3, MaterialBasis.SpecifiedMinimum },    // EN 10083-3, 40-100 mm (from memory)
        { "stainless-304", 205, 515, 193, 77, MaterialBasis.SpecifiedMinimum },      // ASTM A276 annealed (from memory)
        { "aluminium-6061-t6", 240, 260, 69, 26, MaterialBasis.SpecifiedMinimum },   // ASTM B221 extrusions (from memory); G: Gere
        { "aluminium-7075-t6", 503, 572, 71.7, 26.9, MaterialBasis.Typical },        // typical values (from memory); G: Gere
        { "titanium-ti6al4v", 828, 895, 114, 44, MaterialBasis.SpecifiedMinimum },   // ASTM B348 grade 5 (from memory)
    };

    [Theory]
    [MemberData(nameof(Rows))]
    public void Library_values_match_the_named_source(string key, double sy, double su, double e, double g, MaterialBasis basis)
    {
        Assert.True(ShaftMaterials.TryGet(key, out var m));
        Assert.Equal(sy * 1e6, m.YieldStrength!.Value, 6);
        Assert.Equal(su * 1e6, m.UltimateStrength!.Value, 6);
        Assert.Equal(e * 1e9, m.YoungsModulus!.Value, 3);
        Assert.Equal(g * 1e9, m.ShearModulus, 3);
        Assert.Equal(basis, m.StrengthBasis);
        // Derived values: S_sy = 0.577 S_y (distortion energy, Shigley ch. 5); allowable min(0.3 S_y, 0.18 S_u) (ASME shafting code, from memory).
        Assert.Equal(0.577 * sy * 1e6, m.ShearYield!.Value, 3);
        Assert.Equal(Math.Min(0.3 * sy, 0.18 * su) * 1e6, m.AllowableShear!.Value, 3);
        Assert.Contains("from memory", m.Source, StringComparison.Ordinal);
    }

    [Fact]
    public void Every_library_material_is_in_the_table_above_or_has_no_strengths()
    {
        var listed = Rows.Select(r => (string)r[0]).ToHashSet(StringComparer.OrdinalIgnoreCase);
        foreach (var (key, m) in ShaftMaterials.All)
            Assert.True(listed.Contains(key) || (m.YieldStrength is null && m.UltimateStrength is null), $"{key} has strengths but no test row");
    }

    [Fact]
    public void Typical_values_say_so_in_the_name_every_output_shows()
    {
        foreach (var m in ShaftMaterials.All.Values.Where(m => m.StrengthBasis == MaterialBasis.Typical))
            Assert.Contains("typical", m.Name, StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    public void File_material_may_give_E_beside_G_and_a_density()
    {
        const string yaml = """
            materials:
              bronze: {G: 41 GPa, E: 110 GPa, density: 8.8 g/cm^3, yield: 250 MPa}
            sections: {s: {round: 20}}
            stations: [{name: A, at: 0}, {name: B, after: 100}]
            segments: [{from: A, to: B, section: s, material: bronze}]
            units: {length: mm, torque: N*m}
            loads: [{at: B, torque: 10}]
            supports: {fixed: [A]}
            """;
        var doc = ShaftFile.Parse(yaml, "m.yaml");
        var m = doc.Model.Segments[0].Material;
        Assert.Equal(41e9, m.ShearModulus, 3);
        Assert.Equal(110e9, m.YoungsModulus!.Value, 3);
        Assert.Equal(8800, m.Density!.Value, 6);
        Assert.Equal(MaterialBasis.User, m.StrengthBasis);
    }
}
