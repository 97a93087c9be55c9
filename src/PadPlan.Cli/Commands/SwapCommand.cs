using System.CommandLine;
using PadPlan.Cli.Progress;
using PadPlan.Gate;
using PadPlan.Import;
using PadPlan.Model;
using PadPlan.Planning;
using PadPlan.ProjectFiles;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan swap`: put one part on what the builder has (footprint, pin order, value) and re-plan only around it.</summary>
public static class SwapCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var reference = new Argument<string>("ref") { Description = "The part to swap (its reference, e.g. R5)." };
        var footprint = new Option<string?>("--footprint") { Description = "The footprint of the part you have (same number of leads); 'padplan footprints' lists them." };
        var variant = new Option<string?>("--variant") { Description = "Its pin order (e.g. EBC or CBE for a TO-92 transistor)." };
        var value = new Option<string?>("--value") { Description = "Its value, as printed on the BOM and the sheets." };
        var widen = new Option<int>("--widen") { Description = "Free this many more rings of neighbours when the part does not fit among the first ones.", DefaultValueFactory = _ => 0 };
        var dryRun = new Option<bool>("--dry-run") { Description = "Show the change and the old and new figures without writing the project." };
        var seed = new Option<int>("--seed") { Description = "Seed of the random moves; the same seed gives the same layout.", DefaultValueFactory = _ => 1 };
        var dirs = SharedOptions.FootprintDirs();
        var quiet = SharedOptions.Quiet();
        var command = new Command("swap", "Put one part on the footprint, pin order or value you have, re-plan only that part and its neighbours, and check the result.")
            { project, reference, footprint, variant, value, widen, dryRun, seed, dirs, quiet };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            var dry = parse.GetValue(dryRun);
            using var claim = dry ? null : ProjectFile.Claim(file.FullName);
            var input = ProjectFile.Read(file.FullName);
            var request = new SwapRequest(parse.GetValue(reference)!, parse.GetValue(footprint), parse.GetValue(variant), parse.GetValue(value), parse.GetValue(widen));
            if (request is { Footprint: null, Variant: null, Value: null })
                throw new UsageException("say what the part becomes: --footprint, --variant or --value (or several). The file was not changed.");
            Footprint? chosen = null;
            if (request.Footprint is { } name)
            {
                var library = FootprintLibrary.Load(input.FootprintDirs.Concat((parse.GetValue(dirs) ?? []).Select(d => d.FullName)));
                chosen = input.FindFootprint(name) ?? library.Find(name);
            }
            if (PartSwap.Refusal(input, request, chosen) is { } refusal)
                throw new UsageException($"{file.Name}: {refusal} The file was not changed.");

            var settings = new PlacerSettings(parse.GetValue(seed), Effort.Normal);
            var outcome = PartSwap.Swap(input, request, chosen, settings);
            var old = input.FindPart(request.Ref)!;
            if (!outcome.Succeeded)
            {
                context.Err.WriteLine($"error: {outcome.Failure}");
                context.Err.WriteLine($"what to change: give --widen {request.Widen + 1} to free the parts next to those too; or {outcome.Hint}");
                context.Err.WriteLine($"{file.Name} was not changed.");
                return ExitCodes.RuleViolations;
            }
            var now = outcome.Project!.FindPart(request.Ref)!;
            if (!parse.GetValue(quiet) || dry)
            {
                context.Out.WriteLine($"{request.Ref}: {Describe(old)} -> {Describe(now)}");
                if (outcome.Placement is { } placed)
                {
                    context.Out.WriteLine(PartSwap.UnmovedLine(outcome));
                    context.Out.WriteLine($"the layout check passed ({placed.Report!.Warnings} warning{(placed.Report.Warnings == 1 ? "" : "s")}); 'padplan check' adds polarity and ratings at the operating point");
                    foreach (var line in PlaceCommand.SideBySide(LayoutFigures.Of(input), LayoutFigures.Of(outcome.Project))) context.Out.WriteLine(line);
                }
                else if (input.Layout?.Placements.Any(p => p.Ref == request.Ref) == true) context.Out.WriteLine("same footprint and pin order: nothing on the board moves.");
                else context.Out.WriteLine($"{request.Ref} is not placed yet, so nothing else changes; 'padplan place' places it.");
            }
            if (dry)
            {
                context.Out.WriteLine($"dry run: {file.Name} was not changed.");
                return ExitCodes.Success;
            }
            ProjectFile.Write(outcome.Project, file.FullName);
            if (!parse.GetValue(quiet)) context.Out.WriteLine($"wrote {file.Name}; the BOM, sheets and exports now show {request.Ref} as {Describe(now)}.");
            return ExitCodes.Success;
        }));
        return command;
    }

    private static string Describe(Part part) => $"{part.Value} on {part.Footprint}" + (part.Variant is { } v ? $" ({v})" : "");
}
