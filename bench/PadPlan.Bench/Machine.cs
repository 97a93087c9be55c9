namespace PadPlan.Bench;

/// <summary>What the benchmark ran on and how busy it was: other work on a shared machine inflates wall times, so every figure carries the load beside it.</summary>
internal static class Machine
{
    public static string Describe()
    {
        var cpu = "unknown CPU";
        try
        {
            cpu = File.ReadLines("/proc/cpuinfo").FirstOrDefault(l => l.StartsWith("model name", StringComparison.Ordinal))?.Split(':', 2)[1].Trim() ?? cpu;
        }
        catch (IOException)
        {
            // not Linux: leave the CPU unnamed
        }
        return $"{Environment.ProcessorCount} logical processors (nproc), {cpu}; {System.Runtime.InteropServices.RuntimeInformation.FrameworkDescription}, {System.Runtime.InteropServices.RuntimeInformation.OSDescription}";
    }

    /// <summary>The 1-minute load average (runnable processes, averaged), or NaN where the system does not say.</summary>
    public static double Load()
    {
        try
        {
            return double.Parse(File.ReadAllText("/proc/loadavg").Split(' ')[0], System.Globalization.CultureInfo.InvariantCulture);
        }
        catch (IOException)
        {
            return double.NaN;
        }
    }
}
