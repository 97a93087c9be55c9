using System.CommandLine;
using PadPlan.ProjectFiles;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan export`: Write the resolved geometry of a plan as JSON for other tools.</summary>
public static class ExportCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var command = new Command("export", "Write the resolved geometry of a plan as JSON for other tools.") { project };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            ProjectFile.Read(file.FullName);
            context.Err.WriteLine("padplan export: this step is not built yet.");
            return ExitCodes.InputError;
        }));
        return command;
    }
}
