using Xunit;

namespace PadPlan.Tests.Cli;

/// <summary>
/// Output files never cost the builder a file of their own: an existing file under an output name is replaced only when
/// padplan wrote it (a geometry export, a deck, a model, a check report: each recognised by its own first bytes; a CSV
/// table by its header row), or with --force. The project rule "never overwrite or lose a user's file"; no outside source.
/// </summary>
public class OutputOverwriteTests
{
    [Theory]
    [InlineData("--geometry", "g.json")]
    [InlineData("--spice", "d.cir")]
    [InlineData("--model", "m.glb")]
    public void A_file_padplan_did_not_write_is_left_alone_and_named(string option, string name)
    {
        var project = TestPaths.CopyOfTinyBuffer();
        var target = Path.Combine(Path.GetDirectoryName(project)!, name);
        File.WriteAllText(target, "the builder's own notes\n");
        var run = CliRunner.Run("export", project, option, target);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains(target, run.Err);
        Assert.Contains("--force", run.Err);
        Assert.Equal("the builder's own notes\n", File.ReadAllText(target));
    }

    [Fact]
    public void One_refused_file_stops_the_whole_export_before_anything_is_written()
    {
        var project = TestPaths.CopyOfTinyBuffer();
        var dir = Path.GetDirectoryName(project)!;
        File.WriteAllText(Path.Combine(dir, "m.glb"), "not a model");
        var run = CliRunner.Run("export", project, "--geometry", Path.Combine(dir, "g.json"), "--model", Path.Combine(dir, "m.glb"));
        Assert.Equal(2, run.ExitCode);
        Assert.False(File.Exists(Path.Combine(dir, "g.json")));
    }

    [Fact]
    public void Padplans_own_exports_are_written_again_and_force_replaces_any_file()
    {
        var project = TestPaths.CopyOfTinyBuffer();
        var dir = Path.GetDirectoryName(project)!;
        string[] args = ["export", project, "--geometry", Path.Combine(dir, "g.json"), "--spice", Path.Combine(dir, "d.cir"), "--model", Path.Combine(dir, "m.glb")];
        Assert.Equal(0, CliRunner.Run(args).ExitCode);
        var first = File.ReadAllBytes(Path.Combine(dir, "m.glb"));
        Assert.Equal(0, CliRunner.Run(args).ExitCode); // its own files: re-exported after an edit without asking
        Assert.Equal(first, File.ReadAllBytes(Path.Combine(dir, "m.glb")));

        File.WriteAllText(Path.Combine(dir, "d.cir"), "* someone else's deck\n");
        Assert.Equal(0, CliRunner.Run("export", project, "--spice", Path.Combine(dir, "d.cir"), "--force").ExitCode);
        Assert.StartsWith("padplan deck: ", File.ReadAllText(Path.Combine(dir, "d.cir")));
    }

    [Theory]
    [InlineData("check", "--json", "c.json")]
    [InlineData("bom", "--csv", "b.csv")]
    [InlineData("cutlist", "--csv", "k.csv")]
    public void Reports_and_tables_leave_a_foreign_file_alone_and_write_their_own_again(string command, string option, string name)
    {
        var project = TestPaths.CopyOfTinyBuffer();
        var target = Path.Combine(Path.GetDirectoryName(project)!, name);
        File.WriteAllText(target, "mine\n");
        var refused = CliRunner.Run(command, project, option, target);
        Assert.Equal(2, refused.ExitCode);
        Assert.Contains("--force", refused.Err);
        Assert.Equal("mine\n", File.ReadAllText(target));

        File.Delete(target);
        var first = CliRunner.Run(command, project, option, target);
        Assert.True(first.ExitCode is 0 or 1, first.Err); // check exits 1 on findings; the report is written either way
        var again = CliRunner.Run(command, project, option, target);
        Assert.Equal(first.ExitCode, again.ExitCode);
        Assert.NotEqual("mine\n", File.ReadAllText(target));

        File.WriteAllText(target, "mine\n");
        Assert.Equal(first.ExitCode, CliRunner.Run(command, project, option, target, "--force").ExitCode);
        Assert.NotEqual("mine\n", File.ReadAllText(target));
    }
}
