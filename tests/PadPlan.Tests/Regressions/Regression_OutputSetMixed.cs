using System.Diagnostics;
using PadPlan.IO;
using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>
/// Regression (issue 25): output sets were not replaced whole. A kill just after the first file moved into place left
/// 24 new and 37 old sheets; a run with fewer pages left the old set's extra pages; cutlist's CSV files were written one
/// by one, so a full disk left the first new file beside the old others. The set is now written into a new folder and
/// swapped in with renames (IO/OutputSet), CSV files are all written before any is renamed (AtomicFile.WriteAll), and
/// every step has a fault point: killed (a child process stopped at the step) or failed (an injected exception) at any
/// step, a reader finds the whole old set, no folder for an instant, or the whole new set, and the next run cleans up.
/// </summary>
public sealed class Regression_OutputSetMixed
{
    private static readonly string[] SetSteps = ["set.file-written", "set.staged", "set.old-aside", "set.new-in-place"];

    [Fact]
    public void A_run_with_fewer_files_leaves_none_of_the_old_set()
    {
        var (file, outDir) = Fixture();
        Assert.Equal(0, Sheets(file, outDir, "2025-01-01", "svg,png").ExitCode);
        Assert.NotEmpty(Directory.GetFiles(outDir, "*.png"));
        Assert.Equal(0, Sheets(file, outDir, "2025-01-01", "svg").ExitCode);
        Assert.Empty(Directory.GetFiles(outDir, "*.png"));
        Assert.Equal(File.ReadAllLines(Path.Combine(outDir, OutputSet.ListName)).Order(StringComparer.Ordinal), Names(outDir));
    }

    [Fact]
    public void A_folder_holding_the_users_own_files_is_refused_and_kept_as_it_is()
    {
        var (file, outDir) = Fixture();
        Assert.Equal(0, Sheets(file, outDir, "2025-01-01", "svg").ExitCode);
        File.WriteAllText(Path.Combine(outDir, "my-notes.txt"), "mine");
        var before = Snapshot(outDir);
        var result = Sheets(file, outDir, "2026-06-30", "svg");
        Assert.Equal(2, result.ExitCode);
        Assert.Contains("\"my-notes.txt\"", result.Err, StringComparison.Ordinal);
        Assert.Contains("did not write", result.Err, StringComparison.Ordinal);
        AssertSame(before, outDir);
        // the same for a folder of the user's that PadPlan never wrote into
        var own = Path.Combine(Path.GetDirectoryName(file)!, "mine");
        Directory.CreateDirectory(own);
        File.WriteAllText(Path.Combine(own, "letter.txt"), "mine");
        Assert.Equal(2, Sheets(file, own, "2025-01-01", "svg").ExitCode);
        Assert.Equal(["letter.txt"], Names(own));
    }

    [Theory]
    [InlineData("set.file-written")]
    [InlineData("set.staged")]
    [InlineData("set.old-aside")]
    public void A_failure_at_any_step_leaves_the_old_set_whole(string step)
    {
        var (file, outDir) = Fixture();
        Assert.Equal(0, Sheets(file, outDir, "2025-01-01", "svg").ExitCode);
        var before = Snapshot(outDir);
        CliRunner.Result result;
        using (FaultPoint.Inject(s => s == step ? new IOException("No space left on device") : null))
            result = Sheets(file, outDir, "2026-06-30", "svg");
        Assert.Equal(2, result.ExitCode);
        Assert.Contains("No space left on device", result.Err, StringComparison.Ordinal);
        AssertSame(before, outDir);
        Assert.Empty(Directory.GetFileSystemEntries(Path.GetDirectoryName(outDir)!, ".sheets.*"));
    }

