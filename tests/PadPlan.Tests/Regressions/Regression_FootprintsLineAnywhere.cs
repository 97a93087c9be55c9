using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>
/// Regression (issue 25): a `footprints` line in a .ppn netlist read JSON from any folder ("../../x"), and the error
/// echoed the first key name of the file it found there. A netlist may now name only folders below its own, unless the
/// command line names the folder with --footprints; and a JSON file that is not PadPlan's is refused without a word of
/// its content.
/// </summary>
public sealed class Regression_FootprintsLineAnywhere
{
    [Fact]
    public void A_folder_outside_the_netlists_own_is_refused_unless_named_on_the_command_line()
    {
        var root = TestPaths.NewTempDir();
        var outside = Path.Combine(root, "elsewhere");
        Directory.CreateDirectory(outside);
        File.WriteAllText(Path.Combine(outside, "secret.json"), "{\"private-api-key-name\": \"hunter2\"}");
        var netDir = Path.Combine(root, "circuit");
        Directory.CreateDirectory(netDir);
        var netlist = Path.Combine(netDir, "c.ppn");
        File.WriteAllText(netlist, "title c\nfootprints ../elsewhere\nR1 1k 1=A 2=GND\n");
        var output = Path.Combine(netDir, "c.padplan.json");

        var refused = CliRunner.Run("import", netlist, "-o", output, "-q");
        Assert.Equal(2, refused.ExitCode);
        Assert.Contains("not inside the netlist's own folder", refused.Err, StringComparison.Ordinal);
        Assert.Contains("--footprints", refused.Err, StringComparison.Ordinal);

        // named on the command line, the folder is read; its file is not PadPlan's and is refused without echoing it
        var named = CliRunner.Run("import", netlist, "-o", output, "-q", "--footprints", outside);
        Assert.Equal(2, named.ExitCode);
        Assert.DoesNotContain("private-api-key-name", named.Err, StringComparison.Ordinal);
        Assert.DoesNotContain("hunter2", named.Err, StringComparison.Ordinal);
        Assert.False(File.Exists(output));
    }

    [Fact]
    public void A_folder_below_the_netlist_is_still_read()
    {
        var netDir = TestPaths.NewTempDir();
        Directory.CreateDirectory(Path.Combine(netDir, "mine"));
        var own = File.ReadAllText(Path.Combine(TestPaths.Footprints, "resistors.json")).Replace("\"res-", "\"mine-res-", StringComparison.Ordinal);
        File.WriteAllText(Path.Combine(netDir, "mine", "resistors.json"), own);
        File.WriteAllText(Path.Combine(netDir, "c.ppn"), "title c\nfootprints mine\nR1 1k 1=A 2=GND\n");
        var result = CliRunner.Run("import", Path.Combine(netDir, "c.ppn"), "-o", Path.Combine(netDir, "c.padplan.json"), "-q");
        Assert.True(result.ExitCode == 0, result.Err);
    }
}
