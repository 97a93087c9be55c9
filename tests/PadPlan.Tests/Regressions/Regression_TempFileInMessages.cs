using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>Regression: a failed write named the hidden temporary file instead of the user's file.</summary>
public sealed class Regression_TempFileInMessages
{
    [Fact]
    public void A_failed_csv_write_names_the_users_file_not_the_temp_file()
    {
        var project = TestPaths.CopyOfTinyBuffer();
        var dir = Path.GetDirectoryName(project)!;
        var csv = Path.Combine(dir, "bom.csv");
        Directory.CreateDirectory(csv); // a folder where the file should go: the final rename fails
        var result = CliRunner.Run("bom", project, "--csv", csv);
        Assert.Equal(2, result.ExitCode);
        Assert.Contains(csv, result.Err, StringComparison.Ordinal);
        Assert.DoesNotContain(".tmp", result.Err, StringComparison.Ordinal);
        Assert.Empty(Directory.GetFiles(dir, "*.tmp"));
    }
}
