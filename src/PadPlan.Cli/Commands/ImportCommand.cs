using System.CommandLine;
using PadPlan.Import;
using PadPlan.ProjectFiles;
using PadPlan.Simulation;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan import`: read a netlist (PadPlan text or SPICE) and create a project.</summary>
public static class ImportCommand
{
    public static Command Create(CommandContext context)
    {
        var netlist = new Argument<FileInfo>("netlist") { Description = "The netlist: PadPlan text format (*.ppn) or SPICE (*.cir, *.sp, *.net, *.spice)." };
        var output = new Option<FileInfo>("--output", "-o") { Description = "The project file to create (*.padplan.json).", Required = true };
        var board = SharedOptions.Board();
        var parts = new Option<FileInfo?>("--parts") { Description = "A parts map (JSON) choosing footprints by reference, value or model, and stating net facts." };
        var dirs = SharedOptions.FootprintDirs();
        var force = new Option<bool>("--force") { Description = "Replace the output file if it exists (its layout is lost)." };
        var quiet = SharedOptions.Quiet();
        var command = new Command("import", "Read a netlist (PadPlan text or SPICE) and create a project file.") { netlist, output, board, parts, dirs, force, quiet };
        command.SetAction(parse => context.Guarded(() =>
        {
            var outFile = parse.GetValue(output)!;
            if (outFile.Exists && !parse.GetValue(force))
                throw new UsageException($"{outFile.FullName} already exists and may hold a layout. Give another -o file, or --force to replace it.");
            using var claim = ProjectFile.Claim(outFile.FullName);
            SharedOptions.TryBoardSize(parse, board, out var size);
            var extraDirs = (parse.GetValue(dirs) ?? []).Select(d => d.FullName).ToList();
            var library = FootprintLibrary.Load(extraDirs);
            var map = parse.GetValue(parts) is { } partsFile ? PartsMap.Read(partsFile.FullName, library) : null;
            var inFile = parse.GetValue(netlist)!;
            var projectDir = outFile.Directory?.FullName ?? ".";
            var recorded = extraDirs.Select(d => Path.GetRelativePath(projectDir, d).Replace('\\', '/')).ToList();
            var netlistBytes = NetlistImporter.ReadFile(inFile.ToString());
            var preview = NetlistImporter.Read(netlistBytes, inFile.ToString());
            // Footprint folders named in the netlist are relative to the netlist: load them too before building.
            if (preview.FootprintDirs is { Count: > 0 } own)
            {
                var netlistDir = inFile.Directory?.FullName ?? ".";
                var full = own.Select(d => NetlistFootprintDirs.Resolve(netlistDir, d, extraDirs, inFile.ToString())).ToList();
                library = FootprintLibrary.Load(extraDirs.Concat(full));
                recorded.AddRange(full.Select(d => Path.GetRelativePath(projectDir, d).Replace('\\', '/')));
                preview = preview with { FootprintDirs = null };
                if (map is not null) map = PartsMap.Read(parse.GetValue(parts)!.FullName, library);
            }
            var result = ProjectBuilder.Build(preview, new ImportOptions(library, map, size, recorded.Distinct().ToList()));
            foreach (var note in result.Notes) context.Err.WriteLine($"warning: {note.Describe()}");
            var project = ElectrolyticOrientation.AtImport(result.Project);
            ProjectFile.Write(project, outFile.FullName);
            if (!parse.GetValue(quiet))
            {
                var p = project;
                if (Output.Tables.ImportSummaryTable.For(p) is { } summary) context.Err.Write(Output.Tables.TableText.ToText(summary));
                var assumed = p.Parts.Count(x => x.FootprintAssumed);
                context.Err.WriteLine($"imported {p.Parts.Count} parts, {p.Nets.Count} nets, {p.Footprints.Count} footprints" +
                    (assumed > 0 ? $" ({assumed} assumed: see the warnings)" : "") + $"; wrote {outFile.FullName}");
                if (Output.Cautions.HighVoltageWarning(p) is { } hv) context.Err.WriteLine($"caution: {hv}");
            }
            return ExitCodes.Success;
        }));
        return command;
    }
}
