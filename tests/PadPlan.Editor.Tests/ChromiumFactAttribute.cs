namespace PadPlan.Editor.Tests;

/// <summary>A browser test: skipped with a visible reason when Debian's chromium is not installed, except in CI (CI=true), where a missing browser fails the test instead.</summary>
public sealed class ChromiumFactAttribute : FactAttribute
{
    public const string ChromiumPath = "/usr/bin/chromium";

    public ChromiumFactAttribute()
    {
        if (!File.Exists(ChromiumPath) && !InCi)
            Skip = $"{ChromiumPath} is not installed (Debian package 'chromium'); the editor's browser tests need it. CI installs it and runs them.";
    }

    public static bool InCi => string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase);
}
