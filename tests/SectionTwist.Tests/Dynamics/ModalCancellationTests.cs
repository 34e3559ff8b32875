using System.Diagnostics;
using SectionTwist.Dynamics;
using SectionTwist.Shaft;

namespace SectionTwist.Tests.Dynamics;

/// <summary>
/// The modal solve observes its cancellation token (library) and the CLI's --timeout (the <c>modes</c> command): a train
/// large enough to take seconds stops with OperationCanceledException, and the command with the one-line time-limit
/// message and exit code 2. (Behaviour checks; no numerical reference.)
/// </summary>
public class ModalCancellationTests
{
    /// <summary>A uniform round shaft of <paramref name="stations"/> stations, a disc at each: a dense problem of that size.</summary>
    private static DrivetrainModel Big(int stations)
    {
        var st = Enumerable.Range(0, stations).Select(i => new Station($"S{i}", 0.05 * i)).ToList();
        var seg = Enumerable.Range(0, stations - 1).Select(i => new ShaftSegment(st[i].Name, st[i + 1].Name, SectionStiffness.Round(0.05), TrainModels.Steel)).ToList();
        return new DrivetrainModel
        {
            Shafts = [new ShaftBranch("long", new ShaftModel { Stations = st, Segments = seg })],
            Inertias = [.. st.Select((s, i) => new PointInertia(s.Name, 0.01 + 0.001 * (i % 5)))],
        };
    }

    [Fact]
    public void A_cancelled_token_stops_the_modal_solve()
    {
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        Assert.ThrowsAny<OperationCanceledException>(() => ModalAnalysis.Solve(Big(20), new ModalOptions { ModeCount = 3 }, cts.Token));
    }

    [Fact]
    public void A_token_cancelled_during_the_eigen_solve_stops_it_early()
    {
        // 1500 stations, one element each: the dense reduction alone is some 1e10 operations (seconds); cancel after 0.2 s
        var model = Big(1500);
        var options = new ModalOptions { ModeCount = 10, ElementsPerSegment = 1 };
        using var cts = new CancellationTokenSource();
        var clock = Stopwatch.StartNew();
        CancelSoon.After(cts, 200);
        Assert.ThrowsAny<OperationCanceledException>(() => ModalAnalysis.Solve(model, options, cts.Token));
        Assert.True(clock.Elapsed < TimeSpan.FromSeconds(30), $"stopped after {clock.Elapsed.TotalSeconds:F1} s");
    }

    [Fact]
    public void Modes_command_stops_at_the_time_limit_with_one_line()
    {
        string dir = Path.Combine(Path.GetTempPath(), "st-modes-timeout-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        try
        {
            int n = 1500;
            var text = new System.Text.StringBuilder("units: {length: mm, torque: N*m}\nstations:\n");
            for (int i = 0; i < n; i++) text.Append($"  - {{name: S{i}, at: {50 * i}}}\n");
            text.Append("segments:\n");
            for (int i = 0; i + 1 < n; i++) text.Append($"  - {{from: S{i}, to: S{i + 1}, section: {{round: 50}}, material: steel-s355}}\n");
            text.Append("supports: {fixed: [S0]}\ndynamics:\n  modes: 10\n  inertias:\n");
            for (int i = 0; i < n; i++) text.Append($"    - {{at: S{i}, inertia: 0.01 kg*m^2}}\n");
            string path = Path.Combine(dir, "long.yaml");
            File.WriteAllText(path, text.ToString());
            // a limit far below the run's length (about 1 s), so a fast machine cannot finish before it
            var (code, _, err) = SectionTwist.Tests.Cli.CliRunner.Run("modes", path, "--timeout", "0.05");
            Assert.Equal(2, code);
            Assert.Contains("stopped at the time limit of 0.05 s", err, StringComparison.Ordinal);
            Assert.DoesNotContain("   at ", err, StringComparison.Ordinal);
        }
        finally { try { Directory.Delete(dir, true); } catch (IOException) { } }
    }
}
