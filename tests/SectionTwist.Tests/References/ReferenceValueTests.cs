using System.Globalization;
using System.Text.RegularExpressions;
using SectionTwist.Profiles;
using SectionTwist.Verification;
using static SectionTwist.Tests.References.Published;

namespace SectionTwist.Tests.References;

/// <summary>
/// The reference values the production code carries (the built-in verification cases, the standards' tables behind
/// the templates) and the reference column of docs/verification.md, held to the test project's own copies in
/// <see cref="Published"/>: editing a value in src/ or in the docs fails here.
/// </summary>
public class ReferenceValueTests
{
    /// <summary>Every built-in verification case: name, the test's own reference value, tolerance at accuracy 1e-4, source word.</summary>
    internal static IReadOnlyList<(string Name, double Value, double Tolerance, string Source)> ExpectedCases()
    {
        var list = new List<(string, double, double, string)>();
        void Add(string name, (double J, double Tau) v, string source)
        {
            list.Add((name + " J", v.J, 1e-4, source));
            list.Add((name + " peak shear", v.Tau, 5e-3, source));
        }
        Add("solid circle d=40mm", Circle(0.040), "Timoshenko");
        Add("hollow circle 50/36mm", Tube(0.050, 0.036), "Timoshenko");
        Add("ellipse 2:1 a=20mm", Ellipse(0.020, 0.010), "Timoshenko");
        Add("ellipse 4:1 a=20mm", Ellipse(0.020, 0.005), "Timoshenko");
        Add("equilateral triangle a=30mm", EquilateralTriangle(0.030), "Timoshenko");
        foreach (double ratio in new[] { 1.0, 2.0, 4.0, 10.0 })
        {
            double b = 0.010, a = ratio * b;
            var (beta, alpha) = Rectangle(a, b);
            Add($"rectangle {ratio.ToString(CultureInfo.InvariantCulture)}:1 b=10mm", (beta * a * b * b * b, 1 / (alpha * a * b * b)), "Roark");
        }
        list.Add(("ellipse 2:1 a=20mm Iw", EllipseWarpingConstant(0.020, 0.010), 1e-4, "Timoshenko"));
        list.Add(("ellipse 4:1 a=20mm Iw", EllipseWarpingConstant(0.020, 0.005), 1e-4, "Timoshenko"));
        // member inputs of the case (J = 7e-8 m^4, Iw = 1.3e-8 m^6, E = 210 GPa, G = 81 GPa, T = 1 kN*m), L in warping lengths
        double aw = Math.Sqrt(210e9 * 1.3e-8 / (81e9 * 7e-8));
        foreach (double n in new[] { 0.5, 2.0, 8.0 })
            list.Add(($"cantilever I restrained L={n.ToString("0.#", CultureInfo.InvariantCulture)}a twist", RestrainedCantileverTwist(1000, n * aw, 81e9, 7e-8, 210e9, 1.3e-8), 1e-9, "Vlasov"));
        // compound circular bar, core d = 30 mm G = 80 GPa in a tube D = 40 mm G = 40 GPa: (G J)_eff = G1 J1 + G2 J2,
        // J_ref = (G J)_eff / G1, tau_i / T = G_i r_i / (G J)_eff (exact; Lekhnitskii, compound bars)
        double j1 = Circle(0.030).J, j2 = Tube(0.040, 0.030).J, gj = 80e9 * j1 + 40e9 * j2;
        list.Add(("bonded bar/tube 30/40mm J", gj / 80e9, 1e-4, "Lekhnitskii"));
        list.Add(("bonded bar/tube 30/40mm core peak shear", 80e9 * 0.015 / gj, 5e-3, "Lekhnitskii"));
        list.Add(("bonded bar/tube 30/40mm tube peak shear", 40e9 * 0.020 / gj, 5e-3, "Lekhnitskii"));
        return list;
    }

    [Fact]
    public void Verification_cases_carry_the_published_values_and_tolerances()
    {
        var expected = ExpectedCases();
        Assert.Equal(expected.Select(e => e.Name).Order(), VerificationSuite.Cases.Select(c => c.Name).Order());
        foreach (var c in VerificationSuite.Cases)
        {
            var e = expected.Single(x => x.Name == c.Name);
            Tol.Rel(e.Value, c.Reference, 1e-12, $"{c.Name}: {(e.Source == "Roark" ? RectangleSource : e.Source == "Vlasov" ? "Vlasov, Thin-Walled Elastic Beams, ch. 5" : e.Source == "Lekhnitskii" ? "exact compound circular bar (Lekhnitskii)" : TimoshenkoGoodier)}");
            Assert.Equal(e.Tolerance, c.Tolerance);
            Assert.Contains(e.Source, c.Source, StringComparison.Ordinal);
        }
    }

    // The case geometry is the one the reference describes: exact areas (elementary geometry).
    [Fact]
    public void Verification_case_profiles_have_the_areas_of_the_referenced_shapes()
    {
        double Area(string name) => VerificationSuite.Cases.First(c => c.Name.StartsWith(name, StringComparison.Ordinal)).Build().Properties.Area;
        Tol.Rel(Math.PI * 0.02 * 0.02, Area("solid circle"), 1e-12);
        Tol.Rel(Math.PI * (0.025 * 0.025 - 0.018 * 0.018), Area("hollow circle"), 1e-12);
        Tol.Rel(Math.PI * 0.020 * 0.010, Area("ellipse 2:1"), 1e-12);
        Tol.Rel(Math.PI * 0.020 * 0.005, Area("ellipse 4:1"), 1e-12);
        Tol.Rel(Math.Sqrt(3) / 4 * 0.03 * 0.03, Area("equilateral"), 1e-12);
        foreach (double ratio in new[] { 1.0, 2.0, 4.0, 10.0 })
            Tol.Rel(ratio * 1e-4, Area($"rectangle {ratio.ToString(CultureInfo.InvariantCulture)}:1"), 1e-12);
    }

    // Roark 7th ed. Table 10.1 to its 4 printed decimals; beta(1) = 0.140577 and alpha(1) = 0.208165 to 6.
    [Fact]
    public void Rectangle_series_reproduces_Roark_table_and_the_production_copy_agrees()
    {
        foreach (var (ratio, beta, alpha) in RoarkRectangleTable)
        {
            var (b, a) = Rectangle(ratio, 1);
            Tol.Abs(beta, b, 5.01e-5, $"{Roark}, beta at a/b = {ratio}");
            Tol.Abs(alpha, a, 5.01e-5, $"{Roark}, alpha at a/b = {ratio}");
            var (pb, pa) = VerificationSuite.RectangleSeries(ratio, 1);
            Tol.Rel(b, pb, 1e-12, "production copy of the series");
            Tol.Rel(a, pa, 1e-12, "production copy of the series");
        }
        var (b1, a1) = Rectangle(1, 1);
        Tol.Abs(0.140577, b1, 5e-7, "series, square");
        Tol.Abs(0.208165, a1, 5e-7, "series, square");
    }

    [Fact]
    public void Keyseat_table_is_DIN_6885_1()
    {
        Assert.Equal(Din6885.Length, ParallelKeyTable.Rows.Length);
        for (int i = 0; i < Din6885.Length; i++)
        {
            var (over, upTo, b, h, t1) = Din6885[i];
            Assert.Equal(new ParallelKeyTable.Row(over, upTo, b, h, t1), ParallelKeyTable.Rows[i]);
        }
        Assert.Equal(KeyseatRadiusFromMemory.Length, ParallelKeyTable.RadiusRows.Length);
        for (int i = 0; i < KeyseatRadiusFromMemory.Length; i++)
        {
            var (from, to, rmin, rmax) = KeyseatRadiusFromMemory[i];
            Assert.Equal(new ParallelKeyTable.RadiusRow(from, to, rmin, rmax), ParallelKeyTable.RadiusRows[i]);
        }
    }

    // Rows checked against the standard are unflagged; every other row is flagged "from memory" (and warns when used).
    [Fact]
    public void Iso14_rows_checked_against_the_standard_are_exactly_the_unflagged_ones()
    {
        foreach (var (series, n, d, dd, b) in Iso14Checked)
            Assert.Contains(new Iso14Table.Row(series, n, d, dd, b, false), Iso14Table.Rows);
        foreach (var row in Iso14Table.Rows.Where(r => !r.Memory))
            Assert.Contains((row.Series, row.N, row.D1, row.D2, row.B), Iso14Checked);
    }

    /// <summary>The rows of the built-in cases table of docs/verification.md: name, reference, and the four error/tolerance figures.</summary>
    internal static List<(string Name, double Reference, double Err4, double Tol4, double Err6, double Tol6)> DocRows()
    {
        string text = File.ReadAllText(Path.Combine(RepoPaths.Root, "docs", "verification.md"));
        var rows = new List<(string, double, double, double, double, double)>();
        var num = @"([0-9.]+(?:E[-+]?[0-9]+)?)";
        var re = new Regex(@"^\| ([^|]+?) \| " + num + @" \| " + num + @" \(" + num + @"\) \| " + num + @" \(" + num + @"\) \|", RegexOptions.Multiline);
        foreach (Match m in re.Matches(text))
        {
            double D(int g) => double.Parse(m.Groups[g].Value, CultureInfo.InvariantCulture);
            rows.Add((m.Groups[1].Value, D(2), D(3), D(4), D(5), D(6)));
        }
        return rows;
    }

    // Each reference printed in docs/verification.md agrees with the test's copy to its 6 printed digits, and its
    // tolerances are the suite's (1e-4 / 5e-3 at the default accuracy; 1e-6 / 1e-3 at 1e-6).
    [Fact]
    public void Docs_verification_table_prints_the_published_values()
    {
        var rows = DocRows();
        var expected = ExpectedCases();
        Assert.Equal(expected.Select(e => e.Name).Order(), rows.Select(r => r.Name).Order());
        foreach (var r in rows)
        {
            var e = expected.Single(x => x.Name == r.Name);
            Tol.Rel(e.Value, r.Reference, 5.01e-6, $"docs/verification.md, {r.Name}");
            Assert.Equal(e.Tolerance, r.Tol4);
            Assert.Equal(r.Name.EndsWith(" J", StringComparison.Ordinal) ? 1e-6 : r.Name.EndsWith(" Iw", StringComparison.Ordinal) ? 1e-4
                : r.Name.EndsWith(" twist", StringComparison.Ordinal) ? 1e-9 : 1e-3, r.Tol6);
            Assert.True(r.Err4 <= r.Tol4 && r.Err6 <= r.Tol6, $"docs/verification.md, {r.Name}: a printed error exceeds its tolerance");
        }
    }
}
