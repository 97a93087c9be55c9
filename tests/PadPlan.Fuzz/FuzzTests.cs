using Xunit.Abstractions;

namespace PadPlan.Fuzz;

/// <summary>
/// The fuzz harness: damaged example projects, netlists and parts maps, and inputs at the edges of the limits, through
/// the real command line. Every case must exit 0, 1 or 2 (never 3, an internal fault), keep within 1 GB peak memory and
/// 60 s of CPU time, not hang, leave its input unchanged, and any project it wrote must pass `check`'s reading.
/// </summary>
public sealed class FuzzTests(ITestOutputHelper output)
{
    [Fact]
    public void Damaged_inputs_never_crash_hang_blow_up_or_change_the_input()
    {
        var settings = FuzzSettings.FromEnvironment();
        var summary = new FuzzRunner(settings).Run();
        var report = $"fuzz seed {settings.Seed}: {settings.Cases} cases in {summary.Elapsed.TotalSeconds:0.0} s; exit 0: {summary.Count(0)}, 1: {summary.Count(1)}, 2: {summary.Count(2)}, " +
                     $"other: {summary.Cases.Count(c => c.ExitCode is not (0 or 1 or 2))} (known faults elsewhere: {summary.Known.Count()}); slowest {summary.Slowest.TotalSeconds:0.0} s wall (hang limit {summary.CaseTimeout.TotalSeconds:0} s), " +
                     $"most CPU {summary.MostCpu.TotalSeconds:0.0} s (limit {settings.CpuLimit.TotalSeconds:0} s), most memory {summary.MostMemory / (1024 * 1024)} MB (limit {settings.MemoryLimitBytes / (1024 * 1024)} MB); peak working set of the run {summary.PeakWorkingSet / (1024 * 1024)} MB\n" +
                     string.Join("\n", summary.Edges.Select(e => $"edge: {e.Source}: padplan {e.Command}: {e.Figures()}{(e.Problem is null ? "" : " PROBLEM: " + e.Problem)}"));
        output.WriteLine(report);
        foreach (var known in summary.Known) output.WriteLine($"known fault ({known.Known}): {known}");
        if (Environment.GetEnvironmentVariable("PADPLAN_FUZZ_REPORT") is { } reportFile)
            File.AppendAllText(reportFile, report + "\n" + string.Join("\n", summary.Failures.Concat(summary.Known).Select(f => $"{f} {f.Known}")) + "\n");
        var failures = summary.Failures.ToList();
        Assert.True(failures.Count == 0, $"{failures.Count} case(s) failed:\n" + string.Join("\n", failures.Take(20)));
        Assert.All(summary.Edges.Concat(summary.Cases).Where(c => c.Known is null), c =>
        {
            Assert.True(c.PeakBytes <= settings.MemoryLimitBytes, $"{c}: {c.Figures()}");
            Assert.True(c.Cpu <= settings.CpuLimit, $"{c}: {c.Figures()}");
        });
    }
}
