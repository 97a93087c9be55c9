using System.Security.Cryptography;
using System.Text;
using Microsoft.AspNetCore.Http;

namespace PadPlan.Editor.Serving;

/// <summary>
/// The checks every request passes before it reaches the editor: the Host header must name the loopback address and
/// our port (so a page from another site cannot reach us through DNS rebinding), the per-run token must match
/// (header; for the page itself, the query of the URL the browser was given), and a state-changing request must come
/// from our own origin. Only an edit carries a body; any other request that brings one is refused, so nothing the
/// server does not read can ride along.
/// </summary>
public sealed class RequestGuard(string token, Func<int> port)
{
    public const string TokenHeader = "X-PadPlan-Token";
    public const string TokenQuery = "t";
    /// <summary>The one request that carries a body (a JSON edit).</summary>
    public const string BodyPath = "/api/edit";
    private readonly byte[] _token = Encoding.UTF8.GetBytes(token);

    public async Task InvokeAsync(HttpContext context, RequestDelegate next)
    {
        var refusal = Refusal(context.Request);
        if (refusal is { } r)
        {
            context.Response.StatusCode = r.Status;
            context.Response.ContentType = "text/plain; charset=utf-8";
            await context.Response.WriteAsync(r.Message + "\n");
            return;
        }
        var headers = context.Response.Headers;
        headers["Content-Security-Policy"] = "default-src 'none'; script-src 'self'; style-src 'self'; img-src 'self' data:; connect-src 'self'; base-uri 'none'; form-action 'none'; frame-ancestors 'none'";
        headers["X-Content-Type-Options"] = "nosniff";
        headers["Referrer-Policy"] = "no-referrer";
        headers["Cache-Control"] = "no-store";
        await next(context);
    }

    internal (int Status, string Message)? Refusal(HttpRequest request)
    {
        if (!LoopbackHost(request.Host.Host) || request.Host.Port != port())
            return (StatusCodes.Status400BadRequest, "refused: this editor answers only to 127.0.0.1 or localhost on its own port.");
        var given = request.Headers[TokenHeader].ToString();
        if (given.Length == 0 && HttpMethods.IsGet(request.Method) && !request.Path.StartsWithSegments("/api")) given = request.Query[TokenQuery].ToString();
        if (!CryptographicOperations.FixedTimeEquals(Encoding.UTF8.GetBytes(given), _token))
            return (StatusCodes.Status403Forbidden, "refused: this request does not carry the editor's token; open the address 'padplan edit' printed.");
        if (!HttpMethods.IsGet(request.Method) && !HttpMethods.IsHead(request.Method))
        {
            var origin = request.Headers.Origin.ToString();
            if (origin.Length > 0 && !OwnOrigin(origin))
                return (StatusCodes.Status403Forbidden, "refused: a change must come from the editor's own page.");
            if (request.Headers["Sec-Fetch-Site"].ToString() is "cross-site" or "same-site")
                return (StatusCodes.Status403Forbidden, "refused: a change must come from the editor's own page.");
        }
        if ((request.ContentLength > 0 || request.Headers.TransferEncoding.Count > 0) && !request.Path.Equals(BodyPath, StringComparison.Ordinal))
            return (StatusCodes.Status400BadRequest, "refused: this request takes no body.");
        return null;
    }

    private bool OwnOrigin(string origin) =>
        Uri.TryCreate(origin, UriKind.Absolute, out var uri) && uri.Scheme == "http" && LoopbackHost(uri.Host) && uri.Port == port();

    private static bool LoopbackHost(string host) => host is "127.0.0.1" or "localhost" or "[::1]" or "::1";
}
