using PadPlan.Gate;
using PadPlan.IO;
using System.Net;
using System.Security.Cryptography;
using System.Text.Json;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Hosting.Server;
using Microsoft.AspNetCore.Hosting.Server.Features;
using Microsoft.AspNetCore.Http;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;
using PadPlan.Editor.Edits;
using PadPlan.Editor.Sessions;
using PadPlan.Editor.View;
using PadPlan.Model3D;
using PadPlan.Planning;

namespace PadPlan.Editor.Serving;

/// <summary>
/// The local web server behind `padplan edit`: loopback only, one project, the page and a small JSON interface.
/// Every edit goes through <see cref="EditApplier"/> and every answer carries a fresh check by the real checker.
/// </summary>
public sealed class EditorServer : IAsyncDisposable
{
    private static readonly JsonSerializerOptions Json = new(JsonSerializerDefaults.Web);
    private readonly WebApplication _app;
    private readonly EditSession _session;
    private readonly TaskCompletionSource _finished = new(TaskCreationOptions.RunContinuationsAsynchronously);
    private readonly Lock _placeGate = new();
    private PlaceJob? _place;
    // True from the start of "place the rest" until its result is in the session, so no edit slips in between.
    private bool _placing;
    private string _placeNote = "";
    private readonly Effort _effort;
    private readonly SwapEdit _swap = new(SwapEdit.LibraryFor);
    private int _port;

    private EditorServer(WebApplication app, EditSession session, string token, Effort effort)
    {
        _effort = effort;
        _app = app;
        _session = session;
        Token = token;
    }

    public string Token { get; }
    public EditSession Session => _session;
    public int Port => _port;
    /// <summary>The address to open: the page, with the token in its query.</summary>
    public Uri Url => new($"http://127.0.0.1:{_port}/?{RequestGuard.TokenQuery}={Token}");
    /// <summary>Completes when the page says the user is finished.</summary>
    public Task Finished => _finished.Task;

    /// <summary>Opens the project and starts listening on 127.0.0.1; throws InputException for a bad project file.</summary>
    public static async Task<EditorServer> StartAsync(EditorOptions options)
    {
        var session = EditSession.Open(options.ProjectPath);
        var token = options.Token ?? Convert.ToHexStringLower(RandomNumberGenerator.GetBytes(24));
        var builder = WebApplication.CreateSlimBuilder(new WebApplicationOptions { ContentRootPath = AppContext.BaseDirectory });
        builder.Logging.ClearProviders();
        builder.WebHost.ConfigureKestrel(k =>
        {
            k.Listen(IPAddress.Loopback, options.Port);
            k.Limits.MaxRequestBodySize = EditorOptions.MaxBodyBytes;
            k.Limits.MaxRequestHeadersTotalSize = 16 * 1024;
            k.AddServerHeader = false;
        });
        var app = builder.Build();
        var server = new EditorServer(app, session, token, options.Effort);
        var guard = new RequestGuard(token, () => server._port);
        app.Use(guard.InvokeAsync);
        server.Map(app);
        await app.StartAsync();
        var address = app.Services.GetRequiredService<IServer>().Features.Get<IServerAddressesFeature>()!.Addresses.First();
        server._port = new Uri(address).Port;
        return server;
    }

    private void Map(WebApplication app)
    {
        app.MapGet("/", () => Results.Content(PageFiles.Index(Token), "text/html; charset=utf-8"));
        foreach (var (name, type) in PageFiles.Types)
        {
            var text = PageFiles.Read(name);
            app.MapGet("/" + name, () => Results.Text(text, type));
        }
        app.MapGet("/api/plan", () => View());
        app.MapGet("/api/model.glb", () => Model());
        app.MapPost("/api/edit", async (HttpRequest request) =>
        {
            var edit = await ReadJson<EditRequest>(request);
            if (edit is null) return Refused("the edit is not valid JSON.");
            if (Placing) return Refused("the placer is still working; wait for it or stop it first.");
            // "Swap part" places again, so it needs the footprint library: here, not in the pure EditApplier.
            return edit.Kind == "swap-part" ? Changing(() => _session.Replace(_swap.Apply(_session.Current, edit))) : Changing(() => _session.Apply(edit));
        });
        app.MapPost("/api/undo", () => Placing ? Refused("the placer is still working.") : Changing(() => _session.Undo(), "nothing to take back."));
        app.MapPost("/api/redo", () => Placing ? Refused("the placer is still working.") : Changing(() => _session.Redo(), "nothing to do again."));
        app.MapGet("/api/swap", (string? @ref) => Changing(() => Results.Json(_swap.Choices(_session.Current, @ref ?? ""), Json)));
        app.MapPost("/api/save", () => Saved(_session.Save()));
        app.MapPost("/api/keep-copy", () => Saved(_session.SaveCopy()));
        app.MapPost("/api/place", () => StartPlacing());
        app.MapGet("/api/place", () => PlaceStatus());
        app.MapPost("/api/place/stop", () =>
        {
            lock (_placeGate) _place?.Stop();
            return PlaceStatus();
        });
        app.MapPost("/api/finish", () =>
        {
            _finished.TrySetResult();
            return Results.Json(new { finished = true, unsaved = _session.Unsaved }, Json);
        });
    }

