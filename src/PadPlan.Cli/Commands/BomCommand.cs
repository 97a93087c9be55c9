using System.CommandLine;
using PadPlan.Materials;
using PadPlan.Output.Tables;
using PadPlan.ProjectFiles;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan bom`: List the parts to gather, grouped by value and footprint; with --build-order, the steps to build in.</summary>
public static class BomCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var csv = SharedOptions.CsvOption();
        var force = SharedOptions.ForceOutput();
        var wide = SharedOptions.Wide();
        var buildOrder = new Option<bool>("--build-order")
        {
            Description = "Also print the build order: numbered steps from input to output (needs a placed project).",
        };
        var command = new Command("bom", "List the parts to gather, grouped by value and footprint.") { project, csv, buildOrder, wide, force };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            var withOrder = parse.GetValue(buildOrder);
            var loaded = withOrder ? TableOutput.ReadPlaced(file) : ProjectFile.Read(file.FullName);
            var tables = new List<(string Suffix, ReportTable Table)> { ("bom", BomTable.From(loaded)) };
            if (withOrder) tables.Add(("build-order", BuildOrderTable.Table(loaded)));
            TableOutput.Print(context, tables.Select(t => t.Table), SharedOptions.TableWidth(context, parse, wide));
            var csvFile = parse.GetValue(csv);
            if (csvFile is not null) TableOutput.WriteCsv(context, csvFile, tables, parse.GetValue(force));
            if (withOrder) TableOutput.WarnIfNotReady(context, file, loaded);
            return ExitCodes.Success;
        }));
        return command;
    }
}
