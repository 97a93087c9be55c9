using System.CommandLine;
using PadPlan.ProjectFiles;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan demo`: run the whole pipeline on a bundled example.</summary>
public static class DemoCommand
{
    public static Command Create(CommandContext context)
    {
        var output = new Option<DirectoryInfo>("--output", "-o") { Description = "Folder for the demo's files.", DefaultValueFactory = _ => new DirectoryInfo("padplan-demo") };
        var command = new Command("demo", "Run the whole pipeline on a bundled example and show where the files are.") { output };
        command.SetAction(parse => context.Guarded(() =>
        {
            var dir = parse.GetValue(output)!;
            var source = Path.Combine(AppContext.BaseDirectory, "examples", "tiny-buffer", "tiny-buffer.padplan.json");
            var project = ProjectFile.Read(source);
            Directory.CreateDirectory(dir.FullName);
            var target = Path.Combine(dir.FullName, "tiny-buffer.padplan.json");
            ProjectFile.Write(project, target);
            context.Out.WriteLine($"Demo project: {project.Name}: {project.Parts.Count} parts, {project.Nets.Count} nets.");
            context.Out.WriteLine($"Wrote {target}");
            return ExitCodes.Success;
        }));
        return command;
    }
}
