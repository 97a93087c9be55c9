using PadPlan.Model;
using PadPlan.Gate;
using PadPlan.Planning;

namespace PadPlan.Editor.Sessions;

/// <summary>
/// "Place the rest": runs the placer, gated by the real checker (CheckedPlacer), in the background with held parts and pads kept where they are, reports its
/// progress and can be stopped. The placer keeps items with a locked flag fixed (the same rule as `padplan place`).
/// </summary>
public sealed class PlaceJob
{
    private readonly CancellationTokenSource _stop;
    private readonly Lock _gate = new();
    private PlacerProgress _last;

    private PlaceJob(int runs, CancellationTokenSource stop)
    {
        Runs = runs;
        _stop = stop;
    }

    public int Runs { get; }
    public Task<CheckedPlacement?> Result { get; private set; } = Task.FromResult<CheckedPlacement?>(null);
    public bool Running => !Result.IsCompleted;
    public bool Stopped => _stop.IsCancellationRequested;

    public PlacerProgress Last
    {
        get { lock (_gate) return _last; }
    }

    public static PlaceJob Start(Project project, PlacerSettings settings) => Start(project, settings, new CancellationTokenSource());

    /// <summary>Starts with a stop signal the caller owns (a test can hand in one already given).</summary>
    internal static PlaceJob Start(Project project, PlacerSettings settings, CancellationTokenSource stop)
    {
        var job = new PlaceJob(settings.RunsFor(project.Parts.Count), stop);
        var progress = new StopOrReport(job);
        job.Result = Task.Run<CheckedPlacement?>(() =>
        {
            try
            {
                return CheckedPlacer.Place(project, settings, progress);
            }
            catch (Exception e) when (IsStop(e) && job.Stopped)
            {
                return null;
            }
        });
        return job;
    }

    public void Stop() => _stop.Cancel();

    private static bool IsStop(Exception e) => e is OperationCanceledException || e is AggregateException a && a.Flatten().InnerExceptions.All(IsStop);

    // The placer reports progress between temperature steps; throwing there is how a stop reaches it without the
    // placer knowing about cancellation (parallel runs surface it as an AggregateException).
    private sealed class StopOrReport(PlaceJob job) : IProgress<PlacerProgress>
    {
        public void Report(PlacerProgress value)
        {
            job._stop.Token.ThrowIfCancellationRequested();
            lock (job._gate) job._last = value;
        }
    }
}
