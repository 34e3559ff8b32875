using System.Globalization;
using FsCheck;
using FsCheck.Xunit;
using SectionTwist.Profiles;
using SectionTwist.Units;

namespace SectionTwist.Tests.Profiles;

/// <summary>The spec syntax name:key=value,... with units per value, its error messages and round trip.</summary>
public class SpecParserTests
{
    private static double Area(string spec, LengthUnit? unit = null) => ProfileTemplates.Create(spec, unit).Properties.Area;

    [Fact]
    public void Units_on_values_and_default_unit()
    {
        // 1 in = 25.4 mm exactly (international inch).
        double d = 0.0254;
        Tol.Rel(Math.PI * d * d / 4, Area("circle:d=1in"), 1e-12);
        Tol.Rel(Math.PI * d * d / 4, Area("circle:d=25.4mm"), 1e-12);
        Tol.Rel(Math.PI * d * d / 4, Area("circle:d=0.0254m"), 1e-12);
        Tol.Rel(Math.PI * d * d / 4, Area("circle:d=2.54 cm"), 1e-12);
        Tol.Rel(Math.PI * d * d / 4, Area("circle:d=1", LengthUnit.Inch), 1e-12);
        Tol.Rel(Math.PI * 0.04 * 0.04 / 4, Area("circle:d=40"), 1e-12);
        // Mixed units in one spec: shs 3 in x 0.25 in equals 76.2 mm x 6.35 mm.
        Tol.Rel(Area("shs:B=76.2,t=6.35"), Area("shs:B=3in,t=0.25in"), 1e-12);
        Tol.Rel(Area("shs:B=76.2,t=6.35"), Area("shs:B=3in,t=6.35mm"), 1e-12);
    }

    [Fact]
    public void Profile_unit_is_the_unit_the_user_wrote()
    {
        Assert.Equal(LengthUnit.Inch, ProfileTemplates.Create("shs:B=3in,t=0.25in").Unit);
        Assert.Equal(LengthUnit.Millimetre, ProfileTemplates.Create("circle:d=40").Unit);
        Assert.Equal(LengthUnit.Metre, ProfileTemplates.Create("circle:d=0.04", LengthUnit.Metre).Unit);
        Assert.Equal("keyed:d=40mm,n=2", ProfileTemplates.Create("keyed:d=40mm,n=2").Name);
    }

    [Fact]
    public void Angles_in_degrees_or_radians()
    {
        var deg = ProfileTemplates.Create("keyed:d=40,at=30").Properties;
        var rad = ProfileTemplates.Create(string.Create(CultureInfo.InvariantCulture, $"keyed:d=40,at={Math.PI / 6:R}rad")).Properties;
        Tol.Rel(deg.Ixx, rad.Ixx, 1e-12);
        Tol.Rel(deg.Ixx, ProfileTemplates.Create("keyed:d=40,at=30deg").Properties.Ixx, 1e-12);
        Tol.Rel(deg.Ixx, ProfileTemplates.Create("keyed:d=40,n=1,at=30").Properties.Ixx, 1e-12);
    }

    [Fact]
    public void Template_names_and_aliases_are_case_insensitive()
    {
        Tol.Rel(Area("circle:d=40"), Area("CIRCLE:d=40"), 1e-15);
        Tol.Rel(Area("circle:d=40"), Area("round:d=40"), 1e-15);
        Assert.True(ProfileTemplates.IsSpec("keyed:d=40"));
        Assert.False(ProfileTemplates.IsSpec("shaft.dxf"));
        Assert.False(ProfileTemplates.IsSpec("C:/drawings/shaft.dxf"));
        Assert.Equal(31, ProfileTemplates.All.Count); // 19 parametric + 10 designated section families + 2 composite
    }

    // Every template's example: the exact area and centroid (segment-wise integrals) agree with the shoelace formula over
    // the outline sampled at 4000 points per segment (a full circle sampled n times loses (2 pi / n)^2 / 6 of its area,
    // 4.1e-7 here). An independent numerical path: it pins every example's outline.
    [Fact]
    public void Every_template_example_has_the_area_of_its_sampled_outline()
    {
        foreach (var t in ProfileTemplates.All)
        {
            var p = ProfileTemplates.Create(t.Example);
            double a = 0, sx = 0, sy = 0;
            foreach (var loop in p.Loops)
                foreach (var seg in loop.Segments)
                {
                    const int n = 4000;
                    var prev = seg.PointAt(0);
                    for (int i = 1; i <= n; i++)
                    {
                        var q = seg.PointAt((double)i / n);
                        double c = prev.X * q.Y - q.X * prev.Y;
                        a += c / 2; sx += (prev.X + q.X) * c / 6; sy += (prev.Y + q.Y) * c / 6;
                        prev = q;
                    }
                }
            Tol.Rel(a, p.Properties.Area, 5e-7, $"{t.Example}: shoelace over the sampled outline");
            double size = Math.Sqrt(a);
            Tol.Abs(sx / a, p.Properties.Centroid.X, 5e-7 * size, $"{t.Example}: centroid x");
            Tol.Abs(sy / a, p.Properties.Centroid.Y, 5e-7 * size, $"{t.Example}: centroid y");
        }
    }

    private static SectionTwistException Fails(string spec) => Assert.Throws<SectionTwistException>(() => ProfileTemplates.Create(spec));

