using System.Diagnostics;
using System.Globalization;
using System.Text.RegularExpressions;

namespace PadPlan.Tests.Lvs;

/// <summary>Runs ngspice in batch mode on a deck and reads back the operating point: every node voltage and every voltage-source branch current.</summary>
public static partial class Ngspice
{
    public static string? Path { get; } = new[] { "/usr/bin/ngspice", "/usr/local/bin/ngspice" }.FirstOrDefault(File.Exists);

    public static bool InCi => string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase);

    // Analyses, outputs and interactive blocks of the user's deck are replaced by one operating point.
    private static readonly string[] Dropped = [".tran", ".ac", ".dc", ".op", ".noise", ".tf", ".disto", ".pz", ".sens", ".four", ".print", ".plot", ".probe", ".meas", ".measure", ".save", ".end", ".width"];

    /// <summary>The operating point: lower-case node name or "vname#branch" to value.</summary>
    public static Dictionary<string, double> OperatingPoint(string deck)
    {
        var exe = Path ?? throw new InvalidOperationException("ngspice is not installed (apt-get install ngspice); CI must install it (.ci/run).");
        var lines = deck.ReplaceLineEndings("\n").Split('\n').ToList();
        var kept = new List<string> { lines[0] };
        var inControl = false;
        foreach (var line in lines.Skip(1))
        {
            var head = line.TrimStart().Split([' ', '\t'], 2)[0].ToLowerInvariant();
            if (head == ".control") { inControl = true; continue; }
            if (head == ".endc") { inControl = false; continue; }
            if (inControl || Dropped.Contains(head)) continue;
            kept.Add(line);
        }
        // a spare node of our own: with a single vector ngspice prints it as "all = ..." instead of by name
        kept.AddRange(["Vlvs_spare lvs_spare 0 0", ".control", "set numdgt=15", "op", "print all", ".endc", ".end"]);
        var dir = TestPaths.NewTempDir();
        var file = System.IO.Path.Combine(dir, "deck.cir");
        File.WriteAllLines(file, kept);
        var start = new ProcessStartInfo(exe, ["-b", file]) { RedirectStandardOutput = true, RedirectStandardError = true, WorkingDirectory = dir };
        using var process = Process.Start(start)!;
        var output = process.StandardOutput.ReadToEndAsync();
        var errors = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(120_000)) { process.Kill(true); throw new TimeoutException("ngspice ran over 2 minutes."); }
        var values = new Dictionary<string, double>(StringComparer.OrdinalIgnoreCase);
        foreach (Match m in Value().Matches(output.Result))
            values[Unwrapped(m.Groups[1].Value.ToLowerInvariant())] = double.Parse(m.Groups[2].Value, NumberStyles.Float, CultureInfo.InvariantCulture);
        if (values.Count == 0) throw new InvalidOperationException($"ngspice gave no operating point for:\n{string.Join("\n", kept)}\n--- stdout\n{output.Result}\n--- stderr\n{errors.Result}");
        return values;
    }

    /// <summary>
    /// Runs `ngspice -b` on a deck file as it stands (nothing removed or added), in the deck's folder with HOME set to
    /// that folder (so no start-up file of the machine's user is read); returns stdout and stderr. ngspice may fail on
    /// the deck: only what it does matters to the caller (a marker file it creates, or not).
    /// </summary>
    public static string RunBatch(string deckFile)
    {
        var exe = Path ?? throw new InvalidOperationException("ngspice is not installed (apt-get install ngspice); CI must install it (.ci/run).");
        var dir = System.IO.Path.GetDirectoryName(deckFile)!;
        var start = new ProcessStartInfo(exe, ["-b", deckFile]) { RedirectStandardOutput = true, RedirectStandardError = true, RedirectStandardInput = true, WorkingDirectory = dir };
        start.Environment["HOME"] = dir;
        using var process = Process.Start(start)!;
        process.StandardInput.Close();
        var output = process.StandardOutput.ReadToEndAsync();
        var errors = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(60_000)) { process.Kill(true); throw new TimeoutException("ngspice ran over 1 minute."); }
        return output.Result + "\n" + errors.Result;
    }

    // numeric node names are printed as v(10)
    private static string Unwrapped(string name) => name.StartsWith("v(", StringComparison.Ordinal) && name.EndsWith(')') ? name[2..^1] : name;

    [GeneratedRegex(@"^\s*(\S+)\s*=\s*([-+0-9.eE]+)\s*$", RegexOptions.Multiline)]
    private static partial Regex Value();
}
