using System.Diagnostics;

namespace PadPlan.Fuzz;

/// <summary>
/// Peak memory and CPU time of one case, run alone in the harness's process: the peak resident set (VmHWM) is reset
/// before the case (Linux /proc/self/clear_refs, value 5) and read after it, so it bounds the case's own peak (it also
/// holds the harness's own few hundred MB). CPU time is the process's, which a busy shared machine does not inflate
/// the way it inflates wall time. Where the reset is not possible the figure is the run's peak so far (still a bound).
/// </summary>
public static class CaseMeter
{
    public readonly record struct Reading(long PeakBytes, TimeSpan Cpu, TimeSpan Wall);

    /// <summary>Starts a measurement: tidies the heap if earlier cases left much behind, resets the peak, notes the CPU time.</summary>
    public static Func<Reading> Start()
    {
        using (var self = Process.GetCurrentProcess())
            if (self.WorkingSet64 > 400L * 1024 * 1024)
            {
                GC.Collect(2, GCCollectionMode.Forced, blocking: true, compacting: true);
                GC.WaitForPendingFinalizers();
            }
        ResetPeak();
        var cpu = Process.GetCurrentProcess().TotalProcessorTime;
        var wall = Stopwatch.StartNew();
        return () =>
        {
            using var self = Process.GetCurrentProcess();
            return new Reading(PeakResident() ?? self.PeakWorkingSet64, self.TotalProcessorTime - cpu, wall.Elapsed);
        };
    }

    private static void ResetPeak()
    {
        try
        {
            File.WriteAllText("/proc/self/clear_refs", "5");
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException)
        {
            // not Linux, or not allowed: the reading is the peak of the run so far
        }
    }

    private static long? PeakResident()
    {
        try
        {
            foreach (var line in File.ReadLines("/proc/self/status"))
                if (line.StartsWith("VmHWM:", StringComparison.Ordinal))
                    return long.Parse(line["VmHWM:".Length..].Trim().Split(' ')[0], System.Globalization.CultureInfo.InvariantCulture) * 1024;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or FormatException)
        {
            // fall back to the process's own figure
        }
        return null;
    }
}
