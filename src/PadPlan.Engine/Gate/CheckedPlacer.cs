using System.Globalization;
using PadPlan.Model;
using PadPlan.Planning;
using PadPlan.Rules;

namespace PadPlan.Gate;

/// <summary>
/// Placement with one verdict: the placer makes a layout, and the real checker (<see cref="Checker"/>) judges it before anyone is told it
/// succeeded. A layout the checker fails is thrown away and the next seeds are tried, within the effort; the placer and the checker share
/// no code, so this gate is what keeps "placed" and "checked" in agreement.
/// </summary>
public static class CheckedPlacer
{
    /// <summary>Rules about the circuit itself, which no other layout can mend: no point in trying more seeds.</summary>
    private static readonly HashSet<string> CircuitRules = new(StringComparer.Ordinal) { RuleIds.SingleConnection };

    /// <summary>Seeds tried in all: the placer's own runs are already many, so a few more tries are enough to step past an unlucky one.</summary>
    public static int TriesFor(Effort effort) => effort switch
    {
        Effort.Quick => 2,
        Effort.Thorough => 5,
        _ => 3,
    };

    public static CheckedPlacement Place(Project project, PlacerSettings settings, IProgress<PlacerProgress>? progress = null)
    {
        if (CircuitFailure(project) is { } circuit) return CheckedPlacement.Failed(circuit, 0);
        Finding? first = null;
        var errors = 0;
        var tries = TriesFor(settings.Effort);
        for (var t = 0; t < tries; t++)
        {
            var attempt = settings with { Seed = settings.Seed + t };
            var result = Placer.Place(project, attempt, progress);
            if (!result.Succeeded)
            {
                var failure = result.Failure!;
                if (failure.BoardTooSmall) failure = BoardTooSmall(project, settings, failure);
                return CheckedPlacement.Failed(failure, t + 1);
            }
            var report = Checker.Check(result.Project!);
            if (report.Errors == 0) return new CheckedPlacement(result.Project, result.Summary, report, null, t + 1);
            var worst = report.Findings.First(f => f.Severity == Severity.Error);
            if (first is null) { first = worst; errors = report.Errors; }
        }
        return CheckedPlacement.Failed(new PlacementFailure(
            $"the checker failed every layout tried ({tries} seeds from {settings.Seed}): rule {first!.RuleId} is not met: {first.Message}" +
            (errors > 1 ? $" ({errors - 1} more error{(errors > 2 ? "s" : "")} in the first layout.)" : ""),
            $"{first.Hint} Or place with --effort thorough, another --seed, or a larger --board."), tries);
    }

    /// <summary>Errors of the rules about the circuit itself, found by checking the project with nothing placed: no layout can mend them.</summary>
    private static PlacementFailure? CircuitFailure(Project project)
    {
        var errors = Checker.Check(project with { Layout = Layout.Empty }).Findings
            .Where(f => f.Severity == Severity.Error && CircuitRules.Contains(f.RuleId)).ToList();
        if (errors.Count == 0) return null;
        return new PlacementFailure(
            $"the circuit breaks rule {errors[0].RuleId}, which no layout can mend: " + string.Join(" ", errors.Take(5).Select(f => f.Message)) +
            (errors.Count > 5 ? $" ({errors.Count - 5} more.)" : ""),
            errors[0].Hint);
    }

    /// <summary>
    /// The size to advise when the board is too small: one that a quick trial placement on an automatic board, passed by the checker,
    /// has shown to work; the placer's own estimate only when that trial fails too.
    /// </summary>
    private static PlacementFailure BoardTooSmall(Project project, PlacerSettings settings, PlacementFailure estimate)
    {
        var b = project.Board;
        var auto = project with { Board = new Board(null, null, b.CornerRadius, b.Margin, b.Thickness, b.Keepouts) };
        var trial = Place(auto, settings with { Effort = Effort.Quick });
        if (!trial.Succeeded) return estimate;
        var (w, h) = (trial.Project!.Board.Width!.Value, trial.Project.Board.Height!.Value);
        var c = CultureInfo.InvariantCulture;
        return new PlacementFailure(
            string.Create(c, $"board too small: the parts do not fit on {b.Width} x {b.Height} mm; a quick trial placement fitted them on {w} x {h} mm and passed the check."),
            string.Create(c, $"Place with --board {w}x{h} (or --board auto to let the placer size it), or remove parts."),
            BoardTooSmall: true);
    }
}
