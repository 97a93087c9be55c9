using System.CommandLine;
using PadPlan.IO;
using PadPlan.Output.Geometry;
using PadPlan.ProjectFiles;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan export`: Write the resolved geometry of a plan as JSON for other tools.</summary>
public static class ExportCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var geometry = new Option<FileInfo?>("--geometry") { Description = "Write the resolved geometry (pads, parts, leads, jumpers, rules) as JSON to this file." };
        var command = new Command("export", "Write the resolved geometry of a plan as JSON for other tools.") { project, geometry };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            var target = parse.GetValue(geometry) ?? throw new UsageException("say what to export: --geometry FILE.json.");
            var plan = ProjectFile.Read(file.FullName);
            if (plan.Layout is null) throw new InputException(file.FullName, "the project has no layout yet; run 'padplan place' first.");
            if (plan.Board.IsAuto) throw new InputException(file.FullName, "the board has no size yet; run 'padplan place', or give the board a width and height.");
            if (Path.GetFullPath(target.FullName) == Path.GetFullPath(file.FullName))
                throw new UsageException("the export file would overwrite the project; choose another name.");
            GeometryExport.Write(plan, target.FullName);
            context.Err.WriteLine($"Wrote {target.FullName}");
            return ExitCodes.Success;
        }));
        return command;
    }
}