    [Theory]
    [InlineData("set.file-written")]
    [InlineData("set.staged")]
    [InlineData("set.old-aside")]
    [InlineData("set.new-in-place")]
    public void A_kill_at_any_step_leaves_a_whole_set_or_none_and_the_next_run_mends_it(string step)
    {
        Assert.Contains(step, SetSteps);
        var (file, outDir) = Fixture();
        Assert.Equal(0, Sheets(file, outDir, "2025-01-01", "svg").ExitCode);
        var old = Snapshot(outDir);
        var killed = Child(step, "sheets", file, "-o", outDir, "--formats", "svg", "--date", "2026-06-30");
        Assert.NotEqual(0, killed);
        // What a reader finds after the kill: the whole old set, no folder (between the two renames), or the whole new set.
        if (step == "set.old-aside") Assert.False(Directory.Exists(outDir));
        else if (step == "set.new-in-place")
        {
            var now = Snapshot(outDir);
            Assert.Equal(old.Keys.Order(StringComparer.Ordinal), now.Keys.Order(StringComparer.Ordinal));
            Assert.Contains(now, kv => !old[kv.Key].SequenceEqual(kv.Value)); // the new date is on the sheets
        }
        else AssertSame(old, outDir);
        // the old set left aside comes back whole before anything else happens
        if (step == "set.old-aside")
        {
            OutputSet.Begin(outDir).Dispose();
            AssertSame(old, outDir);
        }
        Assert.Equal(0, Sheets(file, outDir, "2026-06-30", "svg").ExitCode);
        Assert.Equal(File.ReadAllLines(Path.Combine(outDir, OutputSet.ListName)).Order(StringComparer.Ordinal), Names(outDir));
        Assert.Empty(Directory.GetFileSystemEntries(Path.GetDirectoryName(outDir)!, ".sheets.*"));
    }

    [Fact]
    public void A_csv_set_is_written_whole_or_not_at_all()
    {
        var (file, _) = Fixture();
        var csv = Path.Combine(Path.GetDirectoryName(file)!, "cuts.csv");
        Assert.Equal(0, CliRunner.Run("cutlist", file, "--csv", csv).ExitCode);
        var dir = Path.GetDirectoryName(csv)!;
        var before = Directory.GetFiles(dir, "cuts*.csv").ToDictionary(f => f, File.ReadAllBytes);
        Assert.Equal(3, before.Count);
        var written = 0;
        CliRunner.Result result;
        // the second file cannot be written (a full disk): the first, already written to its temporary file, must not replace the old one
        using (FaultPoint.Inject(s => s == "file.temp-written" && ++written == 2 ? new IOException("No space left on device") : null))
            result = CliRunner.Run("cutlist", file, "--csv", csv, "--kerf", "1");
        Assert.Equal(2, result.ExitCode);
        Assert.Contains("no file was written or changed", result.Err, StringComparison.Ordinal);
        foreach (var (path, bytes) in before) Assert.Equal(bytes, File.ReadAllBytes(path));
        Assert.Empty(Directory.GetFiles(dir, ".cuts*"));
    }

    private static (string File, string OutDir) Fixture()
    {
        var file = TestPaths.CopyOfTinyBuffer();
        return (file, Path.Combine(Path.GetDirectoryName(file)!, "sheets"));
    }

    private static CliRunner.Result Sheets(string file, string outDir, string date, string formats) =>
        CliRunner.Run("sheets", file, "-o", outDir, "--formats", formats, "--date", date);

    // padplan in a child process that stops at the step as a kill would (no cleanup runs)
    private static int Child(string step, params string[] args)
    {
        var start = new ProcessStartInfo("dotnet") { RedirectStandardError = true, RedirectStandardOutput = true };
        start.ArgumentList.Add(typeof(PadPlan.Cli.PadPlanCli).Assembly.Location);
        foreach (var a in args) start.ArgumentList.Add(a);
        start.Environment[FaultPoint.KillVariable] = step;
        start.Environment["DOTNET_DbgEnableMiniDump"] = "0";
        using var process = Process.Start(start)!;
        process.StandardOutput.ReadToEnd();
        process.StandardError.ReadToEnd();
        process.WaitForExit();
        return process.ExitCode;
    }

    private static List<string> Names(string dir) =>
        Directory.GetFiles(dir).Select(f => Path.GetFileName(f)!).Where(n => n != OutputSet.ListName).Order(StringComparer.Ordinal).ToList();

    private static Dictionary<string, byte[]> Snapshot(string dir) => FolderSnapshot.Of(dir);

    private static void AssertSame(Dictionary<string, byte[]> before, string dir) => FolderSnapshot.AssertSame(before, dir);
}
