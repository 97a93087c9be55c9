using PadPlan.ProjectFiles;
using PadPlan.Tests.Cli;
using Xunit;

namespace PadPlan.Tests.Planning;

public class PlaceCommandTests
{
    private static string CopyOfFixture(Func<string, string>? edit = null)
    {
        var dir = TestPaths.NewTempDir();
        var path = Path.Combine(dir, "job.padplan.json");
        var text = File.ReadAllText(TestPaths.TinyBuffer);
        File.WriteAllText(path, edit is null ? text : edit(text));
        return path;
    }

    [Fact]
    public void Place_writes_a_layout_and_prints_a_summary()
    {
        var path = CopyOfFixture();
        var run = CliRunner.Run("place", path, "--seed", "5", "--effort", "quick");
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("leads: total", run.Out);
        Assert.Contains("board: 50 x 36 mm", run.Out);
        Assert.Empty(CheckerVerdict.Check(ProjectFile.Read(path)));
    }

    [Fact]
    public void Too_small_a_board_exits_1_names_the_size_and_leaves_the_file_alone()
    {
        var path = CopyOfFixture(t => t.Replace("\"width\": 50", "\"width\": 16").Replace("\"height\": 36", "\"height\": 12"));
        var before = File.ReadAllBytes(path);
        var run = CliRunner.Run("place", path, "--effort", "quick", "--quiet");
        Assert.Equal(1, run.ExitCode);
        Assert.Contains("board too small: needs about", run.Err);
        Assert.Contains("given 16 x 12", run.Err);
        Assert.Equal(before, File.ReadAllBytes(path));
    }

    [Fact]
    public void Unknown_effort_is_a_usage_error()
    {
        var path = CopyOfFixture();
        var run = CliRunner.Run("place", path, "--effort", "heroic");
        Assert.Equal(2, run.ExitCode);
    }
}
