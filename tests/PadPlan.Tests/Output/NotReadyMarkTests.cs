using PadPlan.Model;
using PadPlan.Output.Drawing;
using PadPlan.Output.Sheets;
using PadPlan.ProjectFiles;
using PadPlan.Rules;
using PadPlan.Tests.Cli;
using Xunit;

namespace PadPlan.Tests.Output;

/// <summary>
/// A plan that fails its check must not pass for a sound one on any printed page: the template is cut from and the
/// assembly view is read at the bench, often without the report page where the check's verdict stands. So every page's
/// title block carries the stop mark and names the sheet with the errors, and `padplan sheets` says so on the terminal.
/// Marking unfinished drawings on every sheet is common practice, no source.
/// </summary>
public class NotReadyMarkTests
{
    private static readonly Finding Reversed = new(RuleIds.CapReversed, Severity.Error,
        "C1 is reversed.", "Turn C1 round.", null, ValueList.Of("C1"));

    private static List<string> PageTexts(SheetBook book) => [.. book.Sheets.Select(s => SvgWriter.Write(s.Page))];

    [Fact]
    public void Every_page_of_a_plan_that_fails_its_check_carries_the_stop_mark_and_the_sheet_of_the_check()
    {
        var project = SheetFixtures.TinyBuffer();
        var failed = new CheckReport(ValueList.Of(Reversed), ValueList<string>.Empty);
        var book = SheetBook.Build(project, SheetFixtures.Options(), failed, []);
        var report = book.Sheets.ToList().FindIndex(s => s.Kind == SheetKind.Report) + 1;
        Assert.Equal(3, report); // template, assembly view, then the report whose first page holds the check
        var texts = PageTexts(book);
        Assert.All(texts, svg => Assert.Contains($"NOT READY: 1 error in the check (sheet {report})", svg));
        Assert.Contains("NOT READY: fix the errors before cutting board.", texts[report - 1]); // the check's own verdict on that sheet
        Assert.All(texts, svg => Assert.Contains(project.Name, svg)); // the project's name stays on every page

        var two = new CheckReport(ValueList.Of(Reversed, Reversed with { Message = "C2 is reversed.", Items = ValueList.Of("C2") }), ValueList<string>.Empty);
        Assert.All(PageTexts(SheetBook.Build(project, SheetFixtures.Options(), two, [])), svg => Assert.Contains("NOT READY: 2 errors in the check (sheet 3)", svg));
    }

    [Fact]
    public void A_plan_that_passes_or_is_printed_without_a_check_carries_no_stop_mark()
    {
        var project = SheetFixtures.TinyBuffer();
        var passed = Checker.Check(project);
        Assert.Equal(0, passed.Errors);
        Assert.All(PageTexts(SheetBook.Build(project, SheetFixtures.Options(), passed, [])), svg => Assert.DoesNotContain("NOT READY", svg));
        Assert.All(PageTexts(SheetBook.Build(project, SheetFixtures.Options(), null, [])), svg => Assert.DoesNotContain("NOT READY", svg));
    }

    /// <summary>
    /// On the command line: a part moved 20 mm from where its leads land breaks lead reach (docs/rules.md); `sheets` still
    /// prints (the pages show what is wrong) but says on stderr that every page is marked, and points to `check`; so do
    /// the cut list, the build order and the test sheet.
    /// </summary>
    [Fact]
    public void Sheets_and_tables_of_a_failing_plan_say_so_on_the_terminal()
    {
        var dir = TestPaths.NewTempDir();
        var path = Path.Combine(dir, "moved.padplan.json");
        var project = SheetFixtures.TinyBuffer();
        var layout = project.Layout!;
        var first = layout.Placements[0];
        var moved = project with { Layout = layout with { Placements = layout.Placements.Select(p => p == first ? new Placement(p.Ref, new Point(p.Position.X + 20, p.Position.Y), p.Rotation, p.Leads) : p).ToValueList() } };
        ProjectFile.Write(moved, path);
        var check = CliRunner.Run("check", path, "--ngspice", "none", "-q");
        Assert.Equal(1, check.ExitCode);

        var run = CliRunner.Run("sheets", path, "-o", Path.Combine(dir, "sheets"), "--date", "2025-03-01", "--dpi", "40", "--formats", "svg", "--ngspice", "none");
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("warning: NOT READY: the plan fails its check with", run.Err);
        Assert.Contains(", and every page is marked so;", run.Err);
        Assert.Contains("'padplan check moved.padplan.json' lists", run.Err);
        Assert.Contains("NOT READY:", File.ReadAllText(Path.Combine(dir, "sheets", "template-1.svg")));

        var sound = CliRunner.Run("sheets", TestPaths.TinyBuffer, "-o", Path.Combine(dir, "sound"), "--date", "2025-03-01", "--formats", "svg", "--ngspice", "none");
        Assert.Equal(0, sound.ExitCode);
        Assert.DoesNotContain("NOT READY", sound.Err);

        // the tables for the bench say it too: what to cut, the build order, the test sheet
        foreach (var args in new[] { new[] { "cutlist" }, ["bom", "--build-order"], ["testplan", "--ngspice", "none"] })
        {
            var failing = CliRunner.Run([args[0], path, .. args[1..]]);
            Assert.Equal(0, failing.ExitCode);
            Assert.Contains("warning: NOT READY: the plan fails its check with", failing.Err);
            Assert.Contains("'padplan check moved.padplan.json' lists", failing.Err);
            var passing = CliRunner.Run([args[0], TestPaths.TinyBuffer, .. args[1..]]);
            Assert.DoesNotContain("NOT READY", passing.Err);
        }
    }
}
