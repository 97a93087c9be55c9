using PadPlan.Model;

namespace PadPlan.Planning;

/// <summary>The outcome of <see cref="Placer.Place"/>: a placed project with its summary, or the reason there is none.</summary>
public sealed record PlacementResult(Project? Project, PlacementSummary? Summary, PlacementFailure? Failure)
{
    public bool Succeeded => Failure is null;

    public static PlacementResult Placed(Project project, PlacementSummary summary) => new(project, summary, null);

    public static PlacementResult Failed(PlacementFailure failure) => new(null, null, failure);
}
