using System.CommandLine;
using System.Globalization;
using PadPlan.Cli.Progress;
using PadPlan.Gate;
using PadPlan.Model;
using PadPlan.Planning;
using PadPlan.ProjectFiles;

namespace PadPlan.Cli.Commands;

/// <summary>`padplan place`: Place parts and pads automatically, have the checker pass the result, and write the layout into the project.</summary>
public static class PlaceCommand
{
    public static Command Create(CommandContext context)
    {
        var project = SharedOptions.ProjectArgument();
        var seed = new Option<int>("--seed") { Description = "Seed of the random moves; the same seed gives the same layout.", DefaultValueFactory = _ => 1 };
        var effort = new Option<string>("--effort") { Description = "How hard to work: quick, normal or thorough.", DefaultValueFactory = _ => "normal" };
        effort.AcceptOnlyFromAmong("quick", "normal", "thorough");
        var keep = new Option<bool>("--keep-existing") { Description = "Keep every part and pad already in the layout where it is; place only the rest." };
        var force = new Option<bool>("--force") { Description = "Replace the project's layout; the old and new figures are printed side by side." };
        var board = SharedOptions.Board();
        var verbose = new Option<bool>("--verbose", "-v") { Description = "Print a line for every annealing step on stderr." };
        var quiet = SharedOptions.Quiet();
        var command = new Command("place", "Place parts and pads automatically, check the result, and write the layout into the project.")
            { project, seed, effort, keep, force, board, verbose, quiet };
        command.SetAction(parse => context.Guarded(() =>
        {
            var file = parse.GetValue(project)!;
            using var claim = ProjectFile.Claim(file.FullName);
            var input = ProjectFile.Read(file.FullName);
            var keepExisting = parse.GetValue(keep);
            var replacing = input.Layout is { } old && (old.Placements.Count > 0 || old.Pads.Count > 0) && !keepExisting;
            if (replacing && !parse.GetValue(force))
                throw new UsageException(
                    $"{file.Name} already has a layout ({input.Layout!.Placements.Count} parts placed). Give --force to replace it (old and new figures are printed side by side), " +
                    "or --keep-existing to keep it and place only the parts not yet on the board. The file was not changed.");
            var before = replacing ? LayoutFigures.Of(input) : null;
            if (SharedOptions.TryBoardSize(parse, board, out var size))
                input = input with { Board = size is { } s ? input.Board.WithSize(s.Width, s.Height) : AutoBoard(input.Board) };
            var settings = new PlacerSettings(parse.GetValue(seed), Enum.Parse<Effort>(parse.GetValue(effort)!, ignoreCase: true), keepExisting);
            var runs = settings.RunsFor(input.Parts.Count);
            var terminal = !parse.GetValue(quiet) && !parse.GetValue(verbose) && context.ErrIsTerminal ? new TerminalProgress(context.ProgressLine, runs) : null;
            IProgress<PlacerProgress>? progress = parse.GetValue(quiet) ? null : parse.GetValue(verbose) ? new VerboseProgress(context.Err, runs) : terminal;
            CheckedPlacement result;
            using (terminal)
                result = CheckedPlacer.Place(input, settings, progress);
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
                context.Out.WriteLine($"placed {input.Parts.Count} parts in {file.Name}; the layout check passed ({result.Report!.Warnings} warning{(result.Report.Warnings == 1 ? "" : "s")}); 'padplan check' adds polarity and ratings at the operating point");
                if (result.Tries > 1)
                    context.Out.WriteLine($"the checker failed {result.Tries - 1} earlier layout{(result.Tries > 2 ? "s" : "")}; this one is from seed {result.Summary!.Seed}");
                foreach (var line in result.Summary!.Lines()) context.Out.WriteLine(line);
                if (before is not null)
                {
                    context.Out.WriteLine("replaced the old layout:");
                    foreach (var line in SideBySide(before, LayoutFigures.Of(result.Project!))) context.Out.WriteLine(line);
                }
            }
            return ExitCodes.Success;
        }));
        return command;
    }

    private static Board AutoBoard(Board b) => new(null, null, b.CornerRadius, b.Margin, b.Thickness, b.Keepouts);

    /// <summary>The old and new layout's figures in two columns, so a worse result is seen at once.</summary>
    public static IEnumerable<string> SideBySide(LayoutFigures before, LayoutFigures after)
    {
        static string Mm(double v) => v.ToString("0.0", CultureInfo.InvariantCulture) + " mm";
        static string Area(double? v) => v is { } a ? a.ToString("0", CultureInfo.InvariantCulture) + " mm²" : "automatic";
        var rows = new (string Figure, string Old, string New)[]
        {
            ("figure", "old", "new"),
            ("total lead", Mm(before.TotalLead), Mm(after.TotalLead)),
            ("longest lead", $"{Mm(before.LongestLead)} ({before.LongestLeadName})", $"{Mm(after.LongestLead)} ({after.LongestLeadName})"),
            ("jumpers", before.Links.ToString(CultureInfo.InvariantCulture), after.Links.ToString(CultureInfo.InvariantCulture)),
            ("board area", Area(before.BoardArea), Area(after.BoardArea)),
        };
        var w1 = rows.Max(r => r.Figure.Length);
        var w2 = rows.Max(r => r.Old.Length);
        return rows.Select(r => $"  {r.Figure.PadRight(w1)}  {r.Old.PadRight(w2)}  {r.New}".TrimEnd());
    }
}
