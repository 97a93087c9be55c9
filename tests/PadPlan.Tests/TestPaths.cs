namespace PadPlan.Tests;

/// <summary>Where the repository's folders are, found by walking up from the test binaries to PadPlan.sln.</summary>
public static class TestPaths
{
    public static string RepoRoot { get; } = FindRoot();

    public static string Examples => Path.Combine(RepoRoot, "examples");
    public static string Footprints => Path.Combine(RepoRoot, "footprints");
    public static string Docs => Path.Combine(RepoRoot, "docs");

    /// <summary>The small hand-placed plan every area's tests may use as a known-good layout.</summary>
    public static string TinyBuffer => Path.Combine(Examples, "tiny-buffer", "tiny-buffer.padplan.json");

    /// <summary>A copy of the tiny-buffer fixture in a fresh temp folder, for tests that run commands on it.</summary>
    public static string CopyOfTinyBuffer(string name = "t.padplan.json")
    {
        var file = Path.Combine(NewTempDir(), name);
        File.Copy(TinyBuffer, file);
        return file;
    }

    /// <summary>A fresh empty folder under the system temp folder.</summary>
    public static string NewTempDir()
    {
        var dir = Path.Combine(Path.GetTempPath(), "padplan-tests", Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        return dir;
    }

    private static string FindRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "PadPlan.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("cannot find PadPlan.sln above the test folder");
    }
}
