using PadPlan.Model;
using PadPlan.Planning;
using PadPlan.Rules;

namespace PadPlan.Gate;

/// <summary>
/// The outcome of <see cref="CheckedPlacer.Place"/>: a placed project that the checker passed (with its summary and report), or the reason there is none.
/// Tries counts the placements made; a try the checker failed is never returned.
/// </summary>
public sealed record CheckedPlacement(Project? Project, PlacementSummary? Summary, CheckReport? Report, PlacementFailure? Failure, int Tries)
{
    public bool Succeeded => Failure is null;

    public static CheckedPlacement Failed(PlacementFailure failure, int tries) => new(null, null, null, failure, tries);
}
