namespace PadPlan.IO;

/// <summary>
/// Named steps of PadPlan's file writes where a test can make the run fail, to prove that no step leaves a broken or
/// mixed result. A test in the same process injects an exception (a full disk, a refused rename); a test that starts
/// padplan as a child process sets PADPLAN_FAULT_AT to a step's name, and the process then ends at that step at once,
/// running no cleanup, as a kill would. Unset, a step costs one comparison.
/// </summary>
public static class FaultPoint
{
    /// <summary>The environment variable that names the step at which the process is killed.</summary>
    public const string KillVariable = "PADPLAN_FAULT_AT";

    private static readonly string? KillAt = Environment.GetEnvironmentVariable(KillVariable);
    private static readonly AsyncLocal<Func<string, Exception?>?> Injected = new();

    /// <summary>Passes a step: ends the process if PADPLAN_FAULT_AT names it, throws what an injected fault returns for it.</summary>
    public static void Step(string name)
    {
        if (KillAt is not null && string.Equals(KillAt, name, StringComparison.Ordinal))
            Environment.FailFast($"{KillVariable}={name}: stopped here as a kill would");
        if (Injected.Value?.Invoke(name) is { } fault) throw fault;
    }

    /// <summary>Makes each step for which <paramref name="fault"/> returns an exception throw it, in this flow of execution only, until disposed.</summary>
    public static IDisposable Inject(Func<string, Exception?> fault)
    {
        var before = Injected.Value;
        Injected.Value = fault;
        return new Restore(() => Injected.Value = before);
    }

    private sealed class Restore(Action undo) : IDisposable
    {
        public void Dispose() => undo();
    }
}
