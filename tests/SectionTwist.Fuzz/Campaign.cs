using System.Collections.Concurrent;
using System.Diagnostics;
using System.Globalization;
using System.Text;
using System.Text.Json;

namespace SectionTwist.Fuzz;

/// <summary>Settings of a long campaign.</summary>
public sealed record CampaignOptions
{
    /// <summary>Targets to run, in turn.</summary>
    public IReadOnlyList<string> Targets { get; init; } = ["dxf", "points", "shaft"];
    /// <summary>Total inputs over all targets.</summary>
    public long Count { get; init; } = 1_000_000;
    /// <summary>Campaign seed: the same seed makes the same inputs.</summary>
    public int Seed { get; init; } = 1;
    /// <summary>Output folder: summary.md, state.json, findings/.</summary>
    public string Out { get; init; } = "fuzz-out";
    /// <summary>Time budget of one input (cancellation), ms.</summary>
    public int BudgetMs { get; init; } = 5000;
    /// <summary>Seconds past the budget after which a worker that did not answer is ended (a hang).</summary>
    public int GraceSeconds { get; init; } = 10;
    /// <summary>Inputs per worker process.</summary>
    public int Batch { get; init; } = 20_000;
    /// <summary>Memory limit of a worker (GC hard limit and working-set watchdog), MB.</summary>
    public int MemoryMb { get; init; } = 3072;
    /// <summary>Continue from state.json in <see cref="Out"/>.</summary>
    public bool Resume { get; init; }
    /// <summary>Targets run side by side (one worker each); 1 keeps the campaign on one core.</summary>
    public int Lanes { get; init; } = 1;
}

/// <summary>
/// The long campaign: runs batches of inputs in worker processes (one at a time), so that a stack overflow, fail-fast or
/// runaway allocation in one input ends only its worker; the parent records the input that was running, restarts the
/// worker after it, ends workers that pass the time budget plus grace (hang) or the memory limit (memory), saves every
/// offending input with a minimized copy, and keeps summary.md and state.json current.
/// </summary>
public sealed class Campaign(CampaignOptions o, TextWriter log)
{
    private sealed class State
    {
        public Dictionary<string, long> Next { get; set; } = [];
        public Dictionary<string, Dictionary<string, long>> Counts { get; set; } = [];
        public double Seconds { get; set; }
        public List<string> Findings { get; set; } = [];
    }

    private State _state = new();
    // counts of batches still running; merged into the state when their batch ends, so that state.json (and --resume)
    // only ever holds whole batches
    private readonly Dictionary<string, Dictionary<string, long>> _running = [];
    // failures found while a worker runs are minimized after it ends: minimizing inside the read loop would stop reading
    // the worker's output, block it on a full pipe and let its input budget run out
    private readonly List<(string Target, long Index, Outcome Outcome)> _toMinimize = [];
    private readonly Stopwatch _clock = new();
    private double _previousSeconds;

    /// <summary>Runs the campaign; returns the number of failing inputs (crash, non-finite, memory, hang, death).</summary>
    public long Run(string commandLine)
    {
        Directory.CreateDirectory(Path.Combine(o.Out, "findings"));
        string statePath = Path.Combine(o.Out, "state.json");
        if (o.Resume && File.Exists(statePath)) _state = JsonSerializer.Deserialize<State>(File.ReadAllText(statePath)) ?? new State();
        _previousSeconds = _state.Seconds;
        foreach (var t in o.Targets) { _state.Next.TryAdd(t, 0); _state.Counts.TryAdd(t, []); }
        _clock.Start();
        long perTarget = o.Count / o.Targets.Count;
        var busy = new HashSet<string>();
        // a lane takes the free target with the fewest inputs done, runs one batch of it, and repeats: the targets
        // advance together; a lane ends when every target left is finished or taken by another lane
        void Lane()
        {
            while (true)
            {
                string? t;
                long next;
                lock (_state)
                {
                    t = o.Targets.Where(x => !busy.Contains(x) && _state.Next[x] < perTarget).OrderBy(x => _state.Next[x]).FirstOrDefault();
                    if (t is null) return;
                    busy.Add(t);
                    next = _state.Next[t];
                }
                long end = Math.Min(perTarget, next + o.Batch);
                while (next < end) next = RunBatch(t, next, end);
                lock (_state)
                {
                    Commit(t);
                    _state.Next[t] = end;
                    busy.Remove(t);
                    _state.Seconds = _previousSeconds + _clock.Elapsed.TotalSeconds;
                    File.WriteAllText(statePath, JsonSerializer.Serialize(_state));
                    WriteSummary(commandLine, perTarget);
                }
            }
        }
        Task.WaitAll([.. Enumerable.Range(0, Math.Max(1, o.Lanes)).Select(_ => Task.Factory.StartNew(Lane, TaskCreationOptions.LongRunning))]);
        lock (_state) WriteSummary(commandLine, perTarget);
        return _state.Counts.Values.Sum(c => c.Where(kv => Outcomes.Parse(kv.Key).IsFailure()).Sum(kv => kv.Value));
    }

