using System.Net;
using System.Text;

namespace PadPlan.Editor.Tests.Regressions;

/// <summary>Regression (issue 25): /api/save answered 200 to a 70 KB body it never read. Only an edit carries a body now.</summary>
public sealed class Regression_SaveIgnoredItsBody
{
    [Theory]
    [InlineData("/api/save")]
    [InlineData("/api/keep-copy")]
    [InlineData("/api/undo")]
    [InlineData("/api/place")]
    [InlineData("/api/finish")]
    public async Task A_request_that_takes_no_body_refuses_one_and_changes_nothing(string path)
    {
        await using var run = await EditorRun.StartAsync();
        var before = await File.ReadAllBytesAsync(run.ProjectPath);
        using var client = run.Client();
        using var body = new StringContent(new string('x', 60 * 1024), Encoding.UTF8, "text/plain");
        var response = await client.PostAsync(path, body);
        // RFC 9110, 15.5.1: 400 Bad Request, the server will not process a request it sees as a client error.
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Contains("takes no body", await response.Content.ReadAsStringAsync(), StringComparison.Ordinal);
        Assert.Equal(before, await File.ReadAllBytesAsync(run.ProjectPath));
        Assert.Single(Directory.GetFiles(run.Folder, "*.padplan.json"));
    }

    [Fact]
    public async Task The_same_requests_without_a_body_still_work()
    {
        await using var run = await EditorRun.StartAsync();
        using var client = run.Client();
        Assert.Equal(HttpStatusCode.OK, (await client.PostAsync("/api/save", null)).StatusCode);
    }
}
