using System.CommandLine;
using PadPlan.ProjectFiles;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan place`: Place parts and pads automatically and write the layout into the project.</summary>
public static class PlaceCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var command = new Command("place", "Place parts and pads automatically and write the layout into the project.") { project };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            ProjectFile.Read(file.FullName);
            context.Err.WriteLine("padplan place: this step is not built yet.");
            return ExitCodes.InputError;
        }));
        return command;
    }
}
