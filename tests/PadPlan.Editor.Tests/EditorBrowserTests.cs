using System.Text.Json;
using PadPlan.Cli;
using PadPlan.ProjectFiles;

namespace PadPlan.Editor.Tests;

/// <summary>
/// The editor driven in a real Chromium, as a builder would use it. The verdicts come from the real checker (the same
/// code as `padplan check`); where a test judges a connection it names the physical fact it relies on.
/// </summary>
public sealed class EditorBrowserTests(BrowserFixture browser) : IClassFixture<BrowserFixture>
{
    [ChromiumFact]
    public async Task Loads_an_example_and_draws_every_part_pad_and_lead()
    {
        await using var run = await EditorRun.StartAsync();
        var bench = await BenchPage.OpenAsync(browser.Browser, run);
        var project = ProjectFile.Read(run.ProjectPath);
        // Counted against the project file itself: one body per placed part, one island per pad, one end per lead landing.
        Assert.Equal(project.Layout!.Placements.Count, await bench.Page.Locator("g.part").CountAsync());
        Assert.Equal(project.Layout.Islands().Count(), await bench.Page.Locator(".island").CountAsync());
        Assert.Equal(project.Layout.Placements.Sum(p => p.Leads.Count), await bench.Page.Locator("circle.end").CountAsync());
        Assert.Equal("tiny-buffer.padplan.json", await bench.Page.TextContentAsync("#file"));
        Assert.Empty(await bench.FindingRulesAsync());
        Assert.Equal(0, await bench.Page.Locator("line.thread").CountAsync()); // nothing open on a clean plan
        await Shoot(bench, "editor-bench.png");

        // Hovering a pad lights its whole net: every pad, lead and lead end of BASE, and nothing of another net.
        await bench.Page.HoverAsync(".island[data-id='P2']", new() { Force = true });
        var lit = await bench.Page.Locator(".lit").EvaluateAllAsync<string[]>("items => items.map(i => i.dataset.net)");
        var baseItems = await bench.Page.Locator("[data-net='BASE']").CountAsync();
        Assert.Equal(baseItems, lit.Length);
        Assert.All(lit, net => Assert.Equal("BASE", net));
    }

    [ChromiumFact]
    public async Task Dragging_a_part_onto_another_parts_pad_shows_a_short_and_taking_it_back_clears_it()
    {
        await using var run = await EditorRun.StartAsync();
        var bench = await BenchPage.OpenAsync(browser.Browser, run);
        await ShortJ1ToBaseAsync(bench, run);

        var rules = await bench.FindingRulesAsync();
        Assert.Contains("lead-wrong-pad", rules);
        var text = await bench.Page.TextContentAsync("#findings li[data-rule='lead-wrong-pad']");
        // IN is now in two pieces (J1 on P2, C1 on P1): one open thread joins them.
        Assert.Contains("open", rules);
        Assert.Equal(1, await bench.Page.Locator("line.thread[data-net='IN']").CountAsync());
        Assert.Contains("J1.1", text);
        Assert.Contains("shorts IN to BASE", text);
        await bench.Page.ClickAsync("#findings li[data-rule='lead-wrong-pad']");
        Assert.Equal(1, await bench.Page.Locator("circle.end.lit[data-lead='J1.1']").CountAsync()); // the finding lights its lead
        await Shoot(bench, "editor-short.png");

        await bench.ClickAndWaitAsync("undo");
        Assert.DoesNotContain("lead-wrong-pad", await bench.FindingRulesAsync());
        Assert.Empty(await bench.FindingRulesAsync());
        Assert.False(run.Server.Session.Unsaved);
    }

    [ChromiumFact]
    public async Task A_turned_and_held_part_stays_where_it_is_when_the_rest_is_placed()
    {
        await using var run = await EditorRun.StartAsync();
        var bench = await BenchPage.OpenAsync(browser.Browser, run);
        await bench.ChoosePartAsync("R1");
        await bench.ClickAndWaitAsync("turn");
        await bench.ClickAndWaitAsync("hold");
        var held = BenchPage.Part(await run.PlanAsync(), "R1");
        Assert.Equal(180, held.GetProperty("rotation").GetInt32()); // R1 lay at 90°; one quarter turn clockwise more

        var before = await bench.RevisionAsync();
        await bench.Page.ClickAsync("#place");
        await bench.WaitForRevisionAsync(before + 1);
        var plan = await run.PlanAsync();
        var after = BenchPage.Part(plan, "R1");
        Assert.Equal(BenchPage.Xy(held.GetProperty("position")), BenchPage.Xy(after.GetProperty("position")));
        Assert.Equal(180, after.GetProperty("rotation").GetInt32());
        Assert.Contains("R1", plan.GetProperty("heldParts").EnumerateArray().Select(e => e.GetString()));
        Assert.Contains("placed the rest", await bench.Page.TextContentAsync("#notice-text"));
    }

