using System.CommandLine;
using PadPlan.Planning;
using PadPlan.ProjectFiles;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan place`: Place parts and pads automatically and write the layout into the project.</summary>
public static class PlaceCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var seed = new Option<int>("--seed") { Description = "Seed of the random moves; the same seed gives the same layout.", DefaultValueFactory = _ => 1 };
        var effort = new Option<string>("--effort") { Description = "How hard to work: quick, normal or thorough.", DefaultValueFactory = _ => "normal" };
        effort.AcceptOnlyFromAmong("quick", "normal", "thorough");
        var keep = new Option<bool>("--keep-existing") { Description = "Keep every part and pad already in the layout where it is; place only the rest." };
        var quiet = SharedOptions.Quiet();
        var command = new Command("place", "Place parts and pads automatically and write the layout into the project.") { project, seed, effort, keep, quiet };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            using var claim = ProjectFile.Claim(file.FullName);
            var input = ProjectFile.Read(file.FullName);
            var settings = new PlacerSettings(parse.GetValue(seed), Enum.Parse<Effort>(parse.GetValue(effort)!, ignoreCase: true), parse.GetValue(keep));
            var result = Placer.Place(input, settings, parse.GetValue(quiet) ? null : new StderrProgress(context.Err, settings.RunsFor(input.Parts.Count)));
            if (!result.Succeeded)
            {
                context.Err.WriteLine($"error: {result.Failure!.Message}");
                context.Err.WriteLine($"what to change: {result.Failure.Hint}");
                context.Err.WriteLine($"{file.Name} was not changed.");
                return ExitCodes.RuleViolations;
            }
            ProjectFile.Write(result.Project!, file.FullName);
            if (!parse.GetValue(quiet))
            {
                context.Out.WriteLine($"placed {input.Parts.Count} parts in {file.Name}");
                foreach (var line in result.Summary!.Lines()) context.Out.WriteLine(line);
            }
            return ExitCodes.Success;
        }));
        return command;
    }

    /// <summary>Prints a line on stderr every few temperature steps, so a long run shows it is alive.</summary>
    private sealed class StderrProgress(TextWriter err, int runs) : IProgress<PlacerProgress>
    {
        private readonly Lock _gate = new();

        public void Report(PlacerProgress value)
        {
            if (value.Stage == "annealing" && value.Step % 20 != 0) return;
            lock (_gate)
                err.WriteLine(FormattableString.Invariant($"  run {value.Run}/{runs}: {value.Stage}{(value.Step > 0 ? $" step {value.Step}" : "")}, cost {value.Cost:0.0}, rules broken by {value.Violation:0.00} mm"));
        }
    }
}
