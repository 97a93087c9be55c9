namespace PadPlan.Fuzz;

/// <summary>How many cases, from which seed, and the limits each case must keep. The normal suite runs 500 cases from a fixed seed; PADPLAN_FUZZ_CASES and PADPLAN_FUZZ_SEED ask for a longer or different run.</summary>
/// <param name="CaseTimeout">Wall time after which a case counts as hung (raised on a machine so busy that this is too short).</param>
/// <param name="MemoryLimitBytes">Peak resident memory allowed while one command runs, the harness's own share included.</param>
/// <param name="CpuLimit">CPU time allowed for one command.</param>
public sealed record FuzzSettings(int Cases, int Seed, TimeSpan CaseTimeout, long MemoryLimitBytes, TimeSpan CpuLimit, string? KeepFailuresIn)
{
    public const int DefaultCases = 500;
    public const int DefaultSeed = 15;

    /// <summary>Issue 25: every command on an input inside the limits within 1 GB and 60 s.</summary>
    public static FuzzSettings FromEnvironment() => new(
        Number("PADPLAN_FUZZ_CASES", DefaultCases),
        Number("PADPLAN_FUZZ_SEED", DefaultSeed),
        TimeSpan.FromSeconds(Number("PADPLAN_FUZZ_TIMEOUT_S", 300)),
        1L * 1024 * 1024 * 1024,
        TimeSpan.FromSeconds(60),
        Environment.GetEnvironmentVariable("PADPLAN_FUZZ_KEEP"));

    private static int Number(string name, int fallback) =>
        int.TryParse(Environment.GetEnvironmentVariable(name), out var value) && value > 0 ? value : fallback;
}
