using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>Regression: when sheets failed part-way it had already replaced some of the old files.</summary>
public sealed class Regression_SheetsPartWay
{
    [Fact]
    public void A_failed_sheets_run_leaves_the_old_set_byte_identical()
    {
        var file = TestPaths.CopyOfTinyBuffer();
        var dir = Path.GetDirectoryName(file)!;
        var outDir = Path.Combine(dir, "sheets");
        Assert.Equal(0, CliRunner.Run("sheets", file, "-o", outDir, "--formats", "svg,pdf", "--date", "2025-01-01").ExitCode);
        var old = Directory.GetFiles(outDir).Order(StringComparer.Ordinal).ToDictionary(f => f, File.ReadAllBytes);

        // the last file of the set cannot be replaced; every other one could, but none may change
        var last = old.Keys.Order(StringComparer.Ordinal).Last();
        if (OperatingSystem.IsWindows()) File.SetAttributes(last, FileAttributes.ReadOnly);
        else File.SetUnixFileMode(last, UnixFileMode.UserRead);
        var result = CliRunner.Run("sheets", file, "-o", outDir, "--formats", "svg,pdf", "--date", "2026-06-30");
        Assert.Equal(2, result.ExitCode);
        Assert.Contains(Path.GetFileName(last), result.Err, StringComparison.Ordinal);
        foreach (var (path, bytes) in old) Assert.Equal(bytes, File.ReadAllBytes(path));
        Assert.Equal(old.Keys, Directory.GetFiles(outDir).Order(StringComparer.Ordinal));
        Assert.Empty(Directory.GetDirectories(dir, ".*"));
    }

    [Fact]
    public void A_successful_run_replaces_the_whole_set()
    {
        var file = TestPaths.CopyOfTinyBuffer();
        var dir = Path.GetDirectoryName(file)!;
        var outDir = Path.Combine(dir, "sheets");
        Assert.Equal(0, CliRunner.Run("sheets", file, "-o", outDir, "--formats", "svg", "--date", "2025-01-01").ExitCode);
        var first = Directory.GetFiles(outDir).ToDictionary(f => f, File.ReadAllBytes);
        Assert.Equal(0, CliRunner.Run("sheets", file, "-o", outDir, "--formats", "svg", "--date", "2026-06-30").ExitCode);
        Assert.All(first, kv => Assert.True(File.Exists(kv.Key)));
        Assert.Contains(first, kv => !kv.Value.SequenceEqual(File.ReadAllBytes(kv.Key))); // the date changed on the sheets
    }
}
