using System.CommandLine;
using System.Diagnostics;
using System.Runtime.InteropServices;
using PadPlan.Editor.Serving;
using PadPlan.Editor.Sessions;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan edit`: Plan and adjust a layout by hand in the browser, with the check running after every change.</summary>
public static class EditCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var port = new Option<int>("--port") { Description = "Loopback port to serve the page on (0: any free port).", DefaultValueFactory = _ => 0 };
        var noBrowser = new Option<bool>("--no-browser") { Description = "Only print the address; do not open the browser." };
        var command = new Command("edit", "Plan and adjust the layout by hand in the browser, with the check running after every change.") { project, port, noBrowser };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            var chosenPort = parse.GetValue(port);
            if (chosenPort is < 0 or > 65535) throw new UsageException($"--port {chosenPort} is not a port number (0 to 65535).");
            if (EditSession.LeftOverRecovery(file.FullName) is { } recovery)
                throw new UsageException($"{Path.GetFileName(recovery)} holds unsaved edits of an earlier session. Open it with 'padplan edit {Path.GetFileName(recovery)}' and keep what you want, or delete it; then edit {file.Name} again.");
            return Run(context, new EditorOptions(file.FullName, chosenPort), !parse.GetValue(noBrowser)).GetAwaiter().GetResult();
        }));
        return command;
    }

    private static async Task<int> Run(CommandContext context, EditorOptions options, bool openBrowser)
    {
        await using var server = await EditorServer.StartAsync(options);
        context.Out.WriteLine($"editing {server.Session.FileName} at {server.Url}");
        context.Err.WriteLine("Press Ctrl+C, or \"finish\" on the page, to stop.");
        if (openBrowser && !OpenBrowser(server.Url)) context.Err.WriteLine($"could not open a browser; open this address yourself: {server.Url}");
        // Ctrl+C (SIGINT), SIGTERM (a service manager, `kill`) and SIGHUP (the terminal closed) all stop the editor the same way:
        // the server stops, the recovery copy stays, and the exit message names it.
        var interrupted = new TaskCompletionSource();
        var signals = new[] { PosixSignal.SIGINT, PosixSignal.SIGTERM, PosixSignal.SIGHUP, PosixSignal.SIGQUIT }
            .Select(signal => PosixSignalRegistration.Create(signal, e =>
            {
                e.Cancel = true;
                interrupted.TrySetResult();
            })).ToList();
        try
        {
            await Task.WhenAny(server.Finished, interrupted.Task);
        }
        finally
        {
            foreach (var signal in signals) signal.Dispose();
        }
        await server.StopAsync();
        if (server.Session.Unsaved && server.Session.RecoveryKept)
            context.Err.WriteLine($"stopped with unsaved edits; they are kept in {Path.GetFileName(server.Session.RecoveryPath)} beside the project.");
        else if (server.Session.Unsaved)
            context.Err.WriteLine("stopped with unsaved edits, and no recovery copy is on disk (it was removed, or could not be written): those edits are lost.");
        else context.Err.WriteLine("stopped.");
        return ExitCodes.Success;
    }

    /// <summary>Time the opener has to fail (a missing browser or display) before it is taken to have worked.</summary>
    private static readonly TimeSpan OpenerGrace = TimeSpan.FromSeconds(5);

    private static bool OpenBrowser(Uri url)
    {
        try
        {
            if (OperatingSystem.IsWindows())
            {
                using var shell = Process.Start(new ProcessStartInfo(url.ToString()) { UseShellExecute = true });
                return shell is not null;
            }
            // No display: no browser can open; say so rather than run an opener that only prints its own errors.
            if (OperatingSystem.IsLinux() && string.IsNullOrEmpty(Environment.GetEnvironmentVariable("DISPLAY")) && string.IsNullOrEmpty(Environment.GetEnvironmentVariable("WAYLAND_DISPLAY")))
                return false;
            var start = new ProcessStartInfo(OperatingSystem.IsMacOS() ? "open" : "xdg-open", url.ToString())
            {
                UseShellExecute = false, RedirectStandardOutput = true, RedirectStandardError = true,
            };
            using var process = Process.Start(start);
            if (process is null) return false;
            _ = process.StandardOutput.ReadToEndAsync();
            _ = process.StandardError.ReadToEndAsync();
            return !process.WaitForExit(OpenerGrace) || process.ExitCode == 0;
        }
        catch (Exception e) when (e is System.ComponentModel.Win32Exception or InvalidOperationException)
        {
            return false;
        }
    }
}
