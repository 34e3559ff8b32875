using SectionTwist.Bending;
using SectionTwist.Fatigue;
using SectionTwist.Keys;
using YamlDotNet.RepresentationModel;

namespace SectionTwist.Shaft;

/// <summary>The <c>bending</c> block of the shaft file: bearings, transverse loads, fatigue, keys and splines (docs/shaft-file.md).</summary>
internal sealed partial class ShaftFileReader
{
    private BendingModel ReadBending(YamlNode node)
    {
        // plain force numbers are newtons
        if (_file.Default(QuantityKind.Force) is null) _file.SetDefault(QuantityKind.Force, "N", 1);
        var m = new YamlMap(_file, node, "bending", "bearings", "loads", "selfWeight", "gravityDirection", "shearDeformation", "slopeLimit", "rotating", "fatigue", "keys", "splines");
        var bearings = Sequence(m.Require("bearings", "list the bearings, e.g. 'bearings: [{at: A}, {at: D}]'"), "bearings", "- {at: A}")
            .Select(ReadBearing).ToList();
        var loads = m.Get("loads") is { } ln ? Sequence(ln, "loads", "- {at: C, force: 1.2 kN, direction: -90 deg}").SelectMany(ReadTransverse).ToList() : [];
        double? slope = m.Quantity("slopeLimit", QuantityKind.Angle);
        if (slope is <= 0) throw _file.Error(m.Get("slopeLimit")!, "slopeLimit", "the slope limit must be positive, e.g. '0.001 rad'");
        var connections = new List<ConnectionCheck>();
        if (m.Get("keys") is { } kn) connections.AddRange(Sequence(kn, "keys", "- {segment: A-B, width: 10, height: 8, depth: 5, length: 40}").Select(ReadKey));
        if (m.Get("splines") is { } sn) connections.AddRange(Sequence(sn, "splines", "- {segment: C-D, teeth: 8, meanDiameter: 42, contactHeight: 2.5, length: 40}").Select(ReadSpline));
        return new BendingModel
        {
            Bearings = bearings,
            Loads = loads,
            SelfWeight = Bool(m, "selfWeight") ?? false,
            GravityDirection = m.Quantity("gravityDirection", QuantityKind.Angle) ?? -Math.PI / 2,
            ShearDeformation = Bool(m, "shearDeformation") ?? false,
            SlopeLimit = slope,
            Rotating = Bool(m, "rotating") ?? true,
            Fatigue = m.Get("fatigue") is { } fn ? ReadFatigue(fn) : null,
            Connections = connections,
        };
    }

    private bool? Bool(YamlMap m, string key) => m.String(key) switch
    {
        null => null,
        "true" or "yes" => true,
        "false" or "no" => false,
        var v => throw _file.Error(m.Get(key)!, key, $"expected true or false, found '{v}'"),
    };

    private Bearing ReadBearing(YamlNode item)
    {
        var m = new YamlMap(_file, item, "a bearing", "at", "name", "clamped", "thrust", "slopeLimit");
        string at = StationName(m.Require("at", "name the station of the bearing, e.g. 'at: A'"), "at");
        double? slope = m.Quantity("slopeLimit", QuantityKind.Angle);
        if (slope is <= 0) throw _file.Error(m.Get("slopeLimit")!, "slopeLimit", "the slope limit must be positive, e.g. '0.001 rad'");
        return new Bearing(at) { Name = m.String("name"), Clamped = Bool(m, "clamped") ?? false, TakesThrust = Bool(m, "thrust") ?? false, SlopeLimit = slope };
    }

