using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>Regression: place on a read-only project file replaced it and made it writable.</summary>
public sealed class Regression_ReadOnlyProject
{
    [Fact]
    public void A_read_only_project_is_refused_and_left_as_it_is()
    {
        var file = TestPaths.CopyOfTinyBuffer();
        var before = File.ReadAllBytes(file);
        var mode = UnixFileMode.UserRead | UnixFileMode.GroupRead | UnixFileMode.OtherRead;
        if (!OperatingSystem.IsWindows()) File.SetUnixFileMode(file, mode);
        else File.SetAttributes(file, FileAttributes.ReadOnly);
        var result = CliRunner.Run("place", file, "--force", "--effort", "quick", "-q");
        Assert.Equal(2, result.ExitCode);
        Assert.Contains("t.padplan.json", result.Err, StringComparison.Ordinal);
        Assert.Contains("read-only", result.Err, StringComparison.Ordinal);
        Assert.Equal(before, File.ReadAllBytes(file));
        if (!OperatingSystem.IsWindows()) Assert.Equal(mode, File.GetUnixFileMode(file));
        Assert.Empty(Directory.GetFiles(Path.GetDirectoryName(file)!, "*.tmp"));
    }
}
