using System.CommandLine;
using PadPlan.Cli.Commands;

namespace PadPlan.Cli;

/// <summary>Builds the command tree and runs one command line, mapping failures to exit codes.</summary>
public static class PadPlanCli
{
    public static RootCommand BuildRoot(CommandContext context)
    {
        var root = new RootCommand("PadPlan: plan, check and print pad-board (Manhattan-style) builds on copper-clad board.");
        foreach (var command in new[]
        {
            ImportCommand.Create(context),
            PlaceCommand.Create(context),
            CheckCommand.Create(context),
            ExportCommand.Create(context),
            SheetsCommand.Create(context),
            CutlistCommand.Create(context),
            BomCommand.Create(context),
            TestplanCommand.Create(context),
            FootprintsCommand.Create(context),
            DemoCommand.Create(context),
            EditCommand.Create(context),
            SwapCommand.Create(context),
        })
            root.Subcommands.Add(command);
        return root;
    }

    public static int Run(string[] args, TextWriter stdout, TextWriter stderr, bool errIsTerminal = false, int columns = TerminalWidth.Unknown)
    {
        var context = new CommandContext(stdout, stderr, errIsTerminal, columns);
        var root = BuildRoot(context);
        if (args.Length == 0)
        {
            root.Parse("--help").Invoke(new InvocationConfiguration { Output = stderr, Error = stderr });
            return ExitCodes.InputError;
        }
        var parsed = root.Parse(args);
        if (parsed.Errors.Count > 0)
        {
            foreach (var error in parsed.Errors) stderr.WriteLine($"padplan: {error.Message}");
            stderr.WriteLine("Run 'padplan --help' for the commands and options.");
            return ExitCodes.InputError;
        }
        return parsed.Invoke(new InvocationConfiguration { Output = stdout, Error = stderr, EnableDefaultExceptionHandler = false });
    }
}
