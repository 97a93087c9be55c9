namespace PadPlan.Planning;

/// <summary>Why a layout could not be made, and what the builder can change to get one.</summary>
public sealed record PlacementFailure(string Message, string Hint);

/// <summary>Thrown inside the engine when the project cannot be placed as given; the entry point turns it into a failed result.</summary>
internal sealed class PlacementImpossibleException(PlacementFailure failure) : Exception(failure.Message)
{
    public PlacementFailure Failure { get; } = failure;
}
