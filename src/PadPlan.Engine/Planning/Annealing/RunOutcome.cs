namespace PadPlan.Planning;

/// <summary>One finished run: its state, whether it breaks no rule, and how many moves it tried.</summary>
internal sealed record RunOutcome(AnnealState State, bool Legal, long Moves);
