using System.CommandLine;
using PadPlan.Import;
using PadPlan.IO;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan footprints`: list the footprint library, or show one footprint.</summary>
public static class FootprintsCommand
{
    public static Command Create(CommandContext context)
    {
        var name = new Argument<string?>("name") { Description = "Show this footprint's details.", Arity = ArgumentArity.ZeroOrOne };
        var dirs = SharedOptions.FootprintDirs();
        var command = new Command("footprints", "List the footprint library, or show one footprint's details.") { name, dirs };
        command.SetAction(parse => context.Guarded(() =>
        {
            var library = FootprintLibrary.Load((parse.GetValue(dirs) ?? []).Select(d => d.FullName));
            var wanted = parse.GetValue(name);
            if (wanted is null)
            {
                context.Out.Write(FootprintText.List(library.Footprints));
                return ExitCodes.Success;
            }
            var footprint = library.Find(wanted) ?? throw new InputException(wanted, library.UnknownMessage(wanted));
            context.Out.Write(FootprintText.Details(footprint));
            return ExitCodes.Success;
        }));
        return command;
    }
}