    private bool Placing
    {
        get { lock (_placeGate) return _placing; }
    }

    private IResult View()
    {
        var view = PlanViews.Build(_session.Current);
        view.File = _session.FileName;
        view.Revision = _session.Revision;
        view.Unsaved = _session.Unsaved;
        view.CanUndo = _session.CanUndo;
        view.CanRedo = _session.CanRedo;
        return Results.Json(view, Json);
    }

    /// <summary>The 3D model of the plan as it stands, as binary glTF: the same file `padplan export --model` writes.</summary>
    private IResult Model()
    {
        var project = _session.Current;
        if (project.Layout is null || project.Board.IsAuto) return Refused("the plan has no layout on a board of known size yet, so there is no 3D model.");
        return Results.Bytes(GlbFile.Write(BoardModel.Of(project)), "model/gltf-binary");
    }

    /// <summary>
    /// Runs one change and answers with the new view, or with a message and the plan unchanged: a refusal (422), or a
    /// fault of the server itself (500), never an empty answer.
    /// </summary>
    private IResult Changing(Action change) => Changing(() => { change(); return View(); });

    private IResult Changing(Func<bool> step, string nothing) => Changing(() => step() ? View() : Refused(nothing));

    private static IResult Changing(Func<IResult> change)
    {
        try
        {
            return change();
        }
        catch (Exception e) when (e is EditRefused or ArgumentException or InvalidOperationException or InputException)
        {
            return Refused(e.Message);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return Results.Json(new { message = "not applied: " + e.Message }, Json, statusCode: StatusCodes.Status500InternalServerError);
        }
    }

    private IResult Saved(SaveOutcome outcome) =>
        Results.Json(outcome, Json, statusCode: outcome.Saved ? StatusCodes.Status200OK : StatusCodes.Status409Conflict);

    private static IResult Refused(string message) => Results.Json(new { message }, Json, statusCode: StatusCodes.Status422UnprocessableEntity);

    // Held parts and pads stay put: the placer keeps every part or pad whose locked flag is set (no --keep-existing).
    private IResult StartPlacing()
    {
        lock (_placeGate)
        {
            if (_placing) return Refused("the placer is already working.");
            var job = PlaceJob.Start(_session.Current, PlacerSettings.Default with { Effort = _effort });
            _place = job;
            _placing = true;
            _placeNote = "placing ...";
            _ = job.Result.ContinueWith(Finish, TaskScheduler.Default);
        }
        return PlaceStatus();
    }

    private void Finish(Task<CheckedPlacement?> task)
    {
        string note;
        try
        {
            note = Outcome(task);
        }
        catch (EditRefused e)
        {
            note = "placed, but the plan could not be kept, so it is as it was: " + e.Message;
        }
        lock (_placeGate)
        {
            _placeNote = note;
            _placing = false;
        }
    }

    private string Outcome(Task<CheckedPlacement?> task)
    {
        if (task.IsFaulted) return "the placer stopped with a fault: " + task.Exception!.GetBaseException().Message;
        if (task.Result is null) return "placing stopped; the plan is as it was.";
        if (!task.Result.Succeeded) return $"the placer found no plan: {task.Result.Failure!.Message} {task.Result.Failure.Hint}";
        _session.Replace(task.Result.Project!);
        return "placed the rest; held items stayed where they were.";
    }

    private IResult PlaceStatus()
    {
        lock (_placeGate)
        {
            var last = _place?.Last ?? default;
            return Results.Json(new
            {
                running = _placing,
                run = last.Run,
                runs = _place?.Runs ?? 0,
                stage = last.Stage ?? "",
                step = last.Step,
                violation = Math.Round(last.Violation, 2),
                left = last.Stage is null ? "" : last.Remaining,
                note = _placeNote,
                revision = _session.Revision,
            }, Json);
        }
    }

    private static async Task<T?> ReadJson<T>(HttpRequest request) where T : class
    {
        try
        {
            return await JsonSerializer.DeserializeAsync<T>(request.Body, Json);
        }
        catch (JsonException)
        {
            return null;
        }
    }

    public async Task StopAsync()
    {
        lock (_placeGate) _place?.Stop();
        await _app.StopAsync();
    }

    public async ValueTask DisposeAsync()
    {
        await StopAsync();
        await _app.DisposeAsync();
        _session.Dispose();
    }
}
