using System.CommandLine;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan import`: read a netlist (PadPlan text or SPICE) and create a project.</summary>
public static class ImportCommand
{
    public static Command Create(CommandContext context)
    {
        var netlist = new Argument<FileInfo>("netlist") { Description = "The netlist: PadPlan text format (*.ppn) or SPICE (*.cir, *.sp, *.net, *.spice)." };
        var output = new Option<FileInfo>("--output", "-o") { Description = "The project file to create (*.padplan.json).", Required = true };
        var command = new Command("import", "Read a netlist (PadPlan text or SPICE) and create a project file.") { netlist, output };
        command.SetAction(parse => context.Guarded(() =>
        {
            context.Err.WriteLine("padplan import: this step is not built yet.");
            return ExitCodes.InputError;
        }));
        return command;
    }
}
