using System.CommandLine;
using PadPlan.ProjectFiles;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan check`: Check a plan against its circuit: connectivity, spacing, reach, high voltage; estimate parasitics.</summary>
public static class CheckCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var command = new Command("check", "Check a plan against its circuit: connectivity, spacing, reach, high voltage; estimate parasitics.") { project };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            ProjectFile.Read(file.FullName);
            context.Err.WriteLine("padplan check: this step is not built yet.");
            return ExitCodes.InputError;
        }));
        return command;
    }
}
