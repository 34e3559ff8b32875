using SectionTwist.Geometry;
using static SectionTwist.Profiles.TemplateDefinition;

namespace SectionTwist.Profiles;

/// <summary>
/// External involute spline shaft: module m, z teeth, pressure angle 30, 37.5 or 45 degrees, major diameter Da, minor
/// diameter Df, root fillet r. The flanks are the true involute of the base circle m z cos(alpha) / 2 (below the base
/// circle, radial), with the basic tooth thickness pi m / 2 on the pitch circle m z. Each flank is replaced by circular
/// arcs through three involute points, refined until no arc deviates from the involute by more than 5e-5 m. The
/// root fillet is the circle of radius r tangent to the flank and the minor circle, found by bisection on the
/// involute roll angle. Default diameters (ISO 4156 external splines, from memory): 30 deg Da = m (z + 1),
/// Df = m (z - 1.5); 37.5 deg Da = m (z + 0.9), Df = m (z - 1.4); 45 deg Da = m (z + 0.8), Df = m (z - 1.2);
/// default root fillet 0.2 m (common practice, no source).
/// </summary>
internal static class InvoluteSplineTemplate
{
    /// <summary>Largest deviation of a fitted flank arc from the true involute, in modules.</summary>
    internal const double FlankTolerance = 5e-5;

    public static TemplateDefinition Definition { get; } = new(
        new TemplateInfo("involute", "involute spline shaft (external), true involute flanks fitted by arcs within 5e-5 module",
            Params(new TemplateParameter("m", ParameterKind.Length, "module"),
                new TemplateParameter("z", ParameterKind.Count, "number of teeth"),
                new TemplateParameter("alpha", ParameterKind.Angle, "pressure angle: 30, 37.5 or 45", "30"),
                new TemplateParameter("Da", ParameterKind.Length, "major (tip) diameter", "m (z + 1) at 30 deg"),
                new TemplateParameter("Df", ParameterKind.Length, "minor (root) diameter", "m (z - 1.5) at 30 deg"),
                new TemplateParameter("r", ParameterKind.Length, "root fillet radius", "0.2 m")),
            "D = Da (major diameter)", "involute:m=2,z=20", ["ispline"]),
        Build,
        (a, _) => Sizes(a).Da);

    private static (double M, int Z, double Alpha, double Da, double Df) Sizes(TemplateArguments a)
    {
        double m = a.Length("m");
        int z = a.Count("z");
        if (z < 6 || z > 200) throw a.Error("z", $"{z} teeth: use 6 to 200");
        double alphaDeg = a.Angle("alpha", Math.PI / 6) * 180 / Math.PI;
        (double add, double ded) = Math.Abs(alphaDeg - 30) < 1e-6 ? (1.0, 1.5) : Math.Abs(alphaDeg - 37.5) < 1e-6 ? (0.9, 1.4)
            : Math.Abs(alphaDeg - 45) < 1e-6 ? (0.8, 1.2)
            : throw a.Error("alpha", $"pressure angle {alphaDeg:G6} deg: use 30, 37.5 or 45 (the standard spline pressure angles)");
        return (m, z, alphaDeg * Math.PI / 180, a.Length("Da", m * (z + add)), a.Length("Df", m * (z - ded)));
    }