    /// <summary>Runs [from, end) in one worker; returns where the next worker starts (after an input that ended the worker).</summary>
    private long RunBatch(string target, long from, long end)
    {
        using var p = StartWorker(["worker", "--target", target, "--seed", I(o.Seed), "--from", I(from), "--count", I(end - from), "--budget-ms", I(o.BudgetMs)]);
        var lines = new BlockingCollection<string>();
        var reader = Task.Run(() =>
        {
            string? l;
            while ((l = p.StandardOutput.ReadLine()) is not null) lines.Add(l);
            lines.CompleteAdding();
        });
        var errTail = new ConcurrentQueue<string>();
        p.ErrorDataReceived += (_, e) => { if (e.Data is { } d) { errTail.Enqueue(d); while (errTail.Count > 20 && errTail.TryDequeue(out string? _)) { } } };
        p.BeginErrorReadLine();
        long? current = null;
        long last = from - 1;
        var started = Stopwatch.StartNew();
        var cpuAtStart = TimeSpan.Zero;
        var memCheck = Stopwatch.StartNew();
        Outcome? killedFor = null;
        while (true)
        {
            if (lines.TryTake(out var line, 200))
            {
                if (line.StartsWith("> ", StringComparison.Ordinal)) { current = long.Parse(line[2..], CultureInfo.InvariantCulture); started.Restart(); cpuAtStart = CpuTime(p); }
                else if (line.StartsWith("< ", StringComparison.Ordinal))
                {
                    var parts = line.Split(' ', 5);
                    long i = long.Parse(parts[1], CultureInfo.InvariantCulture);
                    var outcome = Outcomes.Parse(parts[2]);
                    Count(target, outcome);
                    if (outcome.IsFailure() || outcome == Outcome.Slow) Save(target, i, outcome, parts.Length > 4 ? parts[4] : "");
                    current = null; last = i;
                }
                continue;
            }
            if (lines.IsCompleted) break;
            // a hang is an input that keeps the worker busy past the budget plus grace: counted in the worker's processor
            // time, so that a worker starved by other work on a shared machine is not taken for a hang; a worker that
            // sits idle on one input for ten times as long (a wait that never ends) is a hang too
            double limitMs = o.BudgetMs + 1000.0 * o.GraceSeconds;
            if (current is not null && started.Elapsed.TotalMilliseconds > limitMs &&
                ((CpuTime(p) - cpuAtStart).TotalMilliseconds > limitMs || started.Elapsed.TotalMilliseconds > 10 * limitMs))
                killedFor = Outcome.Hang;
            else if (memCheck.ElapsedMilliseconds > 500)
            {
                memCheck.Restart();
                p.Refresh();
                if (p.WorkingSet64 > (long)o.MemoryMb << 20) killedFor = Outcome.Memory;
            }
            if (killedFor is not null)
            {
                try { p.Kill(entireProcessTree: true); } catch (InvalidOperationException) { }
                break;
            }
        }
        p.WaitForExit();
        reader.Wait(5000);
        long resume = Math.Max(last + 1, end);
        if (current is { } c)
        {
            var outcome = killedFor ?? Outcome.Death;
            Count(target, outcome);
            Save(target, c, outcome, killedFor is null ? $"worker exit code {p.ExitCode}: {string.Join(" | ", errTail.TakeLast(3))}" : $"worker ended by the {outcome.Name()} watchdog");
            resume = c + 1;
        }
        else if (p.ExitCode != 0 && last + 1 < end)
        {
            // died between inputs (should not happen): count the next input as the culprit
            Count(target, Outcome.Death);
            Save(target, last + 1, Outcome.Death, $"worker exit code {p.ExitCode} between inputs");
            resume = last + 2;
        }
        MinimizePending(target);
        return resume;
    }

    private static TimeSpan CpuTime(Process p)
    {
        try { p.Refresh(); return p.TotalProcessorTime; }
        catch (InvalidOperationException) { return TimeSpan.Zero; }
    }

    private Process StartWorker(IReadOnlyList<string> args)
    {
        string host = Environment.ProcessPath ?? "dotnet";
        var psi = new ProcessStartInfo(host) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        if (Path.GetFileNameWithoutExtension(host).Equals("dotnet", StringComparison.OrdinalIgnoreCase))
            psi.ArgumentList.Add(typeof(Campaign).Assembly.Location);
        foreach (var a in args) psi.ArgumentList.Add(a);
        psi.Environment["DOTNET_GCHeapHardLimit"] = "0x" + ((long)o.MemoryMb << 20).ToString("X", CultureInfo.InvariantCulture);
        psi.Environment["DOTNET_gcServer"] = "0";
        psi.Environment["DOTNET_PROCESSOR_COUNT"] = "1";
        return Process.Start(psi) ?? throw new InvalidOperationException("cannot start a worker process");
    }

    private void Count(string target, Outcome outcome)
    {
        lock (_state)
        {
            if (!_running.TryGetValue(target, out var c)) _running[target] = c = [];
            c[outcome.Name()] = c.GetValueOrDefault(outcome.Name()) + 1;
        }
    }