    [ChromiumFact]
    public async Task Saving_writes_a_file_that_parses_and_padplan_check_agrees_with_the_page()
    {
        await using var run = await EditorRun.StartAsync();
        var bench = await BenchPage.OpenAsync(browser.Browser, run);
        await DragPartAsync(bench, run, "R3", -6, 0); // R3's leads leave their pad and plane landing: the check objects
        Assert.True(run.Server.Session.Unsaved);
        Assert.True(File.Exists(Path.Combine(run.Folder, "tiny-buffer.unsaved.padplan.json")));
        var pageRules = await bench.FindingRulesAsync();
        Assert.NotEmpty(pageRules);

        await bench.ClickAndWaitAsync("save");
        Assert.Contains("saved", await bench.Page.TextContentAsync("#notice-text"));
        Assert.False(File.Exists(Path.Combine(run.Folder, "tiny-buffer.unsaved.padplan.json")));
        var saved = ProjectFile.Read(run.ProjectPath);
        Assert.Equal(run.Server.Session.Current, saved);

        var json = Path.Combine(run.Folder, "check.json");
        // The editor judges the layout rules after every edit and runs no simulator; `check --ngspice none` adds only its
        // operating-point note that the simulation is off, so the page is compared with the rest.
        var exit = PadPlanCli.Run(["check", run.ProjectPath, "--json", json, "--quiet", "--ngspice", "none"], TextWriter.Null, TextWriter.Null);
        using var report = JsonDocument.Parse(File.ReadAllBytes(json));
        var cliRules = report.RootElement.GetProperty("findings").EnumerateArray().Select(f => f.GetProperty("rule").GetString()!).Where(r => r != "operating-point").ToList();
        Assert.Equal(cliRules, pageRules);
        Assert.Equal(pageRules.Contains("open") || await bench.Page.Locator("#findings li.error").CountAsync() > 0 ? 1 : 0, exit);
    }

    [ChromiumFact]
    public async Task Reloading_the_page_shows_the_same_view()
    {
        await using var run = await EditorRun.StartAsync();
        var bench = await BenchPage.OpenAsync(browser.Browser, run);
        await DragPartAsync(bench, run, "C2", 0, 3);
        await bench.Page.Keyboard.PressAsync("+");
        var before = await Picture(bench);
        var revision = await bench.RevisionAsync();
        bench.Page.Dialog += (_, d) => d.AcceptAsync();
        await bench.Page.ReloadAsync();
        await bench.WaitForRevisionAsync(revision);
        Assert.Equal(before, await Picture(bench));
    }

    [ChromiumFact]
    public async Task Saving_over_a_file_changed_on_disk_is_refused_and_a_copy_can_be_kept()
    {
        await using var run = await EditorRun.StartAsync();
        var bench = await BenchPage.OpenAsync(browser.Browser, run);
        await DragPartAsync(bench, run, "C2", 0, 2);
        var changed = File.ReadAllText(run.ProjectPath).Replace("\"tiny-buffer\"", "\"tiny-buffer, changed elsewhere\"", StringComparison.Ordinal);
        File.WriteAllText(run.ProjectPath, changed);

        await bench.Page.ClickAsync("#save");
        await bench.Page.WaitForSelectorAsync("#keep-copy:not([hidden])");
        Assert.Contains("changed on disk", await bench.Page.TextContentAsync("#notice-text"));
        Assert.Equal(changed, File.ReadAllText(run.ProjectPath));
        Assert.True(run.Server.Session.Unsaved);

        var revision = await bench.RevisionAsync();
        await bench.Page.ClickAsync("#keep-copy");
        await bench.WaitForRevisionAsync(revision + 1);
        var copy = Path.Combine(run.Folder, "tiny-buffer-2.padplan.json");
        Assert.Contains("tiny-buffer-2.padplan.json", await bench.Page.TextContentAsync("#notice-text"));
        Assert.Equal(run.Server.Session.Current, ProjectFile.Read(copy));
        Assert.Equal(changed, File.ReadAllText(run.ProjectPath));
        Assert.Equal("tiny-buffer-2.padplan.json", await bench.Page.TextContentAsync("#file"));
    }

