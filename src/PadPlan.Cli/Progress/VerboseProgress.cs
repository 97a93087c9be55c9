using PadPlan.Planning;

namespace PadPlan.Cli.Progress;

/// <summary>A line on stderr for every temperature step and every finished run (--verbose).</summary>
public sealed class VerboseProgress(TextWriter err, int runs) : IProgress<PlacerProgress>
{
    private readonly Lock _gate = new();

    public void Report(PlacerProgress value)
    {
        lock (_gate)
            err.WriteLine(FormattableString.Invariant($"  run {value.Run}/{runs}: {value.Stage}{(value.Step > 0 ? $" step {value.Step}" : "")}, cost {value.Cost:0.0}; {value.Remaining}"));
    }
}
