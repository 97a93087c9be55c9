using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>Regression: two place runs on one file both reported "placed" and one result was lost without a word.</summary>
public sealed class Regression_ConcurrentPlace
{
    [Fact]
    public void A_place_run_started_while_another_holds_the_file_exits_2_and_the_first_one_wins()
    {
        var file = TestPaths.CopyOfTinyBuffer();
        var lockFile = file + PadPlan.IO.WriterLock.Suffix;
        // The first run works long enough (thorough effort) that the second one surely starts while it holds the file;
        // the second starts only once the lock is seen, so a loaded machine cannot turn the race into two runs in a row. The
        // first run has a thread of its own and the watch is kept on the test's own thread: with other tests' placements
        // filling the thread pool, a pooled watcher was not woken until the first run had finished (seen once in a full run).
        CliRunner.Result? winner = null;
        var first = new Thread(() => winner = CliRunner.Run("place", file, "--force", "--effort", "thorough", "--seed", "1", "-q")) { IsBackground = true };
        first.Start();
        var waited = System.Diagnostics.Stopwatch.StartNew();
        while (!File.Exists(lockFile) && first.IsAlive && waited.Elapsed < TimeSpan.FromMinutes(2)) Thread.Sleep(2);
        Assert.True(File.Exists(lockFile), "the first place run never took the lock");
        var second = CliRunner.Run("place", file, "--force", "--effort", "quick", "--seed", "2", "-q");
        first.Join();
        Assert.True(winner is { ExitCode: 0 }, winner?.Err);
        Assert.Equal(2, second.ExitCode);
        Assert.Contains("t.padplan.json is being changed by another padplan (pid", second.Err, StringComparison.Ordinal);
        Assert.False(File.Exists(lockFile));
        PadPlan.ProjectFiles.ProjectFile.Read(file); // the winner's result is whole
    }
}