    [ChromiumFact]
    public async Task Project_text_is_shown_as_text_never_as_markup()
    {
        await using var run = await EditorRun.StartAsync();
        var text = File.ReadAllText(run.ProjectPath).Replace("\"value\": \"47k\"", "\"value\": \"<img src=x onerror=window.hit=1>\"", StringComparison.Ordinal);
        File.WriteAllText(run.ProjectPath, text);
        await using var again = await EditorRunOn(run);
        var bench = await BenchPage.OpenAsync(browser.Browser, again);
        await bench.ChoosePartAsync("R1");
        Assert.Contains("<img src=x", await bench.Page.TextContentAsync("#chosen"));
        Assert.Equal(0, await bench.Page.Locator("img").CountAsync());
        Assert.Null(await bench.Page.EvaluateAsync<int?>("() => window.hit"));
    }

    private static async Task<EditorRun> EditorRunOn(EditorRun run)
    {
        await run.Server.StopAsync();
        return await EditorRun.StartOnAsync(run.Folder, run.ProjectPath);
    }

    /// <summary>
    /// J1's only lead lands on P1 (net IN); P2 carries net BASE. A lead soldered into a pad joins the pad's net, so
    /// moving J1 until its lead lands on P2 joins IN to BASE: a short (common practice, no source).
    /// </summary>
    internal static async Task ShortJ1ToBaseAsync(BenchPage bench, EditorRun run)
    {
        await bench.Page.SelectOptionAsync("#grid", "0.1");
        var plan = await run.PlanAsync();
        var j1 = BenchPage.Part(plan, "J1");
        var lead = BenchPage.Xy(BenchPage.Lead(j1, "1").GetProperty("landing"));
        var pad = BenchPage.Pad(plan, "P2");
        var p2 = (X: pad.GetProperty("x").GetDouble(), Y: pad.GetProperty("y").GetDouble());
        var grab = BodyCentre(j1);
        await bench.DragAsync(grab, (grab.X + p2.X - lead.X, grab.Y + p2.Y - lead.Y));
    }

    private static async Task DragPartAsync(BenchPage bench, EditorRun run, string reference, double dx, double dy)
    {
        var grab = BodyCentre(BenchPage.Part(await run.PlanAsync(), reference));
        await bench.DragAsync(grab, (grab.X + dx, grab.Y + dy));
    }

    private static (double X, double Y) BodyCentre(JsonElement part)
    {
        var points = part.GetProperty("body").EnumerateArray().Select(BenchPage.Xy).ToList();
        return ((points.Min(p => p.X) + points.Max(p => p.X)) / 2, (points.Min(p => p.Y) + points.Max(p => p.Y)) / 2);
    }

    // What the builder sees: every part's place and turn, every pad's place, the zoom and the findings.
    private static Task<string> Picture(BenchPage bench) => bench.Page.EvaluateAsync<string>(
        "() => JSON.stringify([document.getElementById('board').getAttribute('viewBox'), [...document.querySelectorAll('g.part')].map(g => g.dataset.ref + '@' + g.dataset.x + ',' + g.dataset.y), [...document.querySelectorAll('.island')].map(i => i.outerHTML), document.getElementById('findings').textContent, document.getElementById('unsaved').hidden])");

    // The screenshot in README and docs/workflow.md comes from this run: PADPLAN_UPDATE_SCREENSHOTS=1 writes it into docs/.
    internal static async Task Shoot(BenchPage bench, string name)
    {
        var bytes = await bench.Page.ScreenshotAsync();
        File.WriteAllBytes(Path.Combine(AppContext.BaseDirectory, name), bytes);
        if (Environment.GetEnvironmentVariable("PADPLAN_UPDATE_SCREENSHOTS") == "1")
            File.WriteAllBytes(Path.Combine(RepositoryRoot(), "docs", name), bytes);
    }

    private static string RepositoryRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "PadPlan.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("the repository root (PadPlan.sln) was not found above the test folder.");
    }
}
