using SectionTwist.Import.Dxf;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Import;

/// <summary>Drawings through the solver: J of curved outlines read from DXF against exact elasticity solutions.</summary>
public class DxfSolverTests
{
    [Fact]
    public void Circle_from_dxf_gives_the_exact_torsion_constant()
    {
        // J = pi d^4 / 32 (Timoshenko and Goodier, Theory of Elasticity, ch. 10), d = 40 mm
        var r = new DxfText().Header(4).Entities().Circle(0, 0, 20).End().Read();
        var res = SectionAnalyzer.Analyze(r.Profile, new AnalysisOptions { Accuracy = 1e-4 });
        Tol.Rel(Math.PI * Math.Pow(0.040, 4) / 32, res.TorsionConstant, 1e-4, "Timoshenko & Goodier ch. 10: pi d^4 / 32");
    }

    [Fact]
    public void Ellipse_from_dxf_gives_the_exact_torsion_constant()
    {
        // J = pi a^3 b^3 / (a^2 + b^2) (Timoshenko and Goodier, Theory of Elasticity, ch. 10), a = 30 mm, b = 15 mm
        var r = new DxfText().Header(4).Entities()
            .P(0, "ELLIPSE").P(8, "0").P(10, 0.0).P(20, 0.0).P(30, 0.0).P(11, 30.0).P(21, 0.0).P(31, 0.0)
            .P(40, 0.5).P(41, 0.0).P(42, 2 * Math.PI).End().Read();
        var res = SectionAnalyzer.Analyze(r.Profile, new AnalysisOptions { Accuracy = 1e-4 });
        double a = 0.030, b = 0.015;
        Tol.Rel(Math.PI * a * a * a * b * b * b / (a * a + b * b), res.TorsionConstant, 1e-4, "Timoshenko & Goodier ch. 10: ellipse");
    }
}