    /// <summary>Adds the counts of the batch of <paramref name="target"/> that just ended to the state (call under the lock).</summary>
    private void Commit(string target)
    {
        if (!_running.Remove(target, out var c)) return;
        var s = _state.Counts[target];
        foreach (var (k, v) in c) s[k] = s.GetValueOrDefault(k) + v;
    }

    private void Save(string target, long index, Outcome outcome, string message)
    {
        var t = FuzzTarget.Get(target);
        string name = $"{outcome.Name()}-{target}-{index}";
        string path = Path.Combine(o.Out, "findings", name + t.Extension);
        var input = Runner.Make(target, o.Seed, index);
        File.WriteAllBytes(path, input);
        string entry = $"{name}: {message}";
        lock (_state)
        {
            if (outcome.IsFailure() && _toMinimize.Count(x => x.Target == target) < 20) _toMinimize.Add((target, index, outcome));
            if (_state.Findings.Count < 2000) _state.Findings.Add(entry);
            log.WriteLine(entry);
        }
    }

    /// <summary>Minimizes the failures this target's last worker found (bounded replays each), saving NAME.min.EXT beside them.</summary>
    private void MinimizePending(string target)
    {
        List<(string Target, long Index, Outcome Outcome)> mine;
        lock (_state)
        {
            mine = _toMinimize.Where(x => x.Target == target).ToList();
            _toMinimize.RemoveAll(x => x.Target == target);
        }
        var t = FuzzTarget.Get(target);
        foreach (var (_, index, outcome) in mine)
        {
            var input = Runner.Make(target, o.Seed, index);
            var min = Minimizer.Minimize(input, candidate => Replay(target, candidate) == outcome);
            File.WriteAllBytes(Path.Combine(o.Out, "findings", $"{outcome.Name()}-{target}-{index}.min{t.Extension}"), min);
            lock (_state) log.WriteLine($"{outcome.Name()}-{target}-{index}: minimized {input.Length} -> {min.Length} bytes");
        }
    }

    /// <summary>Runs one candidate in a fresh worker, with the same watchdogs; returns its outcome.</summary>
    private Outcome Replay(string target, byte[] input)
    {
        string file = Path.Combine(o.Out, "findings", $"replay-{target}.tmp");
        File.WriteAllBytes(file, input);
        using var p = StartWorker(["replay", "--target", target, "--file", file, "--budget-ms", I(o.BudgetMs)]);
        p.BeginErrorReadLine();
        var output = p.StandardOutput.ReadLineAsync();
        if (!p.WaitForExit(o.BudgetMs + 1000 * o.GraceSeconds))
        {
            try { p.Kill(entireProcessTree: true); } catch (InvalidOperationException) { }
            p.WaitForExit();
            return Outcome.Hang;
        }
        string? line = output.Wait(1000) ? output.Result : null;
        if (p.ExitCode != 0 || line is null) return Outcome.Death;
        return Outcomes.Parse(line.Split(' ')[0]);
    }

    private void WriteSummary(string commandLine, long perTarget)
    {
        double seconds = _previousSeconds + _clock.Elapsed.TotalSeconds;
        long total = _state.Counts.Values.Sum(c => c.Values.Sum());
        var names = Enum.GetValues<Outcome>().Select(x => x.Name()).ToArray();
        var b = new StringBuilder();
        b.AppendLine("# Fuzz campaign summary").AppendLine();
        b.AppendLine(CultureInfo.InvariantCulture, $"command: `{commandLine}`  ");
        b.AppendLine(CultureInfo.InvariantCulture, $"seed {o.Seed}, budget {o.BudgetMs} ms per input (+{o.GraceSeconds} s grace), worker memory limit {o.MemoryMb} MB, {perTarget} inputs per target planned  ");
        b.AppendLine(CultureInfo.InvariantCulture, $"inputs run: {total} in {seconds:F0} s ({(seconds > 0 ? total / seconds : 0):F0} per s); updated {DateTime.UtcNow:yyyy-MM-dd HH:mm} UTC").AppendLine();
        b.AppendLine($"| target | {string.Join(" | ", names)} | total |");
        b.AppendLine($"|---|{string.Concat(names.Select(_ => "---|"))}---|");
        foreach (var (t, c) in _state.Counts)
            b.AppendLine(CultureInfo.InvariantCulture, $"| {t} | {string.Join(" | ", names.Select(n => c.GetValueOrDefault(n)))} | {c.Values.Sum()} |");
        b.AppendLine(CultureInfo.InvariantCulture, $"| all | {string.Join(" | ", names.Select(n => _state.Counts.Values.Sum(c => c.GetValueOrDefault(n))))} | {total} |");
        b.AppendLine().AppendLine("findings (slow inputs are listed but are not failures):");
        foreach (var f in _state.Findings.Take(300)) b.AppendLine("- " + f);
        File.WriteAllText(Path.Combine(o.Out, "summary.md"), b.ToString());
    }

    private static string I(long v) => v.ToString(CultureInfo.InvariantCulture);
}
