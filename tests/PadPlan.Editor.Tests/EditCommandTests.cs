using System.Net.Http.Headers;
using System.Text.RegularExpressions;
using PadPlan.Cli;
using PadPlan.Editor.Serving;

namespace PadPlan.Editor.Tests;

/// <summary>`padplan edit` on the command line: exit codes for bad input, and a whole run from start to "finish".</summary>
public sealed partial class EditCommandTests : IDisposable
{
    private readonly ExampleCopy _copy = new();
    private string Folder => _copy.Folder;
    private string ProjectPath => _copy.ProjectPath;

    public void Dispose() => _copy.Dispose();

    [Fact]
    public void A_missing_project_exits_2_and_names_the_file()
    {
        var err = new StringWriter();
        Assert.Equal(ExitCodes.InputError, PadPlanCli.Run(["edit", Path.Combine(Folder, "nope.padplan.json"), "--no-browser"], TextWriter.Null, err));
        Assert.Contains("nope.padplan.json", err.ToString());
    }

    [Fact]
    public void A_port_out_of_range_exits_2()
    {
        var err = new StringWriter();
        Assert.Equal(ExitCodes.InputError, PadPlanCli.Run(["edit", ProjectPath, "--no-browser", "--port", "70000"], TextWriter.Null, err));
        Assert.Contains("--port", err.ToString());
    }

    [Fact]
    public void A_recovery_copy_from_an_earlier_session_stops_a_new_session_from_overwriting_it()
    {
        var recovery = Path.Combine(Folder, "tiny-buffer.unsaved.padplan.json");
        File.WriteAllText(recovery, "earlier edits");
        var err = new StringWriter();
        Assert.Equal(ExitCodes.InputError, PadPlanCli.Run(["edit", ProjectPath, "--no-browser"], TextWriter.Null, err));
        Assert.Contains("tiny-buffer.unsaved.padplan.json", err.ToString());
        Assert.Equal("earlier edits", File.ReadAllText(recovery));
    }

    [Fact]
    public async Task It_prints_the_address_serves_the_page_and_stops_when_the_page_says_finish()
    {
        var written = new StringWriter();
        var output = TextWriter.Synchronized(written);
        string Printed()
        {
            lock (output) return written.ToString(); // the synchronized writer locks on itself
        }
        var run = Task.Run(() => PadPlanCli.Run(["edit", ProjectPath, "--no-browser"], output, TextWriter.Null));
        Match address = Match.Empty;
        for (var i = 0; i < 600 && !(address = Address().Match(Printed())).Success; i++) await Task.Delay(100);
        Assert.True(address.Success, "edit printed no address: " + Printed());
        var url = new Uri(address.Value);
        Assert.Equal("127.0.0.1", url.Host);
        using var client = new HttpClient { BaseAddress = new Uri($"http://127.0.0.1:{url.Port}") };
        Assert.Contains("PadPlan bench", await client.GetStringAsync(url.PathAndQuery));
        var token = url.Query.Split('=')[1];
        client.DefaultRequestHeaders.Add(RequestGuard.TokenHeader, token);
        (await client.PostAsync("/api/finish", null)).EnsureSuccessStatusCode();
        Assert.Equal(ExitCodes.Success, await run.WaitAsync(TimeSpan.FromMinutes(2)));
    }

    [Fact]
    public async Task The_stop_message_names_the_recovery_copy_only_when_it_is_on_disk()
    {
        var written = new StringWriter();
        var stderr = new StringWriter();
        var errors = TextWriter.Synchronized(stderr);
        var output = TextWriter.Synchronized(written);
        string Printed()
        {
            lock (output) return written.ToString();
        }
        var run = Task.Run(() => PadPlanCli.Run(["edit", ProjectPath, "--no-browser"], output, errors));
        Match address = Match.Empty;
        for (var i = 0; i < 600 && !(address = Address().Match(Printed())).Success; i++) await Task.Delay(100);
        Assert.True(address.Success, "edit printed no address: " + Printed());
        var url = new Uri(address.Value);
        using var client = new HttpClient { BaseAddress = new Uri($"http://127.0.0.1:{url.Port}") };
        client.DefaultRequestHeaders.Add(RequestGuard.TokenHeader, url.Query.Split('=')[1]);
        client.DefaultRequestHeaders.Add("Origin", $"http://127.0.0.1:{url.Port}");
        (await client.PostAsync("/api/edit", new StringContent("""{"kind":"turn-part","ref":"C2"}""", System.Text.Encoding.UTF8, "application/json"))).EnsureSuccessStatusCode();
        var recovery = Path.Combine(Folder, "tiny-buffer.unsaved.padplan.json");
        Assert.True(File.Exists(recovery));
        File.Delete(recovery); // gone behind the editor's back (a clean-up, another program)
        (await client.PostAsync("/api/finish", null)).EnsureSuccessStatusCode();
        Assert.Equal(ExitCodes.Success, await run.WaitAsync(TimeSpan.FromMinutes(2)));
        var said = stderr.ToString();
        Assert.DoesNotContain("kept in", said);
        Assert.Contains("no recovery copy is on disk", said);
    }

    [GeneratedRegex(@"http://127\.0\.0\.1:\d+/\?t=[0-9a-f]+")]
    private static partial Regex Address();
}
