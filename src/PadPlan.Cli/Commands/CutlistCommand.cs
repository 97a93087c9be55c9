using PadPlan.Output.Tables;
using System.CommandLine;
using PadPlan.Materials;
using PadPlan.Model;
using PadPlan.Materials.Cutting;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan cutlist`: List the pads to punch and cut, with a cutting plan for your stock.</summary>
public static class CutlistCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var stock = new Option<string[]>("--stock")
        {
            Description = "A piece of board you have, WIDTHxHEIGHT in mm (e.g. 100x160), or WxHxTHICKNESS (e.g. 60x40x0.8); give it once per piece. Default: one 100x160 offcut.",
        };
        var kerf = new Option<double>("--kerf")
        {
            Description = "Width of board one saw cut removes, in mm (0 for shears).",
            DefaultValueFactory = _ => CutOptions.Default.Kerf,
        };
        var csv = SharedOptions.CsvOption();
        var force = SharedOptions.ForceOutput();
        var wide = SharedOptions.Wide();
        var command = new Command("cutlist", "List the pads to punch and cut, with a cutting plan for your stock.") { project, stock, kerf, csv, wide, force };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            var placed = TableOutput.ReadPlaced(file);
            var kerfMm = parse.GetValue(kerf);
            if (!(kerfMm >= 0) || kerfMm > 20)
                throw new UsageException($"--kerf {kerfMm}: give the saw kerf in millimetres, from 0 (shears) to 20.");
            var pieces = (parse.GetValue(stock) ?? []).Select((text, i) => ParseStock(text, $"S{i + 1}", placed.Toolkit.StockThickness)).ToValueList();
            var list = CutListBuilder.Build(placed.Layout!, new CutOptions(pieces, kerfMm));
            var tables = CutListTables.From(list);
            TableOutput.Print(context, tables, SharedOptions.TableWidth(context, parse, wide));
            var csvFile = parse.GetValue(csv);
            if (csvFile is not null)
                TableOutput.WriteCsv(context, csvFile, [("rounds", tables[0]), ("pieces", tables[1]), ("plan", tables[2])], parse.GetValue(force));
            TableOutput.WarnIfNotReady(context, file, placed);
            if (list.Plan.Complete) return ExitCodes.Success;
            context.Err.WriteLine($"error: the stock is too small: {list.Plan.Unplaced.Count} piece(s) do not fit ({string.Join(", ", list.Plan.Unplaced.Select(p => p.Id))}). Give more or larger stock with --stock WxH.");
            return ExitCodes.RuleViolations;
        }));
        return command;
    }

    private static StockPiece ParseStock(string text, string id, double thickness)
    {
        try
        {
            return StockText.Parse(text, id, thickness);
        }
        catch (FormatException e)
        {
            throw new UsageException($"--stock {e.Message}");
        }
    }
}
