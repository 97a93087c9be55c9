using System.Globalization;
using System.Text.RegularExpressions;
using PadPlan.Planning;
using PadPlan.ProjectFiles;
using PadPlan.Rules;
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

    /// <summary>The fixture's circuit with its layout taken out, as an import would leave it.</summary>
    private static string UnplacedFixture(Func<PadPlan.Model.Project, PadPlan.Model.Project>? edit = null)
    {
        var path = CopyOfFixture();
        var project = ProjectFile.Read(path) with { Layout = null };
        ProjectFile.Write(edit is null ? project : edit(project), path);
        return path;
    }

    [Fact]
    public void Place_writes_a_layout_and_prints_a_summary()
    {
        var path = UnplacedFixture();
        var run = CliRunner.Run("place", path, "--seed", "5", "--effort", "quick");
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("leads: total", run.Out);
        Assert.Contains("the layout check passed", run.Out);
        Assert.Contains("'padplan check' adds polarity and ratings at the operating point", run.Out); // the gate checks the layout only: the operating point is check's
        Assert.Contains("board: 50 x 36 mm", run.Out);
        // The lead floor is a lower bound (WireFloorTests): the summary names it, and the layout's total is not below it.
        var total = double.Parse(Regex.Match(run.Out, @"leads: total ([0-9.]+) mm").Groups[1].Value, CultureInfo.InvariantCulture);
        var floor = double.Parse(Regex.Match(run.Out, @"floor ([0-9.]+) mm: no layout of these parts needs less").Groups[1].Value, CultureInfo.InvariantCulture);
        Assert.InRange(floor, 0.1, total);
        Assert.Contains("another --seed or --effort thorough may come nearer", run.Out);
        Assert.Empty(CheckerVerdict.Check(ProjectFile.Read(path)));
    }

    [Fact]
    public void Place_on_a_placed_project_refuses_without_force_names_keep_existing_and_changes_nothing()
    {
        var path = CopyOfFixture();
        var before = File.ReadAllBytes(path);
        var run = CliRunner.Run("place", path, "--effort", "quick");
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("already has a layout", run.Err);
        Assert.Contains("--force", run.Err);
        Assert.Contains("--keep-existing", run.Err);
        Assert.Equal(before, File.ReadAllBytes(path));

        var keep = CliRunner.Run("place", path, "--effort", "quick", "--keep-existing", "--quiet");
        Assert.Equal(0, keep.ExitCode);
    }

    [Fact]
    public void Force_replaces_the_layout_and_prints_old_and_new_figures_side_by_side()
    {
        var path = UnplacedFixture();
        var first = CliRunner.Run("place", path, "--seed", "2", "--effort", "quick");
        Assert.Equal(0, first.ExitCode);
        var old = LayoutFigures.Of(ProjectFile.Read(path));
        var firstTotal = Regex.Match(first.Out, @"leads: total ([0-9.]+) mm, longest ([0-9.]+) mm").Groups;

        var second = CliRunner.Run("place", path, "--seed", "9", "--effort", "quick", "--force", "--board", "60x40");
        Assert.Equal(0, second.ExitCode);
        var now = LayoutFigures.Of(ProjectFile.Read(path));
        Assert.Contains("replaced the old layout:", second.Out);
        var rows = second.Out.Split('\n').SkipWhile(l => !l.StartsWith("replaced the old layout:", StringComparison.Ordinal)).Skip(1).Take(5).ToList();
        Assert.Matches(@"^\s+figure\s+old\s+new$", rows[0]);
        // The old column repeats what the first place printed for its own layout, the new one what the second made.
        Assert.Matches($@"^\s+total lead\s+{Regex.Escape(firstTotal[1].Value)} mm\s+{Regex.Escape(Mm(now.TotalLead))} mm$", rows[1]);
        Assert.Matches($@"^\s+longest lead\s+{Regex.Escape(firstTotal[2].Value)} mm \(\S+\)\s+{Regex.Escape(Mm(now.LongestLead))} mm", rows[2]);
        Assert.Matches($@"^\s+jumpers\s+{old.Links}\s+{now.Links}$", rows[3]);
        // 50 x 36 mm before (the fixture's board), 60 x 40 mm after (--board).
        Assert.Matches(@"^\s+board area\s+1800 mm²\s+2400 mm²$", rows[4]);
        Assert.Equal((60.0, 40.0), (ProjectFile.Read(path).Board.Width!.Value, ProjectFile.Read(path).Board.Height!.Value));
    }

    private static string Mm(double v) => v.ToString("0.0", CultureInfo.InvariantCulture);

    [Fact]
    public void Too_small_a_board_advises_a_size_that_a_trial_placement_confirms()
    {
        var path = UnplacedFixture(p => p with { Board = p.Board.WithSize(16, 12) });
        var before = File.ReadAllBytes(path);
        var run = CliRunner.Run("place", path, "--effort", "quick", "--quiet");
        Assert.Equal(1, run.ExitCode);
        Assert.Contains("board too small: the parts do not fit on 16 x 12 mm", run.Err);
        Assert.DoesNotContain("board.width", run.Err);
        Assert.Equal(before, File.ReadAllBytes(path));
        var advised = Regex.Match(run.Err, @"Place with --board ([0-9.]+x[0-9.]+)").Groups[1].Value;
        Assert.NotEqual("", advised);

        // The advice, taken as given, places at normal effort and the checker passes it.
        var again = CliRunner.Run("place", path, "--board", advised, "--quiet");
        Assert.True(again.ExitCode == 0, again.Err);
        Assert.Equal(0, Checker.Check(ProjectFile.Read(path)).Errors);
    }

    [Fact]
    public void A_bad_board_option_is_a_usage_error()
    {
        var path = UnplacedFixture();
        var run = CliRunner.Run("place", path, "--board", "huge");
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("--board", run.Err);
    }

    [Fact]
    public void Unknown_effort_is_a_usage_error()
    {
        var path = CopyOfFixture();
        var run = CliRunner.Run("place", path, "--effort", "heroic");
        Assert.Equal(2, run.ExitCode);
    }
}
