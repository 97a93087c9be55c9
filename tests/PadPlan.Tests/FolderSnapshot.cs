using Xunit;

namespace PadPlan.Tests;

/// <summary>The files of a folder, by name, with their bytes: to show that a refused or failed run changed nothing.</summary>
public static class FolderSnapshot
{
    public static Dictionary<string, byte[]> Of(string dir) =>
        Directory.GetFiles(dir).ToDictionary(f => Path.GetFileName(f)!, File.ReadAllBytes);

    /// <summary>Fails unless the folder holds exactly the files of <paramref name="before"/>, byte for byte.</summary>
    public static void AssertSame(Dictionary<string, byte[]> before, string dir)
    {
        var now = Of(dir);
        Assert.Equal(before.Keys.Order(StringComparer.Ordinal), now.Keys.Order(StringComparer.Ordinal));
        foreach (var (name, bytes) in before) Assert.True(bytes.SequenceEqual(now[name]), $"{name} changed");
    }
}
