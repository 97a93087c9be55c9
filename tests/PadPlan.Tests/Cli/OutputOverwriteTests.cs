using PadPlan.ProjectFiles;
using Xunit;

namespace PadPlan.Tests.Cli;

/// <summary>
/// Output files never cost the builder a file of their own: an existing file under an output name is replaced only when
/// padplan wrote it (a geometry export, a deck, a model, a check report: each recognised by its own first bytes; a CSV
/// table by its header row; a sheet by its mark), or with --force. The folders of sheets and demo are replaced as a set,
/// so every file in them is checked, those this run writes again and those it would remove. The project rule "never
/// overwrite or lose a user's file"; no outside source.
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

    [Theory]
    [InlineData("template-1.svg")]
    [InlineData("template-1.png")]
    [InlineData("sheets.pdf")]
    public void Sheets_leave_a_builders_file_under_a_page_name_alone_and_write_nothing(string name)
    {
        var (project, dir) = SheetsFixture();
        Assert.Equal(0, Sheets(project, dir, "2025-01-01").ExitCode);
        var target = Path.Combine(dir, name);
        File.WriteAllText(target, "the builder's own page\n"); // e.g. saved over the sheet from a drawing program
        var before = Snapshot(dir);

        var refused = Sheets(project, dir, "2026-06-30");
        Assert.Equal(2, refused.ExitCode);
        Assert.Contains(target, refused.Err);
        Assert.Contains("another folder", refused.Err);
        Assert.Contains("--force", refused.Err);
        AssertSame(before, dir); // not one file of the set written, the builder's kept byte for byte

        var forced = Sheets(project, dir, "2026-06-30", "--force");
        Assert.Equal(0, forced.ExitCode);
        Assert.NotEqual("the builder's own page\n"u8.ToArray(), File.ReadAllBytes(target));
        Assert.Equal(0, Sheets(project, dir, "2026-07-01").ExitCode); // padplan's own again, so replaced without asking
    }

    [Fact]
    public void Sheets_replace_their_own_earlier_output_without_asking()
    {
        var (project, dir) = SheetsFixture();
        Assert.Equal(0, Sheets(project, dir, "2025-01-01").ExitCode);
        var first = Snapshot(dir);
        Assert.Equal(0, Sheets(project, dir, "2026-06-30").ExitCode);
        var second = Snapshot(dir);
        Assert.Equal(first.Keys.Order(StringComparer.Ordinal), second.Keys.Order(StringComparer.Ordinal));
        Assert.False(first["template-1.svg"].SequenceEqual(second["template-1.svg"])); // the new date is on the page
        Assert.False(first["sheets.pdf"].SequenceEqual(second["sheets.pdf"]));
    }

    [Fact]
    public void A_sheet_without_padplans_mark_is_refused_once_and_force_replaces_it()
    {
        // what a sheet written before the mark looks like: the same page without the mark's line
        var (project, dir) = SheetsFixture();
        Assert.Equal(0, Sheets(project, dir, "2025-01-01").ExitCode);
        var page = Path.Combine(dir, "assembly-1.svg");
        File.WriteAllText(page, File.ReadAllText(page).Replace("<!-- a PadPlan sheet -->\n", "", StringComparison.Ordinal));
        var unmarked = File.ReadAllBytes(page);
        Assert.Equal(2, Sheets(project, dir, "2025-01-01").ExitCode);
        Assert.Equal(unmarked, File.ReadAllBytes(page));
        Assert.Equal(0, Sheets(project, dir, "2025-01-01", "--force").ExitCode);
        Assert.Equal(0, Sheets(project, dir, "2025-01-01").ExitCode);
    }

    [Fact]
    public void Force_replaces_a_builders_file_under_a_page_name_but_never_removes_any_other()
    {
        var (project, dir) = SheetsFixture();
        Directory.CreateDirectory(dir);
        File.WriteAllText(Path.Combine(dir, "template-1.svg"), "mine");
        Assert.Equal(2, Sheets(project, dir, "2025-01-01").ExitCode);
        Assert.Equal("mine", File.ReadAllText(Path.Combine(dir, "template-1.svg")));

        File.WriteAllText(Path.Combine(dir, "notes.txt"), "mine too");
        var refused = Sheets(project, dir, "2025-01-01", "--force"); // the set would take notes.txt with the old folder
        Assert.Equal(2, refused.ExitCode);
        Assert.Contains("notes.txt", refused.Err);
        Assert.Equal(["notes.txt", "template-1.svg"], Directory.GetFiles(dir).Select(Path.GetFileName).Order(StringComparer.Ordinal));
        Assert.Equal("mine", File.ReadAllText(Path.Combine(dir, "template-1.svg")));

        File.Delete(Path.Combine(dir, "notes.txt"));
        Assert.Equal(0, Sheets(project, dir, "2025-01-01", "--force").ExitCode);
        Assert.StartsWith("<?xml", File.ReadAllText(Path.Combine(dir, "template-1.svg")));
    }

    [Fact]
    public void The_demo_replaces_its_own_files_but_not_a_plan_changed_since_nor_does_sheets_remove_it()
    {
        var dir = TestPaths.NewTempDir();
        string[] demo = ["demo", "-o", dir, "--date", "2026-01-15"];
        Assert.Equal(0, CliRunner.Run(demo).ExitCode);
        Assert.Equal(0, CliRunner.Run(demo).ExitCode); // its own files, the project the same bytes again (deterministic)

        var plan = Path.Combine(dir, "xtal-osc-40m" + ProjectFile.Extension);
        File.WriteAllText(plan, File.ReadAllText(plan).Replace("\"Crystal test oscillator, 40 m\"", "\"my oscillator\"", StringComparison.Ordinal)); // as the editor would save it
        var before = Snapshot(dir);
        var refused = CliRunner.Run(demo);
        Assert.Equal(2, refused.ExitCode);
        Assert.Contains(plan, refused.Err);
        AssertSame(before, dir);

        // sheets into the demo's folder would remove the plan (and the tables) with the old set: refused, the plan kept
        var sheets = CliRunner.Run("sheets", plan, "-o", dir, "--ngspice", "none", "--date", "2026-01-15");
        Assert.Equal(2, sheets.ExitCode);
        Assert.Contains("this run writes again", sheets.Err);
        AssertSame(before, dir);

        Assert.Equal(0, CliRunner.Run([.. demo, "--force"]).ExitCode);
        Assert.DoesNotContain("my oscillator", File.ReadAllText(plan));
    }

    private static (string Project, string Dir) SheetsFixture()
    {
        var project = TestPaths.CopyOfTinyBuffer();
        return (project, Path.Combine(Path.GetDirectoryName(project)!, "sheets"));
    }

    private static CliRunner.Result Sheets(string project, string dir, string date, params string[] more) =>
        CliRunner.Run(["sheets", project, "-o", dir, "--ngspice", "none", "--date", date, .. more]);

    private static Dictionary<string, byte[]> Snapshot(string dir) => FolderSnapshot.Of(dir);

    private static void AssertSame(Dictionary<string, byte[]> before, string dir) => FolderSnapshot.AssertSame(before, dir);
}
