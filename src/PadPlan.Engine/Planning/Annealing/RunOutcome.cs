namespace PadPlan.Planning;

/// <summary>One finished run: its state, whether it breaks no rule, and how many moves it tried.</summary>
internal sealed record RunOutcome(AnnealState State, bool Legal, long Moves)
{
    /// <summary>Move statistics of the kept run.</summary>
    public MoveStats? Stats { get; init; }
    /// <summary>Runs made before they agreed (or all of them).</summary>
    public int Runs { get; init; } = 1;
}
