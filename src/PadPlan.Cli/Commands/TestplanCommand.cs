using PadPlan.Output.Tables;
using System.CommandLine;
using PadPlan.Materials;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan testplan`: Write a continuity test sheet for checking the finished board.</summary>
public static class TestplanCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var csv = SharedOptions.CsvOption();
        var force = SharedOptions.ForceOutput();
        var wide = SharedOptions.Wide();
        var threshold = new Option<double>("--beep-below")
        {
            Description = "Resistance below which your continuity beeper sounds, in ohms.",
            DefaultValueFactory = _ => DcPaths.DefaultThreshold,
        };
        var ngspice = SharedOptions.Ngspice();
        var command = new Command("testplan", "Write a continuity test sheet for checking the finished board, and the power-up steps.") { project, csv, threshold, ngspice, wide, force };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            var placed = TableOutput.ReadPlaced(file);
            var ohms = parse.GetValue(threshold);
            if (!(ohms > 0) || !double.IsFinite(ohms)) throw new UsageException($"--beep-below {ohms}: give your beeper's threshold in ohms, more than 0 (often 30 to 50).");
            var simulation = SharedOptions.Simulate(parse, ngspice, placed);
            var tables = TestPlanTables.Tables(placed, ohms, simulation);
            TableOutput.Print(context, tables, SharedOptions.TableWidth(context, parse, wide));
            var csvFile = parse.GetValue(csv);
            if (csvFile is not null) TableOutput.WriteCsv(context, csvFile, [("tests", tables[0]), ("paths", tables[1]), ("power-up", tables[2])], parse.GetValue(force));
            TableOutput.WarnIfNotReady(context, file, placed, simulation);
            return ExitCodes.Success;
        }));
        return command;
    }
}
