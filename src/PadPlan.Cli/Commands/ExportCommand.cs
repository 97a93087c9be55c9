using System.CommandLine;
using PadPlan.IO;
using PadPlan.Model3D;
using PadPlan.Output.Geometry;
using PadPlan.Output.Spice;
using PadPlan.ProjectFiles;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan export`: Write the resolved geometry of a plan as JSON, the circuit the layout builds as a SPICE deck, or a 3D model as glTF.</summary>
public static class ExportCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var geometry = new Option<FileInfo?>("--geometry") { Description = "Write the resolved geometry (pads, parts, leads, jumpers, rules) as JSON to this file." };
        var spice = new Option<FileInfo?>("--spice") { Description = "Write the circuit as the layout builds it (nets from pads, strips, jumpers and the plane) as a SPICE deck to this file." };
        var model = new Option<FileInfo?>("--model") { Description = "Write a 3D model of the planned board (board, pads, part bodies at their heights, bent leads) as binary glTF 2.0 (.glb) to this file." };
        var force = SharedOptions.ForceOutput();
        var command = new Command("export", "Write the resolved geometry of a plan as JSON, the circuit the layout builds as a SPICE deck, or a 3D model of the board as glTF.") { project, geometry, spice, model, force };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            var geometryFile = parse.GetValue(geometry);
            var spiceFile = parse.GetValue(spice);
            var modelFile = parse.GetValue(model);
            if (geometryFile is null && spiceFile is null && modelFile is null) throw new UsageException("say what to export: --geometry FILE.json, --spice FILE.cir or --model FILE.glb.");
            var plan = ProjectFile.Read(file.FullName);
            if (plan.Layout is null) throw new InputException(file.FullName, "the project has no layout yet; run 'padplan place' first.");
            if (plan.Board.IsAuto) throw new InputException(file.FullName, "the board has no size yet; run 'padplan place', or give the board a width and height.");
            foreach (var target in new[] { geometryFile, spiceFile, modelFile }.OfType<FileInfo>())
                if (Path.GetFullPath(target.FullName) == Path.GetFullPath(file.FullName))
                    throw new UsageException("the export file would overwrite the project; choose another name.");
            var replace = parse.GetValue(force);
            if (geometryFile is not null) OutputGuard.EnsureReplaceable(geometryFile, replace, "a geometry export that padplan wrote", head => GeometryExport.IsOwn(head));
            if (spiceFile is not null) OutputGuard.EnsureReplaceable(spiceFile, replace, "a SPICE deck that padplan wrote", head => ExtractedDeck.IsOwn(head));
            if (modelFile is not null) OutputGuard.EnsureReplaceable(modelFile, replace, "a 3D model that padplan wrote", head => GlbFile.IsOwn(head));
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
            if (modelFile is not null)
            {
                AtomicFile.WriteAllBytes(modelFile.FullName, GlbFile.Write(BoardModel.Of(plan)));
                context.Err.WriteLine($"Wrote {modelFile.FullName} (glTF 2.0: metres, +Y up, the board's top-left corner at the origin; see docs/model3d.md)");
            }
            return ExitCodes.Success;
        }));
        return command;
    }
}
