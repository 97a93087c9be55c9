using System.CommandLine;
using PadPlan.ProjectFiles;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan testplan`: Write a continuity test sheet for checking the finished board.</summary>
public static class TestplanCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var command = new Command("testplan", "Write a continuity test sheet for checking the finished board.") { project };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            ProjectFile.Read(file.FullName);
            context.Err.WriteLine("padplan testplan: this step is not built yet.");
            return ExitCodes.InputError;
        }));
        return command;
    }
}
