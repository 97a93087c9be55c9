using System.Diagnostics;
using PadPlan.Cli;

namespace PadPlan.Fuzz;

/// <summary>
/// Runs fuzz cases in-process through the real command line (<see cref="PadPlanCli.Run"/>), one at a time so that each
/// case's peak memory and CPU time can be measured (<see cref="CaseMeter"/>), each on its own damaged copy in its own
/// folder, and judges each: exit 0, 1 or 2 (never 3), within the memory and CPU limits, not hung, the input file
/// unchanged, and any project a command wrote accepted by `check`. The <see cref="EdgeCases"/> run first, under the same
/// limits.
/// </summary>
public sealed class FuzzRunner(FuzzSettings settings)
{
    public sealed record Summary(IReadOnlyList<FuzzCase> Cases, IReadOnlyList<FuzzCase> Edges, long PeakWorkingSet, TimeSpan Elapsed, TimeSpan CaseTimeout)
    {
        public IEnumerable<FuzzCase> Failures => Edges.Concat(Cases).Where(c => c.Problem is not null);
        public int Count(int exit) => Cases.Count(c => c.ExitCode == exit);
        public TimeSpan Slowest => Cases.Max(c => c.Duration);
        public TimeSpan MostCpu => Cases.Max(c => c.Cpu);
        public long MostMemory => Cases.Max(c => c.PeakBytes);
        public IEnumerable<FuzzCase> Known => Cases.Where(c => c.Known is not null);
    }

    public Summary Run()
    {
        var corpus = Corpus.Load();
        var work = Path.Combine(Path.GetTempPath(), "padplan-fuzz", $"{settings.Seed}-{Guid.NewGuid():N}");
        Directory.CreateDirectory(work);
        var timeout = CaseTimeout(work);
        var clock = Stopwatch.StartNew();
        var edges = RunEdges(Path.Combine(work, "edges"), timeout);
        var results = new FuzzCase[settings.Cases];
        for (var i = 0; i < settings.Cases; i++) results[i] = RunCase(i, corpus, Path.Combine(work, i.ToString("D6")), timeout);
        var peak = Process.GetCurrentProcess().PeakWorkingSet64;
        try { Directory.Delete(work, recursive: true); } catch (IOException) { } // a timed-out case may still be writing
        return new Summary(results, edges, peak, clock.Elapsed, timeout);
    }

    /// <summary>
    /// The time limit of a case: the settings' limit, or 10 times what placing the unchanged fixture takes right now if
    /// that is longer. A hang is judged against this machine's speed at this moment, so a busy machine (shared CI
    /// runners, parallel builds) does not turn slow but finite runs into false hangs. Also warms up the JIT.
    /// </summary>
    private TimeSpan CaseTimeout(string work)
    {
        var fixture = Path.Combine(work, "calibration.padplan.json");
        File.Copy(Path.Combine(Corpus.Examples, "tiny-buffer", "tiny-buffer.padplan.json"), fixture);
        var clock = Stopwatch.StartNew();
        PadPlanCli.Run(["place", fixture, "--force", "--effort", "quick", "-q"], TextWriter.Null, TextWriter.Null);
        var reference = clock.Elapsed;
        return reference * 10 > settings.CaseTimeout ? reference * 10 : settings.CaseTimeout;
    }

    private FuzzCase RunCase(int index, IReadOnlyList<Corpus.Seed> corpus, string dir, TimeSpan timeout)
    {
        // one generator per case, so any case can be rerun alone from the seed and its index
        // (not HashCode.Combine: it is seeded afresh in every process)
        var random = new Random(unchecked(settings.Seed * 1_000_003 + index * 7919) & int.MaxValue);
        var seed = corpus[random.Next(corpus.Count)];
        var (bytes, damage) = new Mutator(random).Mutate(seed.Bytes, json: seed.Kind != "netlist");
        Directory.CreateDirectory(dir);
        var (input, args) = Arrange(seed, bytes, dir, random);
        var fuzzCase = new FuzzCase(index, seed.Name, damage, string.Join(' ', args.Select(a => a.StartsWith(dir, StringComparison.Ordinal) ? Path.GetFileName(a) : a)));
        var before = File.ReadAllBytes(input);
        fuzzCase = Measured(fuzzCase, args, timeout);
        if (fuzzCase.Problem is not null) return Keep(fuzzCase, bytes);
        var code = fuzzCase.ExitCode;
        string? problem = null;
        if (code is not (0 or 1 or 2))
        {
            if (KnownFaults.Match(fuzzCase.Err) is { } known) return fuzzCase with { Known = known };
            problem = $"exit {code}: {fuzzCase.Err}";
        }
        else if (args[0] != "place" || code != 0)
        {
            if (!before.AsSpan().SequenceEqual(File.ReadAllBytes(input))) problem = "the input file was changed";
        }
        problem ??= Bounds(fuzzCase);
        // Anything written reads back: a project that import or place wrote is accepted by check (exit 0 or 1).
        if (code == 0 && WrittenProject(args) is { } written) problem ??= CheckAccepts(written);
        if (code is 2 && fuzzCase.Err.Length == 0) problem ??= "exit 2 without a message";
        if (problem is null) TryDelete(dir);
        return problem is null ? fuzzCase : Keep(fuzzCase with { Problem = problem }, bytes);
    }

