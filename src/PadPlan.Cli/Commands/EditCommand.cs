using System.CommandLine;
using System.Diagnostics;
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
            var recovery = EditSession.RecoveryPathOf(file.FullName);
            if (File.Exists(recovery))
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
        if (openBrowser && !OpenBrowser(server.Url)) context.Err.WriteLine("could not open a browser; open the address above yourself.");
        var interrupted = new TaskCompletionSource();
        ConsoleCancelEventHandler onCancel = (_, e) =>
        {
            e.Cancel = true;
            interrupted.TrySetResult();
        };
        Console.CancelKeyPress += onCancel;
        try
        {
            await Task.WhenAny(server.Finished, interrupted.Task);
        }
        finally
        {
            Console.CancelKeyPress -= onCancel;
        }
        if (server.Session.Unsaved)
            context.Err.WriteLine($"stopped with unsaved edits; they are kept in {Path.GetFileName(server.Session.RecoveryPath)} beside the project.");
        else context.Err.WriteLine("stopped.");
        return ExitCodes.Success;
    }

    private static bool OpenBrowser(Uri url)
    {
        try
        {
            var start = OperatingSystem.IsWindows() ? new ProcessStartInfo(url.ToString()) { UseShellExecute = true }
                : new ProcessStartInfo(OperatingSystem.IsMacOS() ? "open" : "xdg-open", url.ToString()) { UseShellExecute = false };
            using var process = Process.Start(start);
            return process is not null;
        }
        catch (Exception e) when (e is System.ComponentModel.Win32Exception or InvalidOperationException)
        {
            return false;
        }
    }
}
