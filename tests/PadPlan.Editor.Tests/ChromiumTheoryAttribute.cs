namespace PadPlan.Editor.Tests;

/// <summary>A browser theory: skipped with a visible reason when Debian's chromium is not installed, except in CI (CI=true), where it must run.</summary>
public sealed class ChromiumTheoryAttribute : TheoryAttribute
{
    public ChromiumTheoryAttribute()
    {
        if (!File.Exists(ChromiumFactAttribute.ChromiumPath) && !ChromiumFactAttribute.InCi)
            Skip = $"{ChromiumFactAttribute.ChromiumPath} is not installed (Debian package 'chromium'); the sheet layout tests need it. CI installs it and runs them.";
    }
}
