using System.Globalization;
using SectionTwist.Geometry;
using SectionTwist.Meshing;

namespace SectionTwist.Torsion;

/// <summary>
/// The memory budget of one analysis turned into an element limit, and the estimate of the first pass checked against
/// it before anything is meshed (<see cref="MeshFeasibility.EstimateElements"/>; the first pass meshes once and refines
/// uniformly once, 1 + 4 times the estimate). <see cref="BytesPerElement"/> was measured as the peak working set over the
/// element count of the finest solve on a keyseat (1.2e5 elements, 5.3 kB) and a thin tube (1.7e5 elements, 6.7 kB); rounded up to 8 kB as a margin for the larger multigrid solves, which were not measured.
/// </summary>
internal sealed class AnalysisBudget
{
    /// <summary>Peak bytes per element of the finest solve (mesh, assembly, factorization and recovery together).</summary>
    internal const long BytesPerElement = 8000;

    private readonly Profile _profile;
    private readonly AnalysisOptions _options;
    private readonly double _accuracy;
    private double _needed;

    private AnalysisBudget(Profile profile, AnalysisOptions options, double accuracy)
    {
        _profile = profile; _options = options; _accuracy = accuracy;
        long byMemory = Math.Max(1000, options.MemoryBudgetBytes / BytesPerElement);
        MaxElements = (int)Math.Min(options.MaxElements, Math.Min(int.MaxValue / 4, byMemory));
        LimitedByMemory = byMemory < options.MaxElements;
    }

    /// <summary>Most elements of one solve.</summary>
    public int MaxElements { get; }

    private bool LimitedByMemory { get; }

    /// <summary>The budget for <paramref name="profile"/>; throws the refusal when the first pass alone would not fit.</summary>
    public static AnalysisBudget For(Profile profile, AnalysisOptions options, double accuracy, double h)
    {
        if (options.MemoryBudgetBytes <= 0)
            throw new SectionTwistException("bad-option", $"memory budget {options.MemoryBudgetBytes} bytes must be positive");
        var b = new AnalysisBudget(profile, options, accuracy);
        double coarse = MeshFeasibility.EstimateElements(profile, h);
        b._needed = options.EstimateError ? 4 * coarse : coarse;
        if (!(b._needed <= b.MaxElements)) throw b.Refusal();
        return b;
    }

    /// <summary>"the memory budget (N MB)" or "the element limit (N)", whichever binds.</summary>
    public string Describe() => LimitedByMemory
        ? $"the memory budget ({Mb(_options.MemoryBudgetBytes)})"
        : $"the element limit ({_options.MaxElements.ToString(CultureInfo.InvariantCulture)})";

    /// <summary>The error for an analysis that does not fit.</summary>
    public SectionTwistException Refusal(int? meshed = null)
    {
        double need = Math.Max(meshed is { } m ? (_options.EstimateError ? 4.0 * m : m) : _needed, MaxElements);
        return new SectionTwistException("memory-budget",
            $"{_profile.Name}: the analysis at accuracy {_accuracy.ToString("G2", CultureInfo.InvariantCulture)} needs {(need > MaxElements * 1.0001 ? "about" : "more than")} {need.ToString("G3", CultureInfo.InvariantCulture)} elements " +
            $"(about {Mb((long)Math.Min(need * BytesPerElement, long.MaxValue / 2))}), more than {Describe()} allows; ask for a coarser accuracy (--accuracy{Finest(need)}), raise --memory-budget MB, " +
            "or analyse one part (--part N, --layer NAME)");
    }

    /// <summary>
    /// " 3E-08 or coarser": the finest accuracy that fits, from the element count growing as accuracy^(-1/2) (element
    /// size h proportional to accuracy^(1/4), the J convergence order 4 of the smooth case; a singular corner needs
    /// fewer than that under adaptive refinement), with a margin of 1.5 and rounded up to one digit; empty when nothing
    /// practical fits.
    /// </summary>
    private string Finest(double need)
    {
        double ratio = need / MaxElements;
        double finest = Math.Max(AnalysisOptions.FinestAccuracy, _accuracy * 1.5 * ratio * ratio);
        if (!(finest < 0.1)) return "";
        double mag = Math.Pow(10, Math.Floor(Math.Log10(finest)));
        double up = Math.Ceiling(finest / mag * (1 - 1e-12)) * mag;
        return $" {Units.NumberText.Exponent(up, 1)} or coarser";
    }

    private static string Mb(long bytes) => $"{Math.Ceiling(bytes / (double)(1 << 20)).ToString("0", CultureInfo.InvariantCulture)} MB";
}