    private IEnumerable<TransverseLoad> ReadTransverse(YamlNode item)
    {
        var m = new YamlMap(_file, item, "a bending load", "at", "name", "force", "direction", "axial", "gear", "pull");
        string at = StationName(m.Require("at", "name the station, e.g. 'at: C'"), "at");
        string? name = m.String("name");
        int kinds = (m.Has("force") || m.Has("axial") ? 1 : 0) + (m.Has("gear") ? 1 : 0) + (m.Has("pull") ? 1 : 0);
        if (kinds != 1) throw _file.Error(item, "force", "a bending load needs exactly one of 'force' (and/or 'axial'), 'gear' or 'pull'");
        if (m.Has("direction") && !m.Has("force")) throw _file.Error(m.KeyNode("direction"), "direction", "'direction' belongs to a 'force' given by its magnitude");
        if (m.Get("gear") is { } gn)
        {
            var g = new YamlMap(_file, gn, "a gear", "pitchDiameter", "pressureAngle", "helixAngle", "meshAngle");
            double d = Diameter(g.Require("pitchDiameter", "give the pitch diameter"), "pitchDiameter");
            double phi = g.Quantity("pressureAngle", QuantityKind.Angle) ?? 20 * Math.PI / 180;
            if (!(phi > 0 && phi < Math.PI / 3)) throw _file.Error(g.Get("pressureAngle")!, "pressureAngle", "the pressure angle must lie between 0 and 60 deg (usually 20 deg)");
            double psi = g.Quantity("helixAngle", QuantityKind.Angle) ?? 0;
            if (!(Math.Abs(psi) < Math.PI * 0.4)) throw _file.Error(g.Get("helixAngle")!, "helixAngle", "the helix angle must lie between -72 and 72 deg");
            double where = g.Quantity("meshAngle", QuantityKind.Angle) ?? throw _file.Error(gn, "meshAngle", "give where the mating gear touches, e.g. 'meshAngle: 90 deg' (from +Y toward +Z)");
            yield return new GearMesh(at, d, phi, psi, where) { Description = name };
            yield break;
        }
        if (m.Get("pull") is { } pn)
        {
            var p = new YamlMap(_file, pn, "a pull", "diameter", "direction", "factor");
            double d = Diameter(p.Require("diameter", "give the pulley or sprocket pitch diameter"), "diameter");
            double dir = p.Quantity("direction", QuantityKind.Angle) ?? throw _file.Error(pn, "direction", "give the direction of the pull on the shaft, e.g. 'direction: 180 deg'");
            double f = p.Quantity("factor", QuantityKind.Number) ?? 1;
            if (!(f >= 1)) throw _file.Error(p.Get("factor")!, "factor", "the factor (F1 + F2) / (F1 - F2) is at least 1 (1 for a chain)");
            yield return new BeltPull(at, d, dir, f) { Description = name };
            yield break;
        }
        double fy = 0, fz = 0;
        if (m.Get("force") is { } fn)
        {
            if (fn is YamlMappingNode)
            {
                if (m.Has("direction")) throw _file.Error(m.KeyNode("direction"), "direction", "give either components '{y, z}' or a magnitude with 'direction'");
                var c = new YamlMap(_file, fn, "a force", "y", "z");
                fy = c.Quantity("y", QuantityKind.Force) ?? 0; fz = c.Quantity("z", QuantityKind.Force) ?? 0;
            }
            else
            {
                double mag = _file.Quantity(fn, "force", QuantityKind.Force);
                double dir = m.Quantity("direction", QuantityKind.Angle) ?? throw _file.Error(item, "direction", "a force magnitude needs its 'direction' (angle from +Y toward +Z, e.g. '-90 deg' for down)");
                var (c, s) = PlaneDirection.Of(dir);
                fy = mag * c; fz = mag * s;
            }
        }
        double fx = m.Quantity("axial", QuantityKind.Force) ?? 0;
        yield return new PointForce(at, fy, fz, fx) { Description = name };
    }

    private FatigueSettings ReadFatigue(YamlNode node)
    {
        var m = new YamlMap(_file, node, "fatigue", "surface", "reliability", "temperatureFactor", "miscellaneousFactor", "enduranceLimit", "criterion", "notches");
        var surface = m.String("surface") switch
        {
            null or "machined" or "cold-drawn" => SurfaceFinish.Machined,
            "ground" => SurfaceFinish.Ground,
            "hot-rolled" => SurfaceFinish.HotRolled,
            "as-forged" => SurfaceFinish.AsForged,
            var v => throw _file.Error(m.Get("surface")!, "surface", $"unknown surface '{v}'; use ground, machined, cold-drawn, hot-rolled or as-forged"),
        };
        double rel = m.Quantity("reliability", QuantityKind.Number) ?? 0.99;
        try { EnduranceLimit.ReliabilityFactor(rel); }
        catch (SectionTwistException e) { throw _file.Error(m.Get("reliability")!, "reliability", e.Message); }
        var criterion = m.String("criterion") switch
        {
            null or "goodman" => FatigueCriterion.Goodman,
            "asme-elliptic" => FatigueCriterion.AsmeElliptic,
            var v => throw _file.Error(m.Get("criterion")!, "criterion", $"unknown criterion '{v}'; use goodman or asme-elliptic"),
        };
        double? se = m.Has("enduranceLimit") ? PositiveStress(m, "enduranceLimit") : null;
        var notches = m.Get("notches") is { } nn ? Sequence(nn, "notches", "- {at: B, feature: shoulder-rounded}").Select(ReadNotch).ToList() : [];
        return new FatigueSettings
        {
            Surface = surface, Reliability = rel, Criterion = criterion, EnduranceLimit = se, Locations = notches,
            TemperatureFactor = Factor(m, "temperatureFactor"), MiscellaneousFactor = Factor(m, "miscellaneousFactor"),
        };
    }

