using System.Diagnostics;
using System.Text.RegularExpressions;
using PadPlan.ProjectFiles;

namespace PadPlan.Editor.Tests;

/// <summary>
/// `padplan edit` as its own process, stopped the way a service manager or `kill` stops a program: SIGTERM (POSIX.1,
/// signal.h: the termination request) must stop it as Ctrl+C does, keeping the recovery copy and naming it.
/// </summary>
public sealed partial class EditStopTests(BrowserFixture browser) : IClassFixture<BrowserFixture>
{
    [ChromiumFact]
    public async Task SIGTERM_stops_the_editor_cleanly_and_keeps_the_recovery_copy_it_names()
    {
        if (!OperatingSystem.IsLinux()) return; // signals as POSIX defines them; Debian in CI
        using var copy = new ExampleCopy();
        var start = new ProcessStartInfo("dotnet", [Path.Combine(AppContext.BaseDirectory, "padplan.dll"), "edit", copy.ProjectPath])
        {
            RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false,
        };
        // No display and no --no-browser: the machine has no browser to open, so the editor must print the address to open.
        start.Environment.Remove("DISPLAY");
        start.Environment.Remove("WAYLAND_DISPLAY");
        using var editor = Process.Start(start)!;
        var err = new System.Text.StringBuilder();
        editor.ErrorDataReceived += (_, e) => { lock (err) err.AppendLine(e.Data); };
        editor.BeginErrorReadLine();
        string Err() { lock (err) return err.ToString(); }
        Match address = Match.Empty;
        for (var i = 0; i < 600 && !(address = Address().Match(Err())).Success; i++) await Task.Delay(100);
        Assert.True(address.Success, "no address to open on stderr: " + Err());
        Assert.Contains("open this address yourself", Err());

        // One change through the page, so there is something unsaved to keep.
        var page = await (await browser.Browser.NewContextAsync()).NewPageAsync();
        page.SetDefaultTimeout(180_000);
        await page.GotoAsync(address.Value);
        await page.WaitForFunctionAsync("() => document.getElementById('status').textContent.startsWith('revision 0;')");
        await page.Locator("polygon.body[data-ref='C2']").ClickAsync(new() { Force = true });
        await page.ClickAsync("#turn");
        await page.WaitForFunctionAsync("() => document.getElementById('status').textContent.startsWith('revision 1;')");
        var recovery = copy.Beside("tiny-buffer.unsaved.padplan.json");
        Assert.True(File.Exists(recovery));
        var kept = ProjectFile.Read(recovery);

        using (var kill = Process.Start("kill", ["-TERM", editor.Id.ToString(System.Globalization.CultureInfo.InvariantCulture)])) await kill!.WaitForExitAsync();
        using var wait = new CancellationTokenSource(TimeSpan.FromSeconds(60));
        await editor.WaitForExitAsync(wait.Token);
        Assert.Equal(0, editor.ExitCode);
        Assert.Contains("kept in tiny-buffer.unsaved.padplan.json", Err());
        Assert.Equal(kept, ProjectFile.Read(recovery));
        Assert.False(File.Exists(recovery + ".lock")); // its claim on the name is let go
        Assert.Equal(ProjectFile.Read(copy.ProjectPath).Name, kept.Name);
        await page.Context.CloseAsync();
    }

    [GeneratedRegex(@"http://127\.0\.0\.1:\d+/\?t=[0-9a-f]+")]
    private static partial Regex Address();
}
