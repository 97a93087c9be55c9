using PadPlan.Materials;
using PadPlan.Rules;
using System.CommandLine;
using System.Globalization;
using PadPlan.IO;
using PadPlan.Output.Drawing;
using PadPlan.Output.Sheets;
using PadPlan.Output.Tables;
using PadPlan.ProjectFiles;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan sheets`: Print 1:1 template, assembly view and report pages (PDF, SVG, PNG).</summary>
public static class SheetsCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var output = new Option<DirectoryInfo>("--output", "-o") { Description = "Folder to write the sheets into (created if missing).", Required = true };
        var paper = new Option<string>("--paper") { Description = "Paper size: a4, letter or a3.", DefaultValueFactory = _ => "a4" };
        var formats = new Option<string>("--formats") { Description = "Comma-separated file kinds to write: pdf, svg, png.", DefaultValueFactory = _ => "pdf,svg,png" };
        var dpi = new Option<int>("--dpi") { Description = $"Resolution of the PNG previews, {PngWriter.MinDpi:0} to {PngWriter.MaxDpi:0} dots per inch.", DefaultValueFactory = _ => 150 };
        var date = new Option<string?>("--date") { Description = "Date printed on the sheets, YYYY-MM-DD. Default: from SOURCE_DATE_EPOCH if set, else today." };
        var ngspice = SharedOptions.Ngspice();
        var force = SharedOptions.ForceOutput();
        var command = new Command("sheets", "Print 1:1 template, assembly view and report pages (PDF, SVG, PNG).") { project, output, paper, formats, dpi, date, ngspice, force };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            var chosenPaper = Paper.Find(parse.GetValue(paper) ?? "a4")
                ?? throw new UsageException($"--paper: unknown paper '{parse.GetValue(paper)}'; use a4, letter or a3.");
            var chosenFormats = ParseFormats(parse.GetValue(formats) ?? "");
            var resolution = parse.GetValue(dpi);
            if (resolution < PngWriter.MinDpi || resolution > PngWriter.MaxDpi)
                throw new UsageException($"--dpi: {resolution} is out of range; use {PngWriter.MinDpi:0} to {PngWriter.MaxDpi:0}.");
            var printedDate = ResolveDate(parse.GetValue(date), Environment.GetEnvironmentVariable("SOURCE_DATE_EPOCH"));

            var plan = ProjectFile.Read(file.FullName);
            if (SheetBook.Problem(plan) is { } problem) throw new InputException(file.FullName, problem);
            var simulation = SharedOptions.Simulate(parse, ngspice, plan);
            var check = Checker.Check(plan, new CheckOptions(Simulation: simulation));
            var materials = MaterialsTables.Of(plan, simulation: simulation);
            var book = SheetBook.Build(plan, new SheetOptions(chosenPaper, printedDate, simulation), check, materials.All, materials.Cutting);
            context.Err.WriteLine(PadPlan.Simulation.NetVoltage.Summary(simulation));
            SheetOutput.Write(context, book, parse.GetValue(output)!.FullName, chosenFormats, resolution, parse.GetValue(force));
            context.Err.WriteLine($"{book.Summary()}; on {chosenPaper.Name}, dated {printedDate:yyyy-MM-dd}.");
            if (check.Errors > 0) context.Err.WriteLine(TableOutput.NotReadyWarning(check.Errors, file.Name, pagesMarked: true));
            context.Err.WriteLine("Print the template at actual size and measure its check bar before cutting.");
            return ExitCodes.Success;
        }));
        return command;
    }

    public static SheetFormats ParseFormats(string text)
    {
        var formats = SheetFormats.None;
        foreach (var item in text.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            formats |= item.ToLowerInvariant() switch
            {
                "pdf" => SheetFormats.Pdf,
                "svg" => SheetFormats.Svg,
                "png" => SheetFormats.Png,
                _ => throw new UsageException($"--formats: unknown kind '{item}'; use pdf, svg and/or png, separated by commas."),
            };
        }
        return formats == SheetFormats.None ? throw new UsageException("--formats: name at least one of pdf, svg, png.") : formats;
    }

    /// <summary>--date wins; else SOURCE_DATE_EPOCH (seconds since 1970, UTC, the reproducible-builds convention); else today.</summary>
    public static DateOnly ResolveDate(string? option, string? sourceDateEpoch)
    {
        if (!string.IsNullOrWhiteSpace(option))
        {
            return DateOnly.TryParseExact(option.Trim(), "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out var d)
                ? d : throw new UsageException($"--date: '{option}' is not a date of the form YYYY-MM-DD.");
        }
        if (!string.IsNullOrWhiteSpace(sourceDateEpoch))
        {
            return long.TryParse(sourceDateEpoch.Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out var seconds) && seconds <= 253402300799
                ? DateOnly.FromDateTime(DateTimeOffset.FromUnixTimeSeconds(seconds).UtcDateTime)
                : throw new UsageException($"SOURCE_DATE_EPOCH: '{sourceDateEpoch}' is not a whole number of seconds since 1970-01-01.");
        }
        return DateOnly.FromDateTime(DateTime.Now);
    }
}
