using System.CommandLine;
using PadPlan.ProjectFiles;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan cutlist`: List the pads to punch and cut, with a cutting plan for your stock.</summary>
public static class CutlistCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var command = new Command("cutlist", "List the pads to punch and cut, with a cutting plan for your stock.") { project };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            ProjectFile.Read(file.FullName);
            context.Err.WriteLine("padplan cutlist: this step is not built yet.");
            return ExitCodes.InputError;
        }));
        return command;
    }
}
