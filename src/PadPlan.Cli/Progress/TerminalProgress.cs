using System.Diagnostics;
using PadPlan.Planning;

namespace PadPlan.Cli.Progress;

/// <summary>One line on a terminal that redraws itself in place: run, percentage, time left, best cost. Redrawn at most ten times a second.</summary>
public sealed class TerminalProgress(TextWriter err, int runs) : IProgress<PlacerProgress>, IDisposable
{
    private static readonly TimeSpan Every = TimeSpan.FromMilliseconds(100);
    private readonly Lock _gate = new();
    private readonly ProgressMeter _meter = new(runs);
    private readonly Stopwatch _clock = Stopwatch.StartNew();
    private TimeSpan _drawn = TimeSpan.FromDays(-1);
    private bool _shown;

    public void Report(PlacerProgress value)
    {
        lock (_gate)
        {
            _meter.Report(value);
            var now = _clock.Elapsed;
            if (now - _drawn < Every) return;
            _drawn = now;
            // Carriage return and "erase to end of line" (ECMA-48 EL): the line is rewritten where it stands.
            err.Write("\r" + Line(_meter, now) + "\u001b[K");
            err.Flush();
            _shown = true;
        }
    }

    /// <summary>The progress line's text.</summary>
    public static string Line(ProgressMeter meter, TimeSpan elapsed)
    {
        var left = meter.Left(elapsed) is { } t ? $"about {Seconds(t)} left" : "estimating time";
        var best = meter.BestCost is { } b ? FormattableString.Invariant($"best cost {b:0.0}") : "no legal layout yet";
        var round = meter.Round > 1 ? $" (round {meter.Round})" : "";
        return FormattableString.Invariant($"placing: run {meter.Run}/{meter.Runs}{round}, {100 * meter.Fraction:0}%, {left}, {best}");
    }

    private static string Seconds(TimeSpan t) => t.TotalSeconds < 60
        ? FormattableString.Invariant($"{Math.Ceiling(t.TotalSeconds):0} s")
        : FormattableString.Invariant($"{Math.Ceiling(t.TotalMinutes):0} min");

    /// <summary>Clears the line, so what follows starts on a clean line.</summary>
    public void Dispose()
    {
        lock (_gate)
        {
            if (!_shown) return;
            err.Write("\r\u001b[K");
            err.Flush();
            _shown = false;
        }
    }
}
