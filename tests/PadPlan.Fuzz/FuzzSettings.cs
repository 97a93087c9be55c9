namespace PadPlan.Fuzz;

/// <summary>How many cases, from which seed, and the limits each case must keep. The normal suite runs 500 cases from a fixed seed; PADPLAN_FUZZ_CASES and PADPLAN_FUZZ_SEED ask for a longer or different run.</summary>
public sealed record FuzzSettings(int Cases, int Seed, TimeSpan CaseTimeout, long MemoryLimitBytes, string? KeepFailuresIn)
{
    public const int DefaultCases = 500;
    public const int DefaultSeed = 15;

    public static FuzzSettings FromEnvironment() => new(
        Number("PADPLAN_FUZZ_CASES", DefaultCases),
        Number("PADPLAN_FUZZ_SEED", DefaultSeed),
        TimeSpan.FromSeconds(Number("PADPLAN_FUZZ_TIMEOUT_S", 30)),
        2L * 1024 * 1024 * 1024,
        Environment.GetEnvironmentVariable("PADPLAN_FUZZ_KEEP"));

    private static int Number(string name, int fallback) =>
        int.TryParse(Environment.GetEnvironmentVariable(name), out var value) && value > 0 ? value : fallback;
}
