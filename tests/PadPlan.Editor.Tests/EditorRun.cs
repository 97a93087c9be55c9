using System.Net.Http.Headers;
using System.Text.Json;
using PadPlan.Editor.Serving;

namespace PadPlan.Editor.Tests;

/// <summary>A copy of an example project in a fresh folder, with an editor server running on it.</summary>
public sealed class EditorRun : IAsyncDisposable
{
    private EditorRun(string folder, string project, EditorServer server)
    {
        Folder = folder;
        ProjectPath = project;
        Server = server;
    }

    public string Folder { get; }
    public string ProjectPath { get; }
    public EditorServer Server { get; }
    public string Origin => $"http://127.0.0.1:{Server.Port}";

    public static async Task<EditorRun> StartAsync()
    {
        var copy = new ExampleCopy();
        return await StartOnAsync(copy.Folder, copy.ProjectPath);
    }

    /// <summary>A server on a project already in place (e.g. after the test changed the file).</summary>
    public static async Task<EditorRun> StartOnAsync(string folder, string project) =>
        new(folder, project, await EditorServer.StartAsync(new EditorOptions(project, Effort: PadPlan.Planning.Effort.Quick)));

    /// <summary>The plan as the server holds it, read with the token like the page does.</summary>
    public async Task<JsonElement> PlanAsync()
    {
        using var client = Client();
        using var response = await client.GetAsync("/api/plan");
        response.EnsureSuccessStatusCode();
        return JsonDocument.Parse(await response.Content.ReadAsStringAsync()).RootElement.Clone();
    }

    public HttpClient Client(bool withToken = true)
    {
        var client = new HttpClient { BaseAddress = new Uri(Origin) };
        if (withToken) client.DefaultRequestHeaders.Add(RequestGuard.TokenHeader, Server.Token);
        client.DefaultRequestHeaders.Accept.Add(new MediaTypeWithQualityHeaderValue("application/json"));
        return client;
    }

    public async ValueTask DisposeAsync()
    {
        await Server.DisposeAsync();
        try
        {
            Directory.Delete(Folder, recursive: true);
        }
        catch (IOException)
        {
            // a leftover temporary folder is harmless
        }
    }
}
