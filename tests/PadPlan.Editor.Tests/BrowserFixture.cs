using Microsoft.Playwright;

namespace PadPlan.Editor.Tests;

/// <summary>One headless Debian chromium for all browser tests of a class (Playwright cannot download its own browser here).</summary>
public class BrowserFixture : IAsyncLifetime
{
    private IPlaywright? _playwright;
    private IBrowser? _browser;

    public IBrowser Browser => _browser ?? throw new InvalidOperationException(
        $"chromium did not start; install Debian's 'chromium' package ({ChromiumFactAttribute.ChromiumPath}).");

    public async Task InitializeAsync()
    {
        if (!File.Exists(ChromiumFactAttribute.ChromiumPath)) return;
        _playwright = await Playwright.CreateAsync();
        _browser = await _playwright.Chromium.LaunchAsync(new BrowserTypeLaunchOptions
        {
            ExecutablePath = ChromiumFactAttribute.ChromiumPath,
            Headless = true,
            Args = Args,
        });
    }

    /// <summary>Chromium's command-line switches for this fixture's browser.</summary>
    protected virtual string[] Args =>
    [
        "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
        "--disable-component-update", "--disable-sync",
    ];

    public async Task DisposeAsync()
    {
        if (_browser is not null) await _browser.DisposeAsync();
        _playwright?.Dispose();
    }
}