    private double Factor(YamlMap m, string key)
    {
        double v = m.Quantity(key, QuantityKind.Number) ?? 1;
        if (!(v > 0 && v <= 1.2)) throw _file.Error(m.Get(key)!, key, "a Marin factor lies between 0 and about 1");
        return v;
    }

    private NotchLocation ReadNotch(YamlNode item)
    {
        var m = new YamlMap(_file, item, "a notch", "at", "name", "segment", "feature", "Kt", "Kts", "q", "qs", "radius");
        string at = StationName(m.Require("at", "name the station of the notch"), "at");
        var feature = m.String("feature") switch
        {
            null => NotchFeature.None,
            "shoulder-sharp" => NotchFeature.ShoulderSharp,
            "shoulder-rounded" => NotchFeature.ShoulderRounded,
            "keyseat-end-mill" => NotchFeature.KeyseatEndMill,
            "ring-groove" => NotchFeature.RetainingRingGroove,
            var v => throw _file.Error(m.Get("feature")!, "feature", $"unknown feature '{v}'; use shoulder-sharp, shoulder-rounded, keyseat-end-mill or ring-groove, or give Kt and Kts"),
        };
        if (feature == NotchFeature.None && !(m.Has("Kt") && m.Has("Kts")))
            throw _file.Error(item, "Kt", "a notch needs 'Kt' and 'Kts', or a 'feature' whose estimates fill them in");
        double? radius = m.Has("radius") ? Diameter(m.Get("radius")!, "radius") : null;
        return new NotchLocation(at)
        {
            Name = m.String("name"), Segment = m.String("segment"), Feature = feature,
            Kt = m.Quantity("Kt", QuantityKind.Number), Kts = m.Quantity("Kts", QuantityKind.Number),
            Q = m.Quantity("q", QuantityKind.Number), Qs = m.Quantity("qs", QuantityKind.Number), NotchRadius = radius,
        };
    }

    private ParallelKey ReadKey(YamlNode item)
    {
        var m = new YamlMap(_file, item, "a key", "segment", "name", "width", "height", "depth", "length", "diameter", "count", "allowablePressure", "allowableShear");
        string seg = m.RequireString("segment", "name the segment that carries the key (its name or 'A-B')");
        double L(string k) => Diameter(m.Require(k, $"give the key's {k}"), k);
        int count = (int)(m.Quantity("count", QuantityKind.Number) ?? 1);
        return new ParallelKey(seg, L("width"), L("height"), L("depth"), L("length"))
        {
            Name = m.String("name"), Count = count, Diameter = m.Has("diameter") ? L("diameter") : null,
            AllowablePressure = m.Has("allowablePressure") ? PositiveStress(m, "allowablePressure") : null,
            AllowableShear = m.Has("allowableShear") ? PositiveStress(m, "allowableShear") : null,
        };
    }

    private SplineConnection ReadSpline(YamlNode item)
    {
        var m = new YamlMap(_file, item, "a spline", "segment", "name", "kind", "teeth", "meanDiameter", "contactHeight", "length", "loadShare", "allowablePressure");
        string seg = m.RequireString("segment", "name the segment that carries the spline");
        string kind = m.String("kind") ?? "straight";
        if (kind is not ("straight" or "involute")) throw _file.Error(m.Get("kind")!, "kind", "use straight or involute");
        double L(string k) => Diameter(m.Require(k, $"give the spline's {k}"), k);
        double teeth = m.Quantity("teeth", QuantityKind.Number) ?? throw _file.Error(item, "teeth", "give the number of teeth");
        if (!(teeth >= 1 && teeth == Math.Floor(teeth))) throw _file.Error(m.Get("teeth")!, "teeth", "a whole number of teeth");
        double share = m.Quantity("loadShare", QuantityKind.Number) ?? 0.75;
        if (!(share > 0 && share <= 1)) throw _file.Error(m.Get("loadShare")!, "loadShare", "the load share lies in (0, 1]");
        return new SplineConnection(seg, (int)teeth, L("meanDiameter"), L("contactHeight"), L("length"))
        {
            Name = m.String("name"), Kind = kind, LoadShare = share,
            AllowablePressure = m.Has("allowablePressure") ? PositiveStress(m, "allowablePressure") : null,
        };
    }
}
