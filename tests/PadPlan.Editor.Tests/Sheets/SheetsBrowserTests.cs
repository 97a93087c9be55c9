using System.Collections.Concurrent;
using PadPlan.Import;
using PadPlan.Materials;
using PadPlan.Model;
using PadPlan.Output.Drawing;
using PadPlan.Output.Sheets;
using PadPlan.Output.Tables;
using PadPlan.Planning;
using PadPlan.ProjectFiles;
using PadPlan.Rules;
using PadPlan.Tests.Output;
using Xunit.Abstractions;

namespace PadPlan.Editor.Tests.Sheets;

/// <summary>
/// Every SVG page of every example, and of synthetic boards of 50, 100 and 150 parts within 160 x 100 mm, laid out by
/// Chromium (the reference renderer here) and measured there: no text over another, no text over a pad, strip or part
/// body it does not name, no text cut by the page edge or by the edge of its drawing, and one assembly overview page
/// for each board. The drawing-model audit (PadPlan.Tests, SceneAudit) checks the same from our own numbers; this is
/// the outside check of what is really drawn.
/// </summary>
public sealed class SheetsBrowserTests(BrowserFixture browser, ITestOutputHelper output) : IClassFixture<BrowserFixture>
{
    public static TheoryData<string> Boards => ["tiny-buffer", "xtal-osc-40m", "cw-filter", "jfet-preamp", "valve-stage", "synthetic-50", "synthetic-100", "synthetic-150"];

    [ChromiumTheory]
    [MemberData(nameof(Boards))]
    public async Task Every_page_lays_out_in_chromium_without_overlapping_covering_or_cut_text(string board)
    {
        var project = Project(board);
        var book = Book(project);
        await using var audit = await RenderedSheetAudit.OpenAsync(browser.Browser);
        var problems = new List<string>();
        // PADPLAN_SHEETS_DUMP=DIR keeps the pages measured, to look at after a failure
        var dump = Environment.GetEnvironmentVariable("PADPLAN_SHEETS_DUMP") is { Length: > 0 } d ? Path.Combine(d, board) : null;
        if (dump is not null) Directory.CreateDirectory(dump);
        foreach (var sheet in book.Sheets)
        {
            var svg = SvgWriter.Write(sheet.Page);
            if (dump is not null) File.WriteAllText(Path.Combine(dump, sheet.FileStem + ".svg"), svg);
            var found = await audit.ProblemsAsync(svg);
            problems.AddRange(found.Select(p => $"{sheet.Kind.ToString().ToLowerInvariant()}-{sheet.Number}: {p}"));
        }
        foreach (var p in problems.Take(60)) output.WriteLine(p);
        Assert.True(problems.Count == 0, $"{board}: {problems.Count} problems in Chromium's layout, first: {problems.FirstOrDefault()}");

        // one overview page for a board within 160 x 100 mm and 150 parts (the promise); detail pages at most one per 50 parts
        var assembly = book.Sheets.Where(s => s.Kind == SheetKind.Assembly).ToList();
        Assert.True(project.Board.Width <= 160 && project.Board.Height <= 100 && project.Parts.Count <= 150);
        Assert.Single(assembly, s => s.Page.Title.Contains("Assembly view", StringComparison.Ordinal));
        Assert.True(assembly.Count - 1 <= (project.Parts.Count + 49) / 50, $"{assembly.Count - 1} detail pages for {project.Parts.Count} parts");
        output.WriteLine($"{board}: {book.Sheets.Count} pages, {assembly.Count} assembly, {assembly[0].Page.Title}");
    }

    private static SheetBook Book(Project project)
    {
        var materials = MaterialsTables.Of(project);
        return SheetBook.Build(project, new SheetOptions(Paper.A4, new DateOnly(2026, 1, 15)), Checker.Check(project), materials.All, materials.Cutting);
    }

    private static readonly ConcurrentDictionary<string, Project> Placed = new();

    /// <summary>An example imported and placed as `padplan demo` does (quick effort, seed 1), or a synthetic board.</summary>
    private static Project Project(string name) => Placed.GetOrAdd(name, n =>
    {
        if (n.StartsWith("synthetic-", StringComparison.Ordinal)) return SyntheticBoard.Compact(int.Parse(n["synthetic-".Length..], System.Globalization.CultureInfo.InvariantCulture));
        var folder = Path.Combine(AppContext.BaseDirectory, "examples", n);
        var saved = Path.Combine(folder, n + ProjectFile.Extension);
        if (File.Exists(saved)) return ProjectFile.Read(saved);
        var netlist = Directory.EnumerateFiles(folder).Where(f => f.EndsWith(".ppn", StringComparison.Ordinal) || f.EndsWith(".cir", StringComparison.Ordinal)).Order(StringComparer.Ordinal).First();
        var library = FootprintLibrary.Load();
        var partsFile = Path.Combine(folder, "parts.json");
        var map = File.Exists(partsFile) ? PartsMap.Read(partsFile, library) : null;
        var imported = NetlistImporter.ImportFile(netlist, new ImportOptions(library, map, null, null));
        return Placer.Place(imported.Project, new PlacerSettings(Effort: Effort.Quick)).Project ?? throw new InvalidOperationException($"{n} did not place");
    });
}
