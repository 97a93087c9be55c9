using System.Text.Json;
using Microsoft.Playwright;

namespace PadPlan.Editor.Tests;

/// <summary>The editor page in a browser tab, with the few moves the tests make: board millimetres to screen pixels, drags, clicks on items.</summary>
public sealed class BenchPage(IPage page, EditorRun run)
{
    public IPage Page { get; } = page;

    public static async Task<BenchPage> OpenAsync(IBrowser browser, EditorRun run)
    {
        var context = await browser.NewContextAsync(new BrowserNewContextOptions { ViewportSize = new ViewportSize { Width = 1280, Height = 800 } });
        var page = await context.NewPageAsync();
        // The test machine may be shared and slow; a wait that runs out is a failure, never a timing claim.
        page.SetDefaultTimeout(180_000);
        var bench = new BenchPage(page, run);
        await page.GotoAsync(run.Server.Url.ToString());
        await bench.WaitForRevisionAsync(0);
        return bench;
    }

    /// <summary>Waits until the page shows the given revision of the plan (each change raises it by one).</summary>
    public Task WaitForRevisionAsync(int revision) =>
        Page.WaitForFunctionAsync($"() => document.getElementById('status').textContent.startsWith('revision {revision};')");

    public async Task<int> RevisionAsync() => (await run.PlanAsync()).GetProperty("revision").GetInt32();

    /// <summary>Screen position of a point given in board millimetres, through the drawing's own transform.</summary>
    public async Task<(float X, float Y)> ScreenAsync(double x, double y)
    {
        var p = await Page.EvaluateAsync<double[]>(
            "([x, y]) => { const s = document.getElementById('board'); const p = s.createSVGPoint(); p.x = x; p.y = y; const q = p.matrixTransform(s.getScreenCTM()); return [q.x, q.y]; }",
            new[] { x, y });
        return ((float)p[0], (float)p[1]);
    }

    /// <summary>Drags with the mouse from one board point to another, in small steps as a hand would.</summary>
    public async Task DragAsync((double X, double Y) from, (double X, double Y) to)
    {
        var a = await ScreenAsync(from.X, from.Y);
        var b = await ScreenAsync(to.X, to.Y);
        var before = await RevisionAsync();
        await Page.Mouse.MoveAsync(a.X, a.Y);
        await Page.Mouse.DownAsync();
        await Page.Mouse.MoveAsync(b.X, b.Y, new MouseMoveOptions { Steps = 8 });
        await Page.Mouse.UpAsync();
        await WaitForRevisionAsync(before + 1);
    }

    /// <summary>Clicks a part's body to choose it.</summary>
    public Task ChoosePartAsync(string reference) => Page.Locator($"polygon.body[data-ref='{reference}']").ClickAsync(new LocatorClickOptions { Force = true });

    public async Task ClickAndWaitAsync(string buttonId)
    {
        var before = await RevisionAsync();
        await Page.ClickAsync("#" + buttonId);
        await WaitForRevisionAsync(before + 1);
    }

    public async Task<List<string>> FindingRulesAsync() => [.. await Page.Locator("#findings li").EvaluateAllAsync<string[]>("items => items.map(i => i.dataset.rule)")];

    public static (double X, double Y) Xy(JsonElement pair) => (pair[0].GetDouble(), pair[1].GetDouble());

    public static JsonElement Part(JsonElement plan, string reference) =>
        plan.GetProperty("geometry").GetProperty("parts").EnumerateArray().First(p => p.GetProperty("ref").GetString() == reference);

    public static JsonElement Lead(JsonElement part, string pin) => part.GetProperty("leads").EnumerateArray().First(l => l.GetProperty("pin").GetString() == pin);

    public static JsonElement Pad(JsonElement plan, string id) =>
        plan.GetProperty("geometry").GetProperty("pads").EnumerateArray().First(p => p.GetProperty("id").GetString() == id);
}
