using System.CommandLine;
using PadPlan.IO;
using PadPlan.Output.Geometry;
using PadPlan.Output.Spice;
using PadPlan.ProjectFiles;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan export`: Write the resolved geometry of a plan as JSON, or the circuit the layout builds as a SPICE deck.</summary>
public static class ExportCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var geometry = new Option<FileInfo?>("--geometry") { Description = "Write the resolved geometry (pads, parts, leads, jumpers, rules) as JSON to this file." };
        var spice = new Option<FileInfo?>("--spice") { Description = "Write the circuit as the layout builds it (nets from pads, strips, jumpers and the plane) as a SPICE deck to this file." };
        var command = new Command("export", "Write the resolved geometry of a plan as JSON, or the circuit the layout builds as a SPICE deck.") { project, geometry, spice };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            var geometryFile = parse.GetValue(geometry);
            var spiceFile = parse.GetValue(spice);
            if (geometryFile is null && spiceFile is null) throw new UsageException("say what to export: --geometry FILE.json or --spice FILE.cir.");
            var plan = ProjectFile.Read(file.FullName);
            if (plan.Layout is null) throw new InputException(file.FullName, "the project has no layout yet; run 'padplan place' first.");
            if (plan.Board.IsAuto) throw new InputException(file.FullName, "the board has no size yet; run 'padplan place', or give the board a width and height.");
            foreach (var target in new[] { geometryFile, spiceFile }.OfType<FileInfo>())
                if (Path.GetFullPath(target.FullName) == Path.GetFullPath(file.FullName))
                    throw new UsageException("the export file would overwrite the project; choose another name.");
            if (geometryFile is not null)
            {
                GeometryExport.Write(plan, geometryFile.FullName);
                context.Err.WriteLine($"Wrote {geometryFile.FullName}");
            }
            if (spiceFile is not null)
            {
                if (plan.Imported is not { Elements.Count: > 0 })
                    context.Err.WriteLine("warning: the project holds no SPICE deck (it was not imported from one), so only resistors, capacitors and inductors get element lines; other parts are comments.");
                AtomicFile.WriteAllBytes(spiceFile.FullName, System.Text.Encoding.UTF8.GetBytes(ExtractedDeck.Write(plan)));
                context.Err.WriteLine($"Wrote {spiceFile.FullName}");
            }
            return ExitCodes.Success;
        }));
        return command;
    }
}
