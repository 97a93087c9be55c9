using System.CommandLine;
using PadPlan.ProjectFiles;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan sheets`: Print 1:1 template, assembly view and report pages (PDF, SVG, PNG).</summary>
public static class SheetsCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var command = new Command("sheets", "Print 1:1 template, assembly view and report pages (PDF, SVG, PNG).") { project };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            ProjectFile.Read(file.FullName);
            context.Err.WriteLine("padplan sheets: this step is not built yet.");
            return ExitCodes.InputError;
        }));
        return command;
    }
}