    [Fact]
    public void Unknown_template_lists_the_known_ones()
    {
        var e = Fails("bolt:d=10");
        Assert.Equal("unknown-template", e.Code);
        Assert.Contains("unknown template 'bolt'", e.Message, StringComparison.Ordinal);
        Assert.Contains("circle, tube, ellipse", e.Message, StringComparison.Ordinal);
        Assert.Contains("keyed", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Unknown_key_lists_the_template_keys_and_hints_at_case()
    {
        var e = Fails("keyed:d=40,w=12");
        Assert.Equal("unknown-key", e.Code);
        Assert.Equal("keyed:d=40,w=12: template 'keyed' has no key 'w'; its keys are d, n, at, b, t1, r", e.Message);
        var c = Fails("tube:d=40,DD=3");
        Assert.Contains("its keys are D, d, t", c.Message, StringComparison.Ordinal);
        var k = Fails("keyed:d=40,N=2");
        Assert.Contains("did you mean 'n'?", k.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Missing_required_key_names_it_and_gives_an_example()
    {
        var e = Fails("rect:b=60");
        Assert.Equal("missing-key", e.Code);
        Assert.Equal("rect:b=60: template 'rect' needs h (height along y); add h=VALUE, e.g. rect:b=60,h=20", e.Message);
        Assert.Contains("needs d", Fails("circle").Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Bad_numbers_and_units_name_the_key()
    {
        Assert.Equal("circle:d=forty: d: 'forty' is not a length; write a number with an optional unit, e.g. d=40 or d=1.5in", Fails("circle:d=forty").Message);
        Assert.Equal("circle:d=40furlong: d: unknown length unit 'furlong' in '40furlong'; use one of mm, cm, m, um, in, ft", Fails("circle:d=40furlong").Message);
        Assert.Contains("n: '2.5' is not a whole number", Fails("keyed:d=40,n=2.5").Message, StringComparison.Ordinal);
        Assert.Contains("at: unknown angle unit 'grad'", Fails("keyed:d=40,at=50grad").Message, StringComparison.Ordinal);
        Assert.Contains("form: 'warm' is not one of hot, cold", Fails("shs:B=80,t=5,form=warm").Message, StringComparison.Ordinal);
        Assert.Contains("key 'd' is given twice", Fails("circle:d=40,d=50").Message, StringComparison.Ordinal);
        Assert.Contains("key 'd' has no value", Fails("circle:d=").Message, StringComparison.Ordinal);
        Assert.Contains("item '40' has no key", Fails("circle:40").Message, StringComparison.Ordinal);
        Assert.Contains("d: must be positive, got -5", Fails("circle:d=-5").Message, StringComparison.Ordinal);
        Assert.Contains("at least three x y pairs", Fails("polygon:0 0 1 1").Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Cross_hole_is_out_of_scope_and_says_so()
    {
        var e = Fails("crosshole:d=40,hole=8");
        Assert.Equal("out-of-scope", e.Code);
        Assert.Contains("3D", e.Message, StringComparison.Ordinal);
    }

    private static readonly string[] Units = ["", "mm", "cm", "m", "in", "ft", "um"];
    private static readonly string[] Keys = ["d", "D", "t1", "B", "alpha", "n"];

    // parse(format(spec)) == spec: names, keys and values (number and unit) survive a round trip.
    [Property(MaxTest = 300)]
    public bool Format_then_parse_round_trips(PositiveInt mantissa, sbyte exponent, byte unit, byte keyCount, byte tmpl)
    {
        string name = ProfileTemplates.All[tmpl % ProfileTemplates.All.Count].Name;
        var items = new List<(string?, string)>();
        int count = keyCount % Keys.Length + 1;
        var values = new List<SpecValue>();
        for (int i = 0; i < count; i++)
        {
            var v = new SpecValue(mantissa.Get * Math.Pow(10, exponent % 12) * (i + 1), Units[(unit + i) % Units.Length]);
            values.Add(v);
            items.Add((Keys[i], v.ToString()));
        }
        var spec = TemplateSpec.Of(name, items);
        var back = TemplateSpec.Parse(spec.ToString());
        if (back.Name != name || back.Items.Count != count) return false;
        for (int i = 0; i < count; i++)
        {
            if (back.Items[i].Key != Keys[i] || !SpecValue.TryParse(back.Items[i].Value, out var v) || v != values[i]) return false;
        }
        return true;
    }

    // A circle built from a formatted diameter in any unit has exactly the area of that diameter; a diameter outside
    // 1 um .. 1 km (e.g. 14000 ft or 0.01 um) is refused with one line naming the key and the range (issue 11).
    [Property(MaxTest = 100)]
    public bool Formatted_length_builds_the_same_profile(PositiveInt mantissa, byte unit)
    {
        string u = Units[1 + unit % (Units.Length - 1)];
        Assert.True(LengthUnit.TryParse(u, out var lu));
        double d = mantissa.Get % 100000 / 7.0 + 0.01;
        string text = TemplateSpec.Of("circle", [("d", new SpecValue(d, u).ToString())]).ToString();
        double metres = lu.ToMetres(d);
        if (metres < 1e-6 || metres > 1e3)
        {
            var e = Assert.Throws<SectionTwistException>(() => ProfileTemplates.Create(text));
            return e.Message.Contains("d: ", StringComparison.Ordinal) && e.Message.Contains("1 µm to 1 km", StringComparison.Ordinal);
        }
        return Tol.RelErr(Math.PI * metres * metres / 4, Area(text)) < 1e-12 && ProfileTemplates.Create(text).Unit == lu;
    }
}
