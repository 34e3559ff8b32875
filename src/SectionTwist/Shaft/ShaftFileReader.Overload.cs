using YamlDotNet.RepresentationModel;

namespace SectionTwist.Shaft;

/// <summary>The <c>overload</c> block of the shaft file (docs/shaft-file.md, "Overload"): torques checked against T_p.</summary>
internal sealed partial class ShaftFileReader
{
    private OverloadSpec ReadOverload(YamlNode node, IReadOnlyList<ShaftSegment> segments)
    {
        var m = new YamlMap(_file, node, "overload", "factor", "cases");
        double factor = 1;
        if (m.Get("factor") is { } fn)
        {
            factor = _file.Quantity(fn, "factor", QuantityKind.Number);
            if (!(factor >= 1 && factor <= 100)) throw _file.Error(fn, "factor", "the overload factor (required T_p / overload torque) lies from 1 to 100, e.g. 'factor: 1.25'");
        }
        var labels = segments.Select(s => s.Label).ToList();
        var cases = new List<OverloadCase>();
        foreach (var item in Sequence(m.Require("cases", "list the overloads, e.g. 'cases: [{name: motor stall, scale: 2.8}]'"), "cases", "- {name: motor stall, scale: 2.8}"))
        {
            var c = new YamlMap(_file, item, "an overload case", "name", "scale", "torque", "segments");
            string name = c.RequireString("name", "give the case a name, e.g. 'name: brake slip'");
            if (c.Has("scale") == c.Has("torque"))
                throw _file.Error(item, "scale", $"overload '{YamlGuard.Short(name)}' needs exactly one of 'scale' (times the solved torques, e.g. 2.8) or 'torque' (through the listed segments, e.g. 1.2 kN*m)");
            double? scale = c.Quantity("scale", QuantityKind.Number);
            if (scale is { } sc && !(sc > 0 && sc <= 1e3)) throw _file.Error(c.Get("scale")!, "scale", "the scale must be positive and at most 1000");
            double? torque = c.Quantity("torque", QuantityKind.Torque);
            if (torque is 0) throw _file.Error(c.Get("torque")!, "torque", "an overload torque of 0 checks nothing; give its magnitude");
            var names = new List<string>();
            if (c.Get("segments") is { } sn)
            {
                if (scale is not null) throw _file.Error(sn, "segments", "'segments' goes with 'torque'; a 'scale' applies to every segment's solved torque");
                foreach (var s in Sequence(sn, "segments", "segments: [input, middle]"))
                {
                    string v = s is YamlScalarNode { Value: { } t } ? t : throw _file.Error(s, "segments", "expected a segment name");
                    if (!labels.Contains(v))
                    {
                        string? near = Suggest.Nearest(v, labels);
                        throw _file.Error(s, "segments", $"no segment named '{YamlGuard.Short(v)}'{(near is null ? "" : $"; did you mean '{near}'?")} (segments: {YamlMap.Names(labels)})");
                    }
                    names.Add(v);
                }
            }
            cases.Add(new OverloadCase(name) { Scale = scale, Torque = torque, Segments = names });
        }
        return new OverloadSpec { Cases = cases, Factor = factor };
    }
}
