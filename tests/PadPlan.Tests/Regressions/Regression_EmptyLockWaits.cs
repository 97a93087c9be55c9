using PadPlan.IO;
using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>
/// Regression (issue 25): after a run ran out of space, the empty ".lock" it left made the next run say "try again" for
/// 2 s. A lock file now appears with its owner already written (temporary file, then a link to the lock's name), so an
/// empty or unreadable lock is stale and taken over at once.
/// </summary>
public sealed class Regression_EmptyLockWaits
{
    [Theory]
    [InlineData("")]
    [InlineData("garbage\n")]
    public void A_fresh_lock_without_an_owner_is_taken_over_at_once(string content)
    {
        var file = TestPaths.CopyOfTinyBuffer();
        File.WriteAllText(file + WriterLock.Suffix, content);
        var result = CliRunner.Run("place", file, "--force", "--effort", "quick", "-q");
        Assert.True(result.ExitCode == 0, result.Err);
        Assert.False(File.Exists(file + WriterLock.Suffix));
        Assert.Empty(Directory.GetFiles(Path.GetDirectoryName(file)!, ".*"));
    }

    [Fact]
    public void A_lock_is_never_seen_without_its_owner()
    {
        var file = TestPaths.CopyOfTinyBuffer();
        using var held = WriterLock.Take(file);
        var text = File.ReadAllText(held.LockPath);
        Assert.StartsWith($"{Environment.ProcessId}\n", text, StringComparison.Ordinal);
    }
}
