using System.Net;
using System.Text;
using PadPlan.Editor.Serving;

namespace PadPlan.Editor.Tests;

/// <summary>The server's own protection, checked with plain HTTP requests (no browser needed).</summary>
public sealed class RequestGuardTests
{
    [Fact]
    public async Task A_request_without_the_token_is_forbidden()
    {
        await using var run = await EditorRun.StartAsync();
        using var client = run.Client(withToken: false);
        // RFC 9110, 15.5.4: 403 Forbidden, the server understood the request but refuses it.
        Assert.Equal(HttpStatusCode.Forbidden, (await client.GetAsync("/api/plan")).StatusCode);
        Assert.Equal(HttpStatusCode.Forbidden, (await client.GetAsync("/")).StatusCode);
        Assert.Equal(HttpStatusCode.Forbidden, (await client.GetAsync("/?t=0000")).StatusCode);
        Assert.Equal(HttpStatusCode.Forbidden, (await client.PostAsync("/api/save", null)).StatusCode);
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync($"/?t={run.Server.Token}")).StatusCode);
    }

    [Fact]
    public async Task The_token_in_the_query_opens_the_page_but_not_the_interface()
    {
        await using var run = await EditorRun.StartAsync();
        using var client = run.Client(withToken: false);
        Assert.Equal(HttpStatusCode.Forbidden, (await client.GetAsync($"/api/plan?t={run.Server.Token}")).StatusCode);
    }

    [Theory]
    [InlineData("attacker.example")]
    [InlineData("attacker.example:{port}")]
    [InlineData("127.0.0.1.attacker.example:{port}")]
    [InlineData("127.0.0.1:1")]
    public async Task A_request_with_a_foreign_host_header_is_refused(string host)
    {
        await using var run = await EditorRun.StartAsync();
        using var client = run.Client();
        using var request = new HttpRequestMessage(HttpMethod.Get, "/api/plan");
        request.Headers.Host = host.Replace("{port}", run.Server.Port.ToString(), StringComparison.Ordinal);
        var response = await client.SendAsync(request);
        // DNS rebinding: a page from another site reaches us under its own name, which the Host header gives away.
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Contains("refused", await response.Content.ReadAsStringAsync(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_loopback_names_are_accepted_as_host()
    {
        await using var run = await EditorRun.StartAsync();
        using var client = run.Client();
        foreach (var host in new[] { "127.0.0.1", "localhost" })
        {
            using var request = new HttpRequestMessage(HttpMethod.Get, "/api/plan");
            request.Headers.Host = $"{host}:{run.Server.Port}";
            Assert.Equal(HttpStatusCode.OK, (await client.SendAsync(request)).StatusCode);
        }
    }

    [Fact]
    public async Task A_change_from_another_origin_is_refused_and_changes_nothing()
    {
        await using var run = await EditorRun.StartAsync();
        using var client = run.Client();
        var before = File.ReadAllBytes(run.ProjectPath);
        using var request = new HttpRequestMessage(HttpMethod.Post, "/api/edit")
        {
            Content = new StringContent("""{"kind":"remove-pad","pad":"P1"}""", Encoding.UTF8, "application/json"),
        };
        request.Headers.Add("Origin", "http://attacker.example");
        Assert.Equal(HttpStatusCode.Forbidden, (await client.SendAsync(request)).StatusCode);
        Assert.False(run.Server.Session.Unsaved);
        Assert.Equal(before, File.ReadAllBytes(run.ProjectPath));
    }

    [Fact]
    public async Task An_oversized_body_is_refused()
    {
        await using var run = await EditorRun.StartAsync();
        using var client = run.Client();
        var big = "{\"kind\":\"add-pad\",\"net\":\"" + new string('x', (int)EditorOptions.MaxBodyBytes) + "\"}";
        var response = await client.PostAsync("/api/edit", new StringContent(big, Encoding.UTF8, "application/json"));
        // RFC 9110, 15.5.14: 413 Content Too Large.
        Assert.Equal(HttpStatusCode.RequestEntityTooLarge, response.StatusCode);
        Assert.False(run.Server.Session.Unsaved);
    }

    [Fact]
    public async Task The_server_listens_on_loopback_only()
    {
        await using var run = await EditorRun.StartAsync();
        Assert.Equal("127.0.0.1", run.Server.Url.Host);
        var other = System.Net.NetworkInformation.NetworkInterface.GetAllNetworkInterfaces()
            .SelectMany(n => n.GetIPProperties().UnicastAddresses).Select(a => a.Address)
            .FirstOrDefault(a => a.AddressFamily == System.Net.Sockets.AddressFamily.InterNetwork && !IPAddress.IsLoopback(a));
        if (other is null) return; // no other address on this machine to try
        using var socket = new System.Net.Sockets.TcpClient();
        await Assert.ThrowsAnyAsync<System.Net.Sockets.SocketException>(() => socket.ConnectAsync(other, run.Server.Port));
    }
}
