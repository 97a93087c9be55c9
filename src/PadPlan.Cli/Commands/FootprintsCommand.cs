using System.CommandLine;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan footprints`: list the footprint library, or show one footprint.</summary>
public static class FootprintsCommand
{
    public static Command Create(CommandContext context)
    {
        var name = new Argument<string?>("name") { Description = "Show this footprint's details.", Arity = ArgumentArity.ZeroOrOne };
        var command = new Command("footprints", "List the footprint library, or show one footprint's details.") { name };
        command.SetAction(parse => context.Guarded(() =>
        {
            context.Err.WriteLine("padplan footprints: the library is not built yet.");
            return ExitCodes.InputError;
        }));
        return command;
    }
}
