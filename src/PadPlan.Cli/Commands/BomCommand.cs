using System.CommandLine;
using PadPlan.ProjectFiles;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan bom`: List the parts to gather, grouped by value and footprint.</summary>
public static class BomCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var command = new Command("bom", "List the parts to gather, grouped by value and footprint.") { project };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            ProjectFile.Read(file.FullName);
            context.Err.WriteLine("padplan bom: this step is not built yet.");
            return ExitCodes.InputError;
        }));
        return command;
    }
}
