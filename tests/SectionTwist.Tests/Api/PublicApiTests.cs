namespace SectionTwist.Tests.Api;

/// <summary>
/// The public API baseline (docs/api/*.txt). A change to the public surface fails this test until the baseline is
/// updated on purpose: run the tests with SECTIONTWIST_UPDATE_API=1 and commit the new baseline with the change.
/// </summary>
public class PublicApiTests
{
    [Theory]
    [InlineData("SectionTwist.Core")]
    [InlineData("SectionTwist.Rendering")]
    public void Public_api_matches_baseline(string assemblyName)
    {
        var asm = AppDomain.CurrentDomain.GetAssemblies().FirstOrDefault(a => a.GetName().Name == assemblyName)
                  ?? System.Reflection.Assembly.Load(assemblyName);
        string actual = PublicApiSnapshot.Describe(asm);
        string path = Path.Combine(RepoPaths.Root, "docs", "api", assemblyName + ".txt");
        if (Environment.GetEnvironmentVariable("SECTIONTWIST_UPDATE_API") == "1")
        {
            Directory.CreateDirectory(Path.GetDirectoryName(path)!);
            File.WriteAllText(path, actual);
        }
        Assert.True(File.Exists(path), $"no API baseline at {path}; run the tests once with SECTIONTWIST_UPDATE_API=1");
        string expected = File.ReadAllText(path).Replace("\r\n", "\n", StringComparison.Ordinal);
        if (expected == actual) return;
        var e = expected.Split('\n'); var a = actual.Split('\n');
        var removed = e.Except(a).Take(10); var added = a.Except(e).Take(10);
        Assert.Fail($"public API of {assemblyName} changed.\nremoved:\n{string.Join("\n", removed)}\nadded:\n{string.Join("\n", added)}\n" +
                    "If intended, run the tests with SECTIONTWIST_UPDATE_API=1 and commit docs/api.");
    }
}
