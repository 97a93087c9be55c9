namespace PadPlan.Fuzz;

/// <summary>One fuzz case: a damaged input, the command run on it, and what came out.</summary>
public sealed record FuzzCase(int Index, string Source, string Damage, string Command)
{
    public int ExitCode { get; init; } = -1;
    public TimeSpan Duration { get; init; }
    public string? Problem { get; init; }
    public string Err { get; init; } = "";
    /// <summary>The <see cref="KnownFaults"/> entry an internal fault matched: reported, not failed.</summary>
    public string? Known { get; init; }

    public override string ToString() => $"case {Index} ({Source}: {Damage}; padplan {Command}): {Problem}";
}
