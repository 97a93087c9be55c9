using PadPlan.Cli;

namespace PadPlan.Tests.Cli;

/// <summary>Runs the padplan command line in-process and captures what it prints.</summary>
public static class CliRunner
{
    public sealed record Result(int ExitCode, string Out, string Err);

    public static Result Run(params string[] args) => RunAt(TerminalWidth.Unknown, args);

    /// <summary>Runs with a terminal of the given width (what COLUMNS or the console would say).</summary>
    public static Result RunAt(int columns, params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        var code = PadPlanCli.Run(args, stdout, stderr, columns: columns);
        return new Result(code, stdout.ToString(), stderr.ToString());
    }
}