    private static Region[] Build(TemplateArguments a)
    {
        var (m, z, alpha, da, df) = Sizes(a);
        double r = a.LengthOrZero("r", 0.2 * m);
        if (!a.Has("Da") || !a.Has("Df"))
            a.DefaultFromMemory(!a.Has("Da") ? "Da" : "Df", $"{(a.Has("Da") ? "minor diameter" : a.Has("Df") ? "major diameter" : "major and minor diameters")} of ISO 4156 for {alpha * 180 / Math.PI:G4} deg ({(a.Has("Da") ? "" : "Da = " + a.Show(da))}{(a.Has("Da") || a.Has("Df") ? "" : ", ")}{(a.Has("Df") ? "" : "Df = " + a.Show(df))}),", "give Da= and Df= explicitly");
        if (!a.Has("r"))
            a.Warnings.Add(new ProfileWarning("default-no-source",
                $"{a.Spec}: r: the root fillet {a.Show(r)} (0.2 m) is common practice with no standard behind it; a smaller real fillet raises the peak shear; give r= from your drawing"));
        double rp = m * z / 2, rb = rp * Math.Cos(alpha), ra = da / 2, rf = df / 2;
        if (ra <= rf) throw a.Error("Da", $"major diameter {a.Show(da)} is not larger than the minor diameter {a.Show(df)}");
        if (ra <= rb) throw a.Error("Da", $"major diameter {a.Show(da)} lies inside the base circle {a.Show(2 * rb)}: no involute flank; use a larger Da");
        double psiB = Math.PI / (2 * z) + Inv(alpha); // half tooth angle on (and below) the base circle
        double Psi(double radius) => radius <= rb ? psiB : psiB - Inv(Math.Acos(rb / radius));
        if (Psi(ra) <= 0) throw a.Error("Da", $"the teeth come to a point below the major diameter {a.Show(da)}; use a smaller Da");
        if (Psi(rf) >= Math.PI / z)
            throw a.Error("Df", $"neighbouring teeth overlap at the minor diameter {a.Show(df)}: each tooth is wider than the pitch there; use a larger Df or fewer teeth");
        // Upper half of a tooth centred on +x, from the tip centre down the flank to the gap middle.
        var chain = new List<Segment> { new ArcSegment(default, ra, 0, Psi(ra)) };
        double ua = Math.Sqrt(ra * ra / (rb * rb) - 1);
        Point2 At(double u) { double rad = rb * Math.Sqrt(1 + u * u), phi = psiB - (u - Math.Atan(u)); return new Point2(rad * Math.Cos(phi), rad * Math.Sin(phi)); }
        double uLow = rf > rb ? Math.Sqrt(rf * rf / (rb * rb) - 1) : 0;
        Point2 rootPoint; // where the root arc starts (fillet end, or the flank foot when r = 0)
        if (r == 0)
        {
            FitFlank(chain, At, ua, uLow, FlankTolerance * m);
            if (rf < rb) chain.Add(new LineSegment(chain[^1].End, new Point2(rf * Math.Cos(psiB), rf * Math.Sin(psiB))));
            rootPoint = chain[^1].End;
        }
        else
        {
            Point2 eB = new(Math.Cos(psiB), Math.Sin(psiB)), nB = new(-eB.Y, eB.X);
            double rho = Math.Sqrt((rf + r) * (rf + r) - r * r);
            Point2 centre, touch;
            if (rf < rb && rho <= rb)
            {
                // Fillet touches the radial part below the base circle.
                FitFlank(chain, At, ua, 0, FlankTolerance * m);
                touch = rho * eB;
                chain.Add(new LineSegment(chain[^1].End, touch));
                centre = touch + r * nB;
            }
            else
            {
                Point2 Centre(double u)
                {
                    double rad = rb * Math.Sqrt(1 + u * u), phi = psiB - (u - Math.Atan(u));
                    double dr = rb * u / Math.Sqrt(1 + u * u), dphi = -u * u / (1 + u * u);
                    Point2 er = new(Math.Cos(phi), Math.Sin(phi)), et = new(-er.Y, er.X);
                    Point2 n = dr * et - rad * dphi * er; // flank normal toward the gap
                    return At(u) + (r / n.Length) * n;
                }
                double lo = Math.Max(uLow, 1e-9), hi = ua;
                if (Centre(hi).Length < rf + r) throw a.Error("r", $"root fillet {a.Show(r)} is taller than the flank; use a smaller r");
                for (int it = 0; it < 200 && hi - lo > 1e-15 * ua; it++)
                {
                    double mid = 0.5 * (lo + hi);
                    if (Centre(mid).Length < rf + r) lo = mid; else hi = mid;
                }
                FitFlank(chain, At, ua, hi, FlankTolerance * m);
                touch = chain[^1].End;
                centre = Centre(hi);
            }
            Point2 foot = (rf / centre.Length) * centre;
            double a0 = Math.Atan2(touch.Y - centre.Y, touch.X - centre.X);
            double sweep = ArcSegment.NormalizePositive(Math.Atan2(foot.Y - centre.Y, foot.X - centre.X) - a0) - 2 * Math.PI;
            chain.Add(new ArcSegment(centre, r, a0, sweep));
            rootPoint = foot;
        }
        double gamma = Math.Atan2(rootPoint.Y, rootPoint.X);
        if (gamma >= Math.PI / z - 1e-9)
            throw a.Error("r", $"root fillets {a.Show(r)} of neighbouring teeth overlap in the gap; use a smaller r");
        chain.Add(new ArcSegment(default, rf, gamma, Math.PI / z - gamma));
        // Whole tooth: mirror of the upper half (y -> -y) run backwards, then the upper half; then the polar pattern.
        var mirror = new Similarity2(1, Math.PI, true, default);
        var tooth = chain.AsEnumerable().Reverse().Select(s => s.Transformed(mirror).Reversed()).Concat(chain).ToList();
        // Start at the gap middle so the loop is a clean sequence: rotate the list to begin with the lower half.
        var segments = new List<Segment>();
        for (int k = 0; k < z; k++)
        {
            var rot = Similarity2.Rotate(2 * Math.PI * k / z);
            segments.AddRange(tooth.Select(s => s.Transformed(rot)));
        }
        return [new Region(new Loop(Merge(segments)))];
    }

