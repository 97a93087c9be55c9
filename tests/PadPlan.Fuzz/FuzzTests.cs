using Xunit.Abstractions;

namespace PadPlan.Fuzz;

/// <summary>
/// The fuzz harness: damaged example projects, netlists and parts maps through the real command line. Every case must
/// exit 0, 1 or 2 (never 3, an internal fault), finish within the time limit, leave its input unchanged, and the whole
/// run must stay under the memory limit (the process's peak working set bounds every case's own).
/// </summary>
public sealed class FuzzTests(ITestOutputHelper output)
{
    [Fact]
    public void Damaged_inputs_never_crash_hang_blow_up_or_change_the_input()
    {
        var settings = FuzzSettings.FromEnvironment();
        var summary = new FuzzRunner(settings).Run();
        var report = $"fuzz seed {settings.Seed}: {settings.Cases} cases in {summary.Elapsed.TotalSeconds:0.0} s; exit 0: {summary.Count(0)}, 1: {summary.Count(1)}, 2: {summary.Count(2)}, " +
                     $"other: {summary.Cases.Count(c => c.ExitCode is not (0 or 1 or 2))} (known faults elsewhere: {summary.Known.Count()}); slowest {summary.Slowest.TotalSeconds:0.0} s (limit {summary.CaseTimeout.TotalSeconds:0} s); peak working set {summary.PeakWorkingSet / (1024 * 1024)} MB";
        output.WriteLine(report);
        foreach (var known in summary.Known) output.WriteLine($"known fault ({known.Known}): {known}");
        if (Environment.GetEnvironmentVariable("PADPLAN_FUZZ_REPORT") is { } reportFile)
            File.AppendAllText(reportFile, report + "\n" + string.Join("\n", summary.Failures.Concat(summary.Known).Select(f => $"{f} {f.Known}")) + "\n");
        var failures = summary.Failures.ToList();
        Assert.True(failures.Count == 0, $"{failures.Count} case(s) failed:\n" + string.Join("\n", failures.Take(20)));
        Assert.True(summary.PeakWorkingSet < settings.MemoryLimitBytes, $"peak working set {summary.PeakWorkingSet / (1024 * 1024)} MB");
    }
}
