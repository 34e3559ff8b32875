using System.Globalization;
using System.Text;
using SectionTwist.Geometry;
using SectionTwist.Import.Dxf;
using SectionTwist.Profiles;

namespace SectionTwist.Fuzz;

/// <summary>
/// Seed inputs of each target: the drawings and the shaft file in sample-profiles/, drawings written by our own DXF
/// writer (templates, and an outline with closed contour polylines on a second layer as the section command's --dxf output
/// has), and small point lists and shaft files of the demo scenario. All of our own making.
/// </summary>
public static class Seeds
{
    /// <summary>The repository root (the folder holding SectionTwist.sln), searched upward from the binaries, then from the current folder.</summary>
    public static string RepoRoot()
    {
        foreach (var start in new[] { AppContext.BaseDirectory, Directory.GetCurrentDirectory() })
        {
            var dir = new DirectoryInfo(start);
            while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "SectionTwist.sln"))) dir = dir.Parent;
            if (dir is not null) return dir.FullName;
        }
        throw new InvalidOperationException("SectionTwist.sln not found above " + AppContext.BaseDirectory + " or the current folder; run from the repository");
    }

    /// <summary>Seeds of <paramref name="target"/>, in a fixed order.</summary>
    public static IReadOnlyList<byte[]> For(string target)
    {
        string samples = Path.Combine(RepoRoot(), "sample-profiles");
        var list = new List<byte[]>();
        switch (target)
        {
            case "dxf":
                list.AddRange(Directory.GetFiles(samples, "*.dxf").OrderBy(f => f, StringComparer.Ordinal).Select(File.ReadAllBytes));
                foreach (var spec in new[] { "circle:d=40", "keyed:d=30,r=0.4", "tube:D=50,d=36", "rect:b=30,h=10", "hex:s=27" })
                    list.Add(Written(ProfileTemplates.Create(spec), []));
                list.Add(Written(ProfileTemplates.Create("circle:d=40"), Contours()));
                break;
            case "points":
                list.Add(Text("# winch lever bar\nunit, mm\n0, 0\n40, 0\n40, 16\n0, 16\n"));
                list.Add(Text("# drum flange segment with a bore\n-30, -30\n30, -30\n30, 30\n-30, 30\n\n-10, 0\narc, 0, -10, 10, 0\narc, 0, 10, -10, 0\n"));
                list.Add(Text("unit, in\n0, 0\n2, 0\narc, 2.5, 0.5, 2, 1\n0, 1\n"));
                break;
            default:
                list.Add(File.ReadAllBytes(Path.Combine(samples, "winch-shaft.yaml")));
                list.Add(Text("""
                    title: conveyor tail shaft
                    units: {length: mm, torque: N*m}
                    materials:
                      st: {G: 79.3 GPa, allowableShear: 60 MPa}
                    sections:
                      a: {round: 35}
                      b: {tube: {outer: 50, inner: 30}}
                      c: {J: 2.1e5 mm^4, shearFactor: 4.1e-5 1/mm^3}
                    stations:
                      - {name: A, at: 0}
                      - {name: B, after: 120}
                      - {name: C, after: 300}
                      - {name: D, after: 80}
                    segments:
                      - {from: A, to: B, section: a, material: st}
                      - {from: B, to: C, section: b, material: st}
                      - {from: C, to: D, taper: [40, 30], material: st}
                    loads:
                      - {at: B, power: 4 kW, speed: 90 rpm}
                      - {from: B, to: C, torquePerLength: -0.5 N*m/mm}
                    supports: {fixed: [A, D]}
                    springs:
                      - {between: [C, D], stiffness: 20 kN*m/rad}
                    twistLimit: 0.25 deg/m
                    """));
                list.Add(Text("""
                    units: {length: mm, torque: N*m}
                    materials:
                      bush: {G: 37 GPa, allowableShear: 20 MPa}
                    sections:
                      s: {template: "sleeved:d=40,t=5", materials: {core: steel-1045-cd, sleeve: bush}}
                    stations: [{name: A, at: 0}, {name: B, after: 300}]
                    segments: [{from: A, to: B, section: s, material: steel-1045-cd}]
                    loads: [{at: B, torque: 900}]
                    supports: {fixed: [A]}
                    """));
                list.Add(Text("""
                    units: {length: in, torque: lbf*in}
                    stations: [{name: M, at: 0}, {name: G, at: 14}]
                    segments: [{from: M, to: G, section: {template: "keyed:d=1.5in"}, material: steel-1045-cd}]
                    loads: [{at: G, torque: 1800}]
                    supports: {fixed: [M]}
                    """));
                break;
        }
        return list;
    }

    private static byte[] Text(string s) => Encoding.UTF8.GetBytes(s.Replace("\r\n", "\n", StringComparison.Ordinal));

    private static byte[] Written(Profile p, IReadOnlyList<DxfPolyline> extra)
    {
        using var ms = new MemoryStream();
        DxfProfiles.Write(p, ms, new DxfWriteOptions { Version = DxfVersion.R2000, Polylines = extra });
        return ms.ToArray();
    }

    /// <summary>Closed contour-like polylines of 2-point pieces inside a 40 mm circle, as an exported stress-function layer.</summary>
    private static List<DxfPolyline> Contours()
    {
        var lines = new List<DxfPolyline>();
        for (int k = 1; k <= 4; k++)
        {
            double r = 0.02 * k / 5;
            for (int i = 0; i < 24; i++)
            {
                double a0 = 2 * Math.PI * i / 24, a1 = 2 * Math.PI * (i + 1) / 24;
                lines.Add(new DxfPolyline("PHI", [new Point2(r * Math.Cos(a0), r * Math.Sin(a0)), new Point2(r * Math.Cos(a1), r * Math.Sin(a1))], false));
            }
        }
        return lines;
    }

    internal static string Inv(double v) => v.ToString("R", CultureInfo.InvariantCulture);
}
