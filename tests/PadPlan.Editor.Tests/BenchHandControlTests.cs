using System.Text.Json;
using PadPlan.Cli;
using PadPlan.ProjectFiles;

namespace PadPlan.Editor.Tests;

/// <summary>
/// The bench in Chromium for hand control in real use: the swap to the part on hand, the polarity and pin marks, values,
/// highlights that follow the findings, the T key on the part that was clicked, and edits that cannot be kept.
/// </summary>
public sealed class BenchHandControlTests(BrowserFixture browser) : IClassFixture<BrowserFixture>
{
    /// <summary>The crystal oscillator example, imported and placed once (seed 1) by the command line, then copied per test.</summary>
    private static readonly Lazy<byte[]> Oscillator = new(() =>
    {
        var folder = Path.Combine(Path.GetTempPath(), "padplan-editor-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(folder);
        var path = Path.Combine(folder, "osc.padplan.json");
        var netlist = Path.Combine(AppContext.BaseDirectory, "examples", "xtal-osc-40m", "xtal-osc-40m.ppn");
        Assert.Equal(0, PadPlanCli.Run(["import", netlist, "-o", path, "--quiet"], TextWriter.Null, TextWriter.Null));
        Assert.Equal(0, PadPlanCli.Run(["place", path, "--quiet"], TextWriter.Null, TextWriter.Null));
        return File.ReadAllBytes(path);
    });

    private static async Task<EditorRun> OscillatorRunAsync()
    {
        var copy = new ExampleCopy();
        var path = copy.Beside("osc.padplan.json");
        File.WriteAllBytes(path, Oscillator.Value);
        return await EditorRun.StartOnAsync(copy.Folder, path);
    }

    [ChromiumFact]
    public async Task A_finding_taken_back_leaves_nothing_lit_and_Esc_clears_a_highlight()
    {
        await using var run = await EditorRun.StartAsync();
        var bench = await BenchPage.OpenAsync(browser.Browser, run);
        await EditorBrowserTests.ShortJ1ToBaseAsync(bench, run);
        await bench.Page.ClickAsync("#findings li[data-rule='lead-wrong-pad']");
        Assert.True(await bench.Page.Locator("#board .lit").CountAsync() > 0);

        await bench.ClickAndWaitAsync("undo");
        Assert.Empty(await bench.FindingRulesAsync());
        Assert.Equal(0, await bench.Page.Locator("#board .lit").CountAsync()); // the issue saw 11 stay lit here

        await bench.ClickAndWaitAsync("redo");
        Assert.Equal(0, await bench.Page.Locator("#board .lit").CountAsync()); // the finding is back, but nobody clicked it
        await bench.Page.ClickAsync("#findings li[data-rule='lead-wrong-pad']");
        Assert.True(await bench.Page.Locator("#board .lit").CountAsync() > 0);
        await bench.Page.Keyboard.PressAsync("Escape");
        Assert.Equal(0, await bench.Page.Locator("#board .lit").CountAsync());
        Assert.Equal(0, await bench.Page.Locator("#findings li.on").CountAsync());
    }

    [ChromiumFact]
    public async Task T_turns_the_part_clicked_even_when_the_click_lands_on_its_lead_end()
    {
        await using var run = await EditorRun.StartAsync();
        var bench = await BenchPage.OpenAsync(browser.Browser, run);
        await bench.ChoosePartAsync("J1");
        var plan = await run.PlanAsync();
        var q1 = BenchPage.Part(plan, "Q1");
        var j1Before = BenchPage.Part(plan, "J1").GetProperty("rotation").GetInt32();
        var q1Before = q1.GetProperty("rotation").GetInt32();
        // A TO-92 stands upright: its leads leave the underside, so the lead ends lie inside the body outline and a click
        // in its middle lands on the middle lead's end, as in the issue.
        var middle = BenchPage.Xy(q1.GetProperty("leads")[1].GetProperty("landing"));
        var at = await bench.ScreenAsync(middle.X, middle.Y);
        Assert.Equal("end", await bench.Page.EvaluateAsync<string>("([x, y]) => document.elementFromPoint(x, y).classList[0]", new double[] { at.X, at.Y }));
        await bench.Page.Mouse.ClickAsync(at.X, at.Y);
        Assert.StartsWith("part Q1", await bench.Page.TextContentAsync("#chosen"));

        var revision = await bench.RevisionAsync();
        await bench.Page.Keyboard.PressAsync("t");
        await bench.WaitForRevisionAsync(revision + 1);
        var after = await run.PlanAsync();
        Assert.Equal((q1Before + 90) % 360, BenchPage.Part(after, "Q1").GetProperty("rotation").GetInt32());
        Assert.Equal(j1Before, BenchPage.Part(after, "J1").GetProperty("rotation").GetInt32());
    }

    [ChromiumFact]
    public async Task The_bench_shows_polarity_and_pin_marks_values_and_pad_ids_above_bodies()
    {
        await using var run = await OscillatorRunAsync();
        var bench = await BenchPage.OpenAsync(browser.Browser, run);
        var plan = await run.PlanAsync();

        // The diode's band sits at its cathode end (JEDEC DO-35: the band marks the cathode): nearer K's exit than A's.
        var d1 = BenchPage.Part(plan, "D1");
        var band = await bench.Page.Locator("g.part[data-ref='D1'] polygon.mark.band").GetAttributeAsync("points");
        Assert.NotNull(band);
        var bandAt = Mean(band!.Split(' ').Select(p => p.Split(',').Select(double.Parse).ToArray()).Select(p => (p[0], p[1])));
        var k = BenchPage.Xy(BenchPage.Lead(d1, "K").GetProperty("exit"));
        var a = BenchPage.Xy(BenchPage.Lead(d1, "A").GetProperty("exit"));
        Assert.True(Distance(bandAt, k) < Distance(bandAt, a), $"band at {bandAt}, K at {k}, A at {a}");

        // The transistors' lead ends carry the pin names of their pinout (EBC as the netlist gives it), the electrolytic its +.
        Assert.Equal(["E", "B", "C"], await bench.Page.Locator("g.part[data-ref='Q1'] text.pin").AllTextContentsAsync());
        Assert.Contains("+", await bench.Page.Locator("g.part[data-ref='C1'] text.pin").AllTextContentsAsync());
        // The toroid's winding starts carry their phasing dots.
        Assert.True(await bench.Page.Locator("g.part[data-ref='T1'] polygon.mark.winding").CountAsync() > 0);

        // Values: on hover (the body's title) and on the V toggle.
        Assert.Contains("470R", await bench.Page.Locator("polygon.body[data-ref='R1'] title").TextContentAsync());
        Assert.Equal(0, await bench.Page.Locator("text.value").CountAsync());
        await bench.Page.Keyboard.PressAsync("v");
        Assert.Equal(plan.GetProperty("geometry").GetProperty("parts").GetArrayLength(), await bench.Page.Locator("text.value").CountAsync());

        // Pad ids are drawn after every body, so none is hidden under one.
        Assert.True(await bench.Page.EvaluateAsync<bool>("() => { const ids = document.getElementById('padids'); const parts = document.getElementById('parts'); return !!(parts.compareDocumentPosition(ids) & Node.DOCUMENT_POSITION_FOLLOWING); }"));
        Assert.Equal(await bench.Page.Locator(".island").CountAsync(), await bench.Page.Locator("#padids text.padid").CountAsync());
        await EditorBrowserTests.Shoot(bench, "editor-marks.png");
    }

    [ChromiumFact]
    public async Task Swap_part_lists_footprints_with_the_right_leads_and_puts_a_1_W_resistor_in()
    {
        await using var run = await OscillatorRunAsync();
        var bench = await BenchPage.OpenAsync(browser.Browser, run);
        var before = ProjectFile.Read(run.ProjectPath);
        await bench.ChoosePartAsync("R1");
        await bench.Page.ClickAsync("#swap-open");
        await bench.Page.WaitForSelectorAsync("#swap-panel:not([hidden])");
        var offered = await bench.Page.Locator("#swap-footprint option").AllTextContentsAsync();
        Assert.Contains("res-axial-1w", offered);
        Assert.DoesNotContain("to92", offered); // three leads: not for a resistor
        await bench.Page.SelectOptionAsync("#swap-footprint", "res-axial-1w");
        await EditorBrowserTests.Shoot(bench, "editor-swap.png");
        var revision = await bench.RevisionAsync();
        await bench.Page.ClickAsync("#swap-go");
        await bench.WaitForRevisionAsync(revision + 1);

        var after = run.Server.Session.Current;
        Assert.Equal("res-axial-1w", after.FindPart("R1")!.Footprint);
        Assert.Equal(0, PadPlan.Rules.Checker.Check(after).Errors);
        var old = before.Layout!.Placements.ToDictionary(p => p.Ref);
        var others = after.Layout!.Placements.Where(p => p.Ref != "R1").ToList();
        Assert.True(others.Count(p => old[p.Ref].Position == p.Position && old[p.Ref].Rotation == p.Rotation) >= 0.7 * others.Count);
        Assert.Contains("swapped R1", await bench.Page.TextContentAsync("#notice-text"));

        // Too big for its corner: refused with the reason and the way on, and the plan stays as it was.
        await bench.ChoosePartAsync("R8");
        await bench.Page.ClickAsync("#swap-open");
        await bench.Page.WaitForSelectorAsync("#swap-panel:not([hidden])");
        await bench.Page.SelectOptionAsync("#swap-footprint", "res-axial-2w");
        var kept = run.Server.Session.Current;
        await bench.Page.ClickAsync("#swap-go");
        await bench.Page.WaitForFunctionAsync("() => document.getElementById('notice-text').textContent.includes('does not fit')");
        Assert.Contains("free more", await bench.Page.TextContentAsync("#notice-text"));
        Assert.Equal(kept, run.Server.Session.Current);
    }

    [ChromiumFact]
    public async Task An_edit_that_cannot_be_kept_says_why_and_the_bench_stays_as_it_was()
    {
        var copy = new ExampleCopy();
        // A folder where the recovery copy must go: its write fails as on a full disk or in a read-only folder.
        Directory.CreateDirectory(copy.Beside("tiny-buffer.unsaved.padplan.json"));
        await using var run = await EditorRun.StartOnAsync(copy.Folder, copy.ProjectPath);
        var bench = await BenchPage.OpenAsync(browser.Browser, run);
        await bench.ChoosePartAsync("C2");
        await bench.Page.ClickAsync("#turn");
        await bench.Page.WaitForFunctionAsync("() => document.getElementById('notice-text').textContent.includes('not applied')");
        Assert.Contains("could not be written", await bench.Page.TextContentAsync("#notice-text"));
        Assert.Equal(0, await bench.RevisionAsync());
        Assert.True(await bench.Page.Locator("#unsaved").IsHiddenAsync());

        // A position outside the project format's range (±2000 mm) is refused with the range, over the same interface.
        using var client = run.Client();
        client.DefaultRequestHeaders.Add("Origin", run.Origin);
        using var far = await client.PostAsync("/api/edit", new StringContent("""{"kind":"move-pad","pad":"P2","x":-2500,"y":5}""", System.Text.Encoding.UTF8, "application/json"));
        Assert.Equal(422, (int)far.StatusCode);
        using var body = JsonDocument.Parse(await far.Content.ReadAsStringAsync());
        Assert.Contains("2000", body.RootElement.GetProperty("message").GetString());
        Assert.Equal(0, await bench.RevisionAsync());
    }

    private static (double X, double Y) Mean(IEnumerable<(double X, double Y)> points)
    {
        var list = points.ToList();
        return (list.Average(p => p.X), list.Average(p => p.Y));
    }

    private static double Distance((double X, double Y) a, (double X, double Y) b) => Math.Sqrt((a.X - b.X) * (a.X - b.X) + (a.Y - b.Y) * (a.Y - b.Y));
}
