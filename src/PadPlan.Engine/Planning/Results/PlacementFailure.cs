namespace PadPlan.Planning;

/// <summary>Why a layout could not be made, and what the builder can change to get one. BoardTooSmall marks the one failure a larger board mends.</summary>
public sealed record PlacementFailure(string Message, string Hint, bool BoardTooSmall = false);

/// <summary>Thrown inside the engine when the project cannot be placed as given; the entry point turns it into a failed result.</summary>
internal sealed class PlacementImpossibleException(PlacementFailure failure) : Exception(failure.Message)
{
    public PlacementFailure Failure { get; } = failure;
}
