namespace PadPlan.Cli;

/// <summary>The exit codes every command uses (documented in README).</summary>
public static class ExitCodes
{
    public const int Success = 0;
    /// <summary>The plan was read but breaks rules (check errors, a placement that cannot be made legal).</summary>
    public const int RuleViolations = 1;
    /// <summary>Bad command line or bad input file; nothing was written.</summary>
    public const int InputError = 2;
    /// <summary>A fault inside PadPlan; please report it with the input.</summary>
    public const int InternalError = 3;
}