    /// <summary>Joins the tip arcs that the mirror split at the tooth centre, and the root arcs split at the gap middle.</summary>
    private static List<Segment> Merge(List<Segment> segments)
    {
        var merged = new List<Segment>();
        foreach (var s in segments)
        {
            if (merged.Count > 0 && merged[^1] is ArcSegment p && s is ArcSegment q && Point2.Distance(p.Center, q.Center) < 1e-15 * p.Radius + 1e-300
                && Math.Abs(p.Radius - q.Radius) < 1e-12 * p.Radius && Math.Sign(p.Sweep) == Math.Sign(q.Sweep))
                merged[^1] = new ArcSegment(p.Center, p.Radius, p.StartAngle, p.Sweep + q.Sweep);
            else merged.Add(s);
        }
        return merged;
    }

    /// <summary>The involute function inv(a) = tan a - a.</summary>
    internal static double Inv(double a) => Math.Tan(a) - a;

    /// <summary>Appends arcs through involute points from roll angle u0 down to u1, each within <paramref name="tol"/> of the curve.</summary>
    private static void FitFlank(List<Segment> chain, Func<double, Point2> at, double u0, double u1, double tol)
    {
        var stack = new Stack<(double A, double B)>();
        stack.Push((u0, u1));
        while (stack.Count > 0)
        {
            var (ua, ub) = stack.Pop();
            double um = 0.5 * (ua + ub);
            Point2 pa = chain[^1].End, pm = at(um), pb = at(ub);
            double dev = double.PositiveInfinity;
            Segment? seg = null;
            try
            {
                var arc = ArcSegment.ThroughThreePoints(pa, pm, pb);
                seg = arc;
                dev = Math.Max(Math.Abs(Point2.Distance(at(0.75 * ua + 0.25 * ub), arc.Center) - arc.Radius),
                    Math.Abs(Point2.Distance(at(0.25 * ua + 0.75 * ub), arc.Center) - arc.Radius));
            }
            catch (SectionTwistException)
            {
                seg = new LineSegment(pa, pb); // collinear: the line is the curve to rounding
                dev = 0;
            }
            if (dev <= tol || Math.Abs(ua - ub) < 1e-9) { chain.Add(seg); continue; }
            stack.Push((um, ub));
            stack.Push((ua, um));
        }
    }
}
