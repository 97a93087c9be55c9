namespace PadPlan.Fuzz;

/// <summary>One fuzz case: a damaged input, the command run on it, and what came out.</summary>
public sealed record FuzzCase(int Index, string Source, string Damage, string Command)
{
    public int ExitCode { get; init; } = -1;
    public TimeSpan Duration { get; init; }
    /// <summary>CPU time of the case (the process's, the case running alone).</summary>
    public TimeSpan Cpu { get; init; }
    /// <summary>Peak resident memory while the case ran (<see cref="CaseMeter"/>).</summary>
    public long PeakBytes { get; init; }
    public string? Problem { get; init; }
    public string Err { get; init; } = "";
    /// <summary>The <see cref="KnownFaults"/> entry an internal fault matched: reported, not failed.</summary>
    public string? Known { get; init; }

    public override string ToString() => $"case {Index} ({Source}: {Damage}; padplan {Command}): {Problem}";

    /// <summary>One line of figures: exit code, wall and CPU time, peak memory.</summary>
    public string Figures() => $"exit {ExitCode}, {Duration.TotalSeconds:0.0} s wall, {Cpu.TotalSeconds:0.0} s CPU, {PeakBytes / (1024 * 1024)} MB peak";
}
