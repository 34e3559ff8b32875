using System.Text.Json;
using System.Text.Json.Nodes;
using SectionTwist;
using Xunit;

namespace SectionTwist.Tests.Shaft;

/// <summary>
/// The JSON writer used by the shaft, bending and modes outputs (no reflection, so the ahead-of-time build can use it):
/// non-finite numbers become null at any depth, null arrays stay null, and the text parses back (JSON, RFC 8259).
/// </summary>
public class JsonTreeTests
{
    [Fact]
    public void Non_finite_numbers_become_null_at_every_depth_and_finite_ones_round_trip()
    {
        var root = new JsonObject
        {
            ["a"] = double.PositiveInfinity,
            ["b"] = 0.1,
            ["c"] = JsonTree.Arr(new[] { 1.0, double.NaN, -2.5e-300 }, x => x),
            ["d"] = new JsonObject { ["e"] = double.NegativeInfinity, ["f"] = "text", ["g"] = (double?)null, ["h"] = true },
            ["i"] = JsonTree.Arr((IEnumerable<string>?)null),
            ["j"] = JsonTree.Arr(new[] { "x", "y" }),
        };
        string text = JsonTree.Write(root);
        using var doc = JsonDocument.Parse(text);
        var r = doc.RootElement;
        Assert.Equal(JsonValueKind.Null, r.GetProperty("a").ValueKind);
        Assert.Equal(0.1, r.GetProperty("b").GetDouble());
        Assert.Equal(1.0, r.GetProperty("c")[0].GetDouble());
        Assert.Equal(JsonValueKind.Null, r.GetProperty("c")[1].ValueKind);
        Assert.Equal(-2.5e-300, r.GetProperty("c")[2].GetDouble());
        Assert.Equal(JsonValueKind.Null, r.GetProperty("d").GetProperty("e").ValueKind);
        Assert.Equal("text", r.GetProperty("d").GetProperty("f").GetString());
        Assert.Equal(JsonValueKind.Null, r.GetProperty("d").GetProperty("g").ValueKind);
        Assert.True(r.GetProperty("d").GetProperty("h").GetBoolean());
        Assert.Equal(JsonValueKind.Null, r.GetProperty("i").ValueKind);
        Assert.Equal("y", r.GetProperty("j")[1].GetString());
        Assert.Contains("\n", text, StringComparison.Ordinal); // indented, as the outputs were before
    }

    [Fact]
    public void Plugins_are_handed_on_only_by_a_build_without_a_jit()
    {
        // this test process has a JIT, so it loads plugins itself and never relays
        Assert.False(SectionTwist.Cli.PluginRelay.Needed(["section", "sq:20", "--plugins", "dir"]));
    }
}
