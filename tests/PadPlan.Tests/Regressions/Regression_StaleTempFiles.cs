using System.Diagnostics;
using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>Regression: a kill during a write left stale ".tmp" files that nothing removed.</summary>
public sealed class Regression_StaleTempFiles
{
    private static int EndedPid()
    {
        using var ended = Process.Start(new ProcessStartInfo("sh", "-c true") { UseShellExecute = false })!;
        ended.WaitForExit();
        return ended.Id;
    }

    [Fact]
    public void Place_removes_temp_files_of_killed_runs_and_keeps_those_of_running_ones()
    {
        var file = TestPaths.CopyOfTinyBuffer();
        var dir = Path.GetDirectoryName(file)!;
        var stale = Path.Combine(dir, $".t.padplan.json.{EndedPid()}.{Guid.NewGuid():N}.tmp");
        var live = Path.Combine(dir, $".t.padplan.json.{Environment.ProcessId}.{Guid.NewGuid():N}.tmp");
        var other = Path.Combine(dir, "notes.tmp");
        foreach (var f in new[] { stale, live, other }) File.WriteAllText(f, "half");
        var result = CliRunner.Run("place", file, "--force", "--effort", "quick", "-q");
        Assert.True(result.ExitCode is 0 or 1, result.Err);
        Assert.False(File.Exists(stale));
        Assert.True(File.Exists(live));
        Assert.True(File.Exists(other)); // not a name padplan makes
    }

    [Fact]
    public void Sheets_removes_a_staging_folder_left_by_a_killed_run()
    {
        var file = TestPaths.CopyOfTinyBuffer();
        var dir = Path.GetDirectoryName(file)!;
        var staging = Path.Combine(dir, $".out.{EndedPid()}.{Guid.NewGuid():N}.tmp");
        Directory.CreateDirectory(staging);
        File.WriteAllText(Path.Combine(staging, "template-1.svg"), "<svg");
        var result = CliRunner.Run("sheets", file, "-o", Path.Combine(dir, "out"), "--formats", "svg", "--date", "2025-01-01");
        Assert.True(result.ExitCode == 0, result.Err);
        Assert.False(Directory.Exists(staging));
        Assert.Empty(Directory.GetDirectories(dir, ".*"));
    }
}
