using System.Diagnostics;
using PadPlan.Cli.Progress;
using PadPlan.Planning;

namespace PadPlan.Tests.Cli;

/// <summary>Progress of `place`: one line redrawn in place on a terminal, nothing but the summary off one, every step with --verbose.</summary>
public class PlaceProgressTests
{
    private static string UnplacedTinyBuffer()
    {
        var path = Path.Combine(TestPaths.NewTempDir(), "t.padplan.json");
        var project = PadPlan.ProjectFiles.ProjectFile.Read(TestPaths.TinyBuffer) with { Layout = null };
        PadPlan.ProjectFiles.ProjectFile.Write(project, path);
        return path;
    }

    private static string Padplan => Path.Combine(AppContext.BaseDirectory, "padplan.dll");

    [ProgramOnPathFact("script", "bsdutils, from util-linux")]
    public void On_a_terminal_one_line_redraws_itself_with_run_percentage_time_left_and_best_cost()
    {
        var project = UnplacedTinyBuffer();
        // script(1) runs the command on a pseudo-terminal, so stderr is a terminal to it; everything it wrote comes back on stdout.
        var (code, output, _) = Run("script", "-qec", $"dotnet \"{Padplan}\" place \"{project}\" --effort quick", "/dev/null");
        Assert.True(code == 0, output);
        var redraws = output.Split('\r').Where(s => s.StartsWith("placing: run ", StringComparison.Ordinal)).ToList();
        Assert.True(redraws.Count >= 2, $"expected the line to be redrawn; got: {output}");
        Assert.All(redraws, line => Assert.Matches(@"^placing: run [0-9]+/4(?: \(round [0-9]+\))?, [0-9]+%, (about [0-9]+ (s|min) left|estimating time), (best cost [0-9.]+|no legal layout yet)\u001b\[K$", line));
        // Never a new line between redraws: the progress is one line, then the summary.
        var before = output[..output.IndexOf("placed ", StringComparison.Ordinal)];
        Assert.DoesNotContain('\n', before);
        Assert.Contains("leads: total", output);
    }

    [Fact]
    public void Off_a_terminal_stderr_stays_empty_and_stdout_has_the_summary()
    {
        var project = UnplacedTinyBuffer();
        var (code, stdout, stderr) = Run("dotnet", Padplan, "place", project, "--effort", "quick");
        Assert.Equal(0, code);
        Assert.Equal("", stderr);
        Assert.Contains("leads: total", stdout);
    }

    [Fact]
    public void Verbose_prints_a_line_for_every_step()
    {
        var project = UnplacedTinyBuffer();
        var run = CliRunner.Run("place", project, "--effort", "quick", "--verbose");
        Assert.Equal(0, run.ExitCode);
        var steps = run.Err.Split('\n').Where(l => l.Contains(": annealing step ")).ToList();
        Assert.Contains(steps, l => l.Contains("annealing step 1,"));
        Assert.Contains(steps, l => l.Contains("annealing step 2,"));
    }

    [Fact]
    public void The_meter_counts_finished_runs_and_estimates_the_rest_by_their_steps()
    {
        var meter = new ProgressMeter(2);
        for (var step = 1; step <= 50; step++) meter.Report(new PlacerProgress(1, "annealing", step, 10, 1));
        Assert.Equal(50.0 / ProgressMeter.FirstGuessSteps / 2, meter.Fraction, 9);
        meter.Report(new PlacerProgress(1, "legal", 0, 8, 0));
        Assert.Equal(8, meter.BestCost);
        // Run 1 took 50 steps, so run 2 at step 25 is half done: 1.5 of 2 runs.
        meter.Report(new PlacerProgress(2, "annealing", 25, 12, 0));
        Assert.Equal(0.75, meter.Fraction, 9);
        Assert.Equal(TimeSpan.FromSeconds(1), meter.Left(TimeSpan.FromSeconds(3)));
        // A run number starting again means a new round (another seed, or a larger automatic board).
        meter.Report(new PlacerProgress(2, "not legal", 0, 12, 3));
        meter.Report(new PlacerProgress(1, "annealing", 1, 12, 3));
        Assert.Equal(2, meter.Round);
    }

    private static (int Code, string Out, string Err) Run(string program, params string[] args)
    {
        var info = new ProcessStartInfo(program) { RedirectStandardOutput = true, RedirectStandardError = true, RedirectStandardInput = true, UseShellExecute = false };
        foreach (var a in args) info.ArgumentList.Add(a);
        using var process = Process.Start(info)!;
        process.StandardInput.Close();
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        process.WaitForExit();
        return (process.ExitCode, stdout.Result, stderr.Result);
    }
}
