using System.Diagnostics;
using PadPlan.Cli;

namespace PadPlan.Fuzz;

/// <summary>
/// Runs fuzz cases in-process through the real command line (<see cref="PadPlanCli.Run"/>), two at a time, each on its
/// own damaged copy in its own folder, and judges each: exit 0, 1 or 2 (never 3), within the time limit, and the input
/// file unchanged (a successful place may rewrite its project, which must then read back).
/// </summary>
public sealed class FuzzRunner(FuzzSettings settings)
{
    public sealed record Summary(IReadOnlyList<FuzzCase> Cases, long PeakWorkingSet, TimeSpan Elapsed, TimeSpan CaseTimeout)
    {
        public IEnumerable<FuzzCase> Failures => Cases.Where(c => c.Problem is not null);
        public int Count(int exit) => Cases.Count(c => c.ExitCode == exit);
        public TimeSpan Slowest => Cases.Max(c => c.Duration);
        public IEnumerable<FuzzCase> Known => Cases.Where(c => c.Known is not null);
    }

    public Summary Run()
    {
        var corpus = Corpus.Load();
        var work = Path.Combine(Path.GetTempPath(), "padplan-fuzz", $"{settings.Seed}-{Guid.NewGuid():N}");
        Directory.CreateDirectory(work);
        var timeout = CaseTimeout(work);
        var clock = Stopwatch.StartNew();
        var results = new FuzzCase[settings.Cases];
        Parallel.For(0, settings.Cases, new ParallelOptions { MaxDegreeOfParallelism = Math.Max(1, Environment.ProcessorCount) },
            i => results[i] = RunCase(i, corpus, Path.Combine(work, i.ToString("D6")), timeout));
        var peak = Process.GetCurrentProcess().PeakWorkingSet64;
        try { Directory.Delete(work, recursive: true); } catch (IOException) { } // a timed-out case may still be writing
        return new Summary(results, peak, clock.Elapsed, timeout);
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
        var err = new StringWriter();
        var clock = Stopwatch.StartNew();
        var run = Task.Factory.StartNew(() => PadPlanCli.Run(args, TextWriter.Null, err), TaskCreationOptions.LongRunning);
        if (!run.Wait(timeout))
            return Keep(fuzzCase with { Duration = clock.Elapsed, Problem = $"still running after {timeout.TotalSeconds:0} s" }, bytes);
        var code = run.Result;
        fuzzCase = fuzzCase with { ExitCode = code, Duration = clock.Elapsed, Err = Shorten(err.ToString()) };
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
        else
        {
            try { ProjectFiles.ProjectFile.Read(input); }
            catch (IO.InputException e) { problem = $"place wrote a project that does not read back: {e.Describe()}"; }
        }
        if (code is 2 && fuzzCase.Err.Length == 0) problem ??= "exit 2 without a message";
        if (problem is null) TryDelete(dir);
        return problem is null ? fuzzCase : Keep(fuzzCase with { Problem = problem }, bytes);
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
