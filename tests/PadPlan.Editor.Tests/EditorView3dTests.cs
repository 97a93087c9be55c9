using SkiaSharp;

namespace PadPlan.Editor.Tests;

/// <summary>Chromium with WebGL drawn in software (SwiftShader through ANGLE: headless Debian chromium has no GPU).</summary>
public sealed class WebGlBrowserFixture : BrowserFixture
{
    protected override string[] Args =>
    [
        "--no-sandbox", "--use-angle=swiftshader", "--enable-unsafe-swiftshader", "--disable-quic", "--no-first-run",
        "--disable-background-networking", "--disable-component-update", "--disable-sync",
    ];
}

/// <summary>The 3D view of the bench in a real Chromium (WebGL by SwiftShader): it draws the board, and a choice made in either view shows in the other.</summary>
public sealed class EditorView3dTests(WebGlBrowserFixture browser) : IClassFixture<WebGlBrowserFixture>
{
    [ChromiumFact]
    public async Task The_3d_view_shows_the_board_and_shares_the_choice_with_the_flat_bench()
    {
        await using var run = await EditorRun.StartAsync();
        var bench = await BenchPage.OpenAsync(browser.Browser, run);
        await bench.ChoosePartAsync("Q1");
        await bench.Page.ClickAsync("#view3d-toggle");
        await bench.Page.WaitForFunctionAsync("() => document.getElementById('view3d').dataset.revision === '0'");
        Assert.Equal("Q1", await bench.Page.GetAttributeAsync("#view3d", "data-chosen"));

        var shot = await bench.Page.Locator("#view3d canvas").ScreenshotAsync();
        File.WriteAllBytes(Path.Combine(AppContext.BaseDirectory, "editor-3d.png"), shot);
        if (Environment.GetEnvironmentVariable("PADPLAN_UPDATE_SCREENSHOTS") == "1")
            File.WriteAllBytes(Path.Combine(Root(), "docs", "editor-3d.png"), shot);
        using var image = SKBitmap.Decode(shot);
        // The board's copper face (glTF base colour 0.56, 0.25, 0.13, linear) lit from above reads red-brown: red well
        // above green, green above blue. A board seen at an angle fills a good share of the canvas.
        var copper = 0;
        var chosen = 0;
        for (var y = 0; y < image.Height; y += 2)
            for (var x = 0; x < image.Width; x += 2)
            {
                var c = image.GetPixel(x, y);
                if (c.Red > 80 && c.Red > c.Green + 25 && c.Green > c.Blue && c.Blue < 120) copper++;
                if (c.Red > 200 && c.Green > 80 && c.Green < 170 && c.Blue < 60) chosen++;
            }
        var samples = (image.Width / 2) * (image.Height / 2);
        Assert.True(copper > samples / 10, $"only {copper} of {samples} sampled pixels look like the copper board");
        Assert.True(chosen > 20, $"the chosen part Q1 is not lit in the 3D view ({chosen} orange pixels)");

        // Clicking C2 in the 3D view chooses it on the flat bench too.
        var at = await bench.Page.EvaluateAsync<double[]?>("() => window.padplanView3d.screenOf('C2')");
        Assert.NotNull(at);
        await bench.Page.Mouse.ClickAsync((float)at![0], (float)at[1]);
        await bench.Page.WaitForFunctionAsync("() => document.getElementById('chosen').textContent.includes('C2')");
        Assert.Equal("C2", await bench.Page.GetAttributeAsync("#view3d", "data-chosen"));
    }

    private static string Root()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "PadPlan.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("PadPlan.sln not found above the test folder.");
    }
}
