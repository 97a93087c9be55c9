using System.CommandLine;
using PadPlan.Gate;
using PadPlan.Import;
using PadPlan.IO;
using PadPlan.Materials;
using PadPlan.Output.Sheets;
using PadPlan.Output.Tables;
using PadPlan.Planning;
using PadPlan.ProjectFiles;
using PadPlan.Rules;
using PadPlan.Output.CheckReports;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan demo`: runs the whole pipeline (import, place, check, sheets, cut list, BOM, build order, test plan) on a bundled example.</summary>
public static class DemoCommand
{
    /// <summary>The bundled examples the demo can run, by folder name; the first is the default.</summary>
    public static IReadOnlyList<string> Examples { get; } = ["xtal-osc-40m", "cw-filter", "jfet-preamp", "valve-stage"];

    /// <summary>The files every demo run writes besides the sheets (checked by CI).</summary>
    public static IReadOnlyList<string> TextFiles { get; } = ["check.txt", "check.json", "cutlist.txt", "bom.txt", "bom.csv", "build-order.txt", "testplan.txt", "testplan.csv"];

    public static Command Create(CommandContext context)
    {
        var output = new Option<DirectoryInfo>("--output", "-o") { Description = "Folder for the demo's files.", DefaultValueFactory = _ => new DirectoryInfo("padplan-demo") };
        var example = new Option<string>("--example") { Description = $"Which bundled example: {string.Join(", ", Examples)}.", DefaultValueFactory = _ => Examples[0] };
        example.AcceptOnlyFromAmong([.. Examples]);
        var date = new Option<string?>("--date") { Description = "Date printed on the sheets, YYYY-MM-DD. Default: from SOURCE_DATE_EPOCH if set, else today." };
        var force = SharedOptions.ForceOutput();
        var command = new Command("demo", "Run the whole pipeline on a bundled example and show where the files are.") { output, example, date, force };
        command.SetAction(parse => context.Guarded(() =>
        {
            var name = parse.GetValue(example)!;
            var dir = parse.GetValue(output)!.FullName;
            var printedDate = SheetsCommand.ResolveDate(parse.GetValue(date), Environment.GetEnvironmentVariable("SOURCE_DATE_EPOCH"));
            return Run(context, name, dir, printedDate, parse.GetValue(force));
        }));
        return command;
    }

    private static int Run(CommandContext context, string name, string dir, DateOnly printedDate, bool force)
    {
        var source = ExampleFolder(name);
        var netlist = Directory.EnumerateFiles(source).Where(f => f.EndsWith(".ppn", StringComparison.Ordinal) || f.EndsWith(".cir", StringComparison.Ordinal)).Order(StringComparer.Ordinal).First();
        using var set = OutputSet.Begin(dir, force);
        var say = context.Err;
        say.WriteLine($"PadPlan demo: {name} ({Path.GetFileName(netlist)})");

        // 1. import
        var library = FootprintLibrary.Load();
        var partsFile = Path.Combine(source, "parts.json");
        var map = File.Exists(partsFile) ? PartsMap.Read(partsFile, library) : null;
        var imported = NetlistImporter.ImportFile(netlist, new ImportOptions(library, map, null, null));
        foreach (var note in imported.Notes) say.WriteLine($"  note: {note.Describe()}");
        var projectFile = $"{name}{ProjectFile.Extension}";
        say.WriteLine($"1. import: {imported.Project.Parts.Count} parts, {imported.Project.Nets.Count} nets");

        // 2. place
        var placed = CheckedPlacer.Place(Simulation.ElectrolyticOrientation.AtImport(imported.Project), PlacerSettings.Default);
        if (!placed.Succeeded)
        {
            say.WriteLine($"error: placement failed: {placed.Failure!.Message} ({placed.Failure.Hint})");
            return ExitCodes.RuleViolations;
        }
        var project = placed.Project!;
        set.Add(projectFile, ProjectFile.ToCheckedBytes(project, projectFile));
        say.WriteLine($"2. place: board {project.Board.Width:0} x {project.Board.Height:0} mm, {project.Layout!.Pads.Count} pads");

        // 3. check
        var simulation = Simulation.Simulator.Run(project);
        var check = Checker.Check(project, new CheckOptions(Simulation: simulation));
        set.AddText("check.txt", CheckReportTables.ToText(project.Name, check, strict: false));
        set.Add("check.json", CheckReportJson.ToBytes(project.Name, check, strict: false));
        say.WriteLine($"3. check: {CheckReportTables.Summary(project.Name, check, strict: false)}");

        // 4. materials
        var materials = MaterialsTables.Of(project, simulation: simulation);
        var (cut, bom, order, tests) = (materials.CutList, materials.Bom, materials.BuildOrder, materials.TestPlan);
        set.AddText("cutlist.txt", Text(cut));
        set.AddText("bom.txt", TableText.ToText(bom));
        set.AddText("bom.csv", TableText.ToCsv(bom));
        set.AddText("build-order.txt", TableText.ToText(order));
        set.AddText("testplan.txt", Text(tests));
        set.AddText("testplan.csv", TableText.ToCsv(tests[0]));
        say.WriteLine($"4. materials: cut list, BOM ({project.Parts.Count} parts), build order ({order.Rows.Count} steps), test plan ({tests[0].Rows.Count} tests)");

        // 5. sheets
        var book = SheetBook.Build(project, new SheetOptions(Paper.A4, printedDate, simulation), check, materials.All, materials.Cutting);
        var sheets = SheetOutput.Add(set, book, SheetFormats.All, dpi: 150);
        SheetOutput.Commit(set, force);
        say.WriteLine($"5. sheets: {book.Summary()} ({sheets} files)");

        context.Out.WriteLine($"Demo finished. Files are in {dir}:");
        context.Out.WriteLine($"  {projectFile}  the placed project");
        context.Out.WriteLine("  sheets.pdf         template (print at actual size, measure the 50 mm bar), assembly view, report pages");
        context.Out.WriteLine("  *.svg, *.png       the same pages one by one");
        context.Out.WriteLine("  check.txt/.json    the check report");
        context.Out.WriteLine("  cutlist.txt, bom.txt/.csv, build-order.txt, testplan.txt/.csv");
        if (Output.Cautions.HighVoltageWarning(project) is { } hv) context.Out.WriteLine($"Caution: {hv}");
        context.Out.WriteLine($"Caution: {Output.Cautions.GlassFibre}");
        context.Out.WriteLine($"Caution: {Output.Cautions.Flux}");
        return check.Errors > 0 ? ExitCodes.RuleViolations : ExitCodes.Success;
    }

    private static string Text(IEnumerable<ReportTable> tables) => string.Join("\n", tables.Select(t => TableText.ToText(t)));

    /// <summary>The example's folder: beside the installed program, or in the source tree when run from it.</summary>
    private static string ExampleFolder(string name)
    {
        foreach (var start in new[] { AppContext.BaseDirectory, Directory.GetCurrentDirectory() })
        {
            for (var dir = new DirectoryInfo(start); dir is not null; dir = dir.Parent)
            {
                var candidate = Path.Combine(dir.FullName, "examples", name);
                if (Directory.Exists(candidate)) return candidate;
            }
        }
        throw new InputException(Path.Combine("examples", name), "the bundled example is missing; reinstall PadPlan or run the demo from the source folder.");
    }
}
