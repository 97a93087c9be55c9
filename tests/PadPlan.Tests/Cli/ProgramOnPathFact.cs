namespace PadPlan.Tests.Cli;

/// <summary>A fact that needs an outside program: skipped with the reason when it is missing, except in CI (CI=true), where it must run and so fails instead.</summary>
public sealed class ProgramOnPathFactAttribute : FactAttribute
{
    public ProgramOnPathFactAttribute(string program, string package)
    {
        if (Find(program) is null && !string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase))
            Skip = $"'{program}' is not installed (Debian package {package}); CI installs it.";
    }

    /// <summary>The program's full path on PATH, or null.</summary>
    public static string? Find(string program) =>
        (Environment.GetEnvironmentVariable("PATH") ?? "").Split(Path.PathSeparator, StringSplitOptions.RemoveEmptyEntries)
            .Select(dir => Path.Combine(dir, program))
            .FirstOrDefault(File.Exists);
}
