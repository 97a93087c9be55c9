namespace PadPlan.Tests.Cli;

/// <summary>Every command that takes a project refuses a missing or broken one with exit code 2, and never changes the file.</summary>
public sealed class ProjectArgumentTests
{
    public static TheoryData<string> ProjectCommands => new() { "place", "check", "sheets", "cutlist", "bom", "testplan", "export" };

    [Theory]
    [MemberData(nameof(ProjectCommands))]
    public void A_missing_project_file_exits_2_naming_the_file(string command)
    {
        var missing = Path.Combine(TestPaths.NewTempDir(), "nothing.padplan.json");
        var result = CliRunner.Run(WithRequiredOptions(command, missing));
        Assert.Equal(2, result.ExitCode);
        Assert.Contains("nothing.padplan.json", result.Err);
        Assert.False(File.Exists(missing));
    }

    [Theory]
    [MemberData(nameof(ProjectCommands))]
    public void A_broken_project_file_exits_2_and_is_left_unchanged(string command)
    {
        var dir = TestPaths.NewTempDir();
        var file = Path.Combine(dir, "broken.padplan.json");
        var text = File.ReadAllText(TestPaths.TinyBuffer).Replace("\"width\": 50", "\"width\": \"wide\"", StringComparison.Ordinal);
        File.WriteAllText(file, text);
        var before = File.ReadAllBytes(file);
        var result = CliRunner.Run(WithRequiredOptions(command, file));
        Assert.Equal(2, result.ExitCode);
        Assert.Contains("$.board.width", result.Err);
        Assert.Equal(before, File.ReadAllBytes(file));
        Assert.Single(Directory.GetFiles(dir));
    }

    // Options a command needs besides the project; their outputs go to a folder of their own.
    private static string[] WithRequiredOptions(string command, string project) => command switch
    {
        "export" => [command, project, "--geometry", Path.Combine(TestPaths.NewTempDir(), "geometry.json")],
        "sheets" => [command, project, "-o", TestPaths.NewTempDir()],
        _ => [command, project],
    };

    [Fact]
    public void An_unknown_command_is_a_usage_error()
    {
        var result = CliRunner.Run("paint");
        Assert.Equal(2, result.ExitCode);
        Assert.Contains("paint", result.Err);
    }

    [Fact]
    public void Version_and_help_succeed()
    {
        Assert.Equal(0, CliRunner.Run("--version").ExitCode);
        var help = CliRunner.Run("--help");
        Assert.Equal(0, help.ExitCode);
        foreach (var command in new[] { "import", "place", "check", "sheets", "cutlist", "bom", "testplan", "footprints", "demo" })
            Assert.Contains(command, help.Out);
    }
}
