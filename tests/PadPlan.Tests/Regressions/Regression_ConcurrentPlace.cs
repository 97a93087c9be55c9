using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>Regression: two place runs on one file both reported "placed" and one result was lost without a word.</summary>
public sealed class Regression_ConcurrentPlace
{
    [Fact]
    public async Task Of_two_concurrent_place_runs_one_succeeds_and_one_exits_2()
    {
        var file = TestPaths.CopyOfTinyBuffer();
        using var start = new Barrier(2);
        var runs = Enumerable.Range(0, 2).Select(i => Task.Run(() =>
        {
            start.SignalAndWait();
            return CliRunner.Run("place", file, "--force", "--effort", "normal", "--seed", $"{i + 1}", "-q");
        })).ToArray();
        var results = await Task.WhenAll(runs);
        var codes = results.Select(r => r.ExitCode).Order().ToArray();
        Assert.True(codes.SequenceEqual([0, 2]), string.Join("\n", results.Select(r => $"{r.ExitCode}: {r.Err}")));
        Assert.Contains("t.padplan.json is being changed by another padplan (pid", results.Single(r => r.ExitCode == 2).Err, StringComparison.Ordinal);
        Assert.False(File.Exists(file + PadPlan.IO.WriterLock.Suffix));
        PadPlan.ProjectFiles.ProjectFile.Read(file); // the winner's result is whole
    }
}
