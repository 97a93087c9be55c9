using System.Diagnostics;

namespace PadPlan.Simulation;

/// <summary>
/// Finds ngspice (an explicit path, else the PADPLAN_NGSPICE environment variable, else the first "ngspice" on PATH) and
/// runs it in batch mode (`ngspice -b deck`) on a deck in a private temporary folder, within a time limit.
/// </summary>
public static class NgspiceProgram
{
    /// <summary>The program to run, or null when none is found. A path that is given but missing is an error the caller reports.</summary>
    public static string? Find(SimulationOptions options, Func<string, string?>? environment = null)
    {
        environment ??= Environment.GetEnvironmentVariable;
        var given = options.NgspicePath ?? environment(SimulationOptions.EnvironmentVariable);
        if (!string.IsNullOrWhiteSpace(given)) return given;
        var path = environment("PATH") ?? "";
        foreach (var dir in path.Split(Path.PathSeparator, StringSplitOptions.RemoveEmptyEntries))
        {
            var candidate = Path.Combine(dir, OperatingSystem.IsWindows() ? "ngspice.exe" : "ngspice");
            if (File.Exists(candidate)) return candidate;
        }
        return null;
    }

    /// <summary>The batch run's standard output, or a failure reason (the program would not start, ran over the time limit).</summary>
    public static (string? Output, string? Failure) Run(string program, string deck, TimeSpan limit)
    {
        var dir = Path.Combine(Path.GetTempPath(), "padplan-sim-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        try
        {
            var file = Path.Combine(dir, "op.cir");
            File.WriteAllText(file, deck);
            var start = new ProcessStartInfo(program, ["-b", file])
            {
                RedirectStandardOutput = true, RedirectStandardError = true, RedirectStandardInput = true, WorkingDirectory = dir, UseShellExecute = false,
            };
            Process? process;
            try { process = Process.Start(start); }
            catch (Exception e) when (e is System.ComponentModel.Win32Exception or IOException or InvalidOperationException)
            {
                return (null, $"ngspice could not be started from {program} ({e.Message}); set --ngspice or {SimulationOptions.EnvironmentVariable} to the program");
            }
            if (process is null) return (null, $"ngspice could not be started from {program}");
            using (process)
            {
                process.StandardInput.Close();
                var output = process.StandardOutput.ReadToEndAsync();
                var errors = process.StandardError.ReadToEndAsync();
                if (!process.WaitForExit(limit))
                {
                    try { process.Kill(entireProcessTree: true); } catch (InvalidOperationException) { }
                    process.WaitForExit();
                    return (null, $"ngspice ran over the time limit of {limit.TotalSeconds:0.#} s and was stopped");
                }
                process.WaitForExit();
                return (output.Result + "\n" + errors.Result, null);
            }
        }
        finally
        {
            try { Directory.Delete(dir, recursive: true); } catch (IOException) { } catch (UnauthorizedAccessException) { }
        }
    }
}