    /// <summary>Runs one command, measured; a hang is a problem, the rest is judged by the caller.</summary>
    private static FuzzCase Measured(FuzzCase fuzzCase, string[] args, TimeSpan timeout)
    {
        var err = new StringWriter();
        var meter = CaseMeter.Start();
        var run = Task.Factory.StartNew(() => PadPlanCli.Run(args, TextWriter.Null, err), TaskCreationOptions.LongRunning);
        if (!run.Wait(timeout))
        {
            var late = meter();
            return fuzzCase with { Duration = late.Wall, Cpu = late.Cpu, PeakBytes = late.PeakBytes, Problem = $"still running after {timeout.TotalSeconds:0} s" };
        }
        var reading = meter();
        return fuzzCase with { ExitCode = run.Result, Duration = reading.Wall, Cpu = reading.Cpu, PeakBytes = reading.PeakBytes, Err = Shorten(err.ToString()) };
    }

    /// <summary>The memory and CPU bounds every command keeps on an input inside the limits (issue 25).</summary>
    private string? Bounds(FuzzCase c) =>
        c.PeakBytes > settings.MemoryLimitBytes ? $"peak memory {c.PeakBytes / (1024 * 1024)} MB (limit {settings.MemoryLimitBytes / (1024 * 1024)} MB)"
        : c.Cpu > settings.CpuLimit ? $"CPU time {c.Cpu.TotalSeconds:0.0} s (limit {settings.CpuLimit.TotalSeconds:0} s)"
        : null;

    private static string? WrittenProject(string[] args) => args[0] switch
    {
        "import" => args[Array.IndexOf(args, "-o") + 1],
        "place" => args[1],
        _ => null,
    };

    private static string? CheckAccepts(string project)
    {
        var err = new StringWriter();
        var code = PadPlanCli.Run(["check", project], TextWriter.Null, err);
        return code is 0 or 1 ? null : $"{Path.GetFileName(project)} was written but check refuses it (exit {code}): {Shorten(err.ToString())}";
    }

    /// <summary>The edge cases, every command measured and judged like a fuzz case (its input was not damaged, so any exit but 3 is fine).</summary>
    private List<FuzzCase> RunEdges(string work, TimeSpan timeout)
    {
        var results = new List<FuzzCase>();
        foreach (var (edge, index) in EdgeCases.All.Select((e, i) => (e, i)))
        {
            var dir = Path.Combine(work, index.ToString("D2"));
            Directory.CreateDirectory(dir);
            foreach (var args in edge.Arrange(dir))
            {
                var c = Measured(new FuzzCase(-1 - index, edge.Name, "edge of the limits", string.Join(' ', args.Select(a => a.StartsWith(dir, StringComparison.Ordinal) ? Path.GetFileName(a) : a))), args, timeout);
                if (c.Problem is null && c.ExitCode is not (0 or 1 or 2)) c = c with { Problem = $"exit {c.ExitCode}: {c.Err}" };
                if (c.Problem is null && Bounds(c) is { } over) c = c with { Problem = over };
                if (c.Problem is null && c.ExitCode == 0 && WrittenProject(args) is { } written && CheckAccepts(written) is { } refused) c = c with { Problem = refused };
                results.Add(c);
            }
        }
        return results;
    }

    /// <summary>Writes the damaged input where the case runs, and picks the command.</summary>
    private static (string Input, string[] Args) Arrange(Corpus.Seed seed, byte[] bytes, string dir, Random random)
    {
        switch (seed.Kind)
        {
            case "netlist":
            {
                var netlist = Path.Combine(dir, seed.Name);
                File.WriteAllBytes(netlist, bytes);
                var args = new List<string> { "import", netlist, "-o", Path.Combine(dir, "out.padplan.json"), "-q" };
                if (seed.PartsMap is not null)
                {
                    File.WriteAllBytes(Path.Combine(dir, "parts.json"), seed.PartsMap);
                    args.AddRange(["--parts", Path.Combine(dir, "parts.json")]);
                }
                return (netlist, [.. args]);
            }
            case "parts-map":
            {
                var map = Path.Combine(dir, "parts.json");
                File.WriteAllBytes(map, bytes);
                var netlist = Directory.GetFiles(Corpus.Examples, "*.cir", SearchOption.AllDirectories).Order(StringComparer.Ordinal).First();
                return (map, ["import", netlist, "-o", Path.Combine(dir, "out.padplan.json"), "--parts", map, "-q"]);
            }
            default:
            {
                var project = Path.Combine(dir, seed.Name);
                File.WriteAllBytes(project, bytes);
                string[] args = random.Next(10) switch
                {
                    0 or 1 => ["place", project, "--force", "--effort", "quick", "--seed", random.Next(1, 100).ToString(System.Globalization.CultureInfo.InvariantCulture), "-q"],
                    2 => ["sheets", project, "-o", Path.Combine(dir, "sheets"), "--formats", "svg", "--date", "2025-01-01"],
                    3 => ["bom", project, "--csv", Path.Combine(dir, "bom.csv")],
                    4 => ["cutlist", project],
                    5 => ["testplan", project],
                    6 => ["export", project, "--geometry", Path.Combine(dir, "geometry.json")],
                    _ => ["check", project],
                };
                return (project, args);
            }
        }
    }

    private FuzzCase Keep(FuzzCase failed, byte[] bytes)
    {
        if (settings.KeepFailuresIn is { } keep)
        {
            Directory.CreateDirectory(keep);
            File.WriteAllBytes(Path.Combine(keep, $"case-{failed.Index:D6}-{failed.Source}"), bytes);
            File.WriteAllText(Path.Combine(keep, $"case-{failed.Index:D6}.txt"), failed + "\n" + failed.Err);
        }
        return failed;
    }

    private static string Shorten(string text) => text.Length <= 2000 ? text : text[..2000] + "…";

    private static void TryDelete(string dir)
    {
        try { Directory.Delete(dir, recursive: true); } catch (IOException) { } catch (UnauthorizedAccessException) { }
    }
}
