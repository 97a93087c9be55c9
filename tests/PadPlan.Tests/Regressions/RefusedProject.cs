using System.Text.Json.Nodes;
using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>Shared steps of the bad-input regressions: edit the tiny-buffer fixture, run commands on it, expect exit 2 naming the place, and the file unchanged.</summary>
public static class RefusedProject
{
    private static readonly string Good = File.ReadAllText(TestPaths.TinyBuffer);

    /// <summary>The fixture with one change, written to a fresh temp folder; returns the file.</summary>
    public static string Write(Action<JsonNode> change) => WriteText(Edited(change));

    /// <summary>The fixture's JSON text with one change.</summary>
    public static string Edited(Action<JsonNode> change)
    {
        var node = JsonNode.Parse(Good)!;
        change(node);
        return node.ToJsonString();
    }

    public static string WriteText(string text)
    {
        var file = Path.Combine(TestPaths.NewTempDir(), "bad.padplan.json");
        File.WriteAllText(file, text);
        return file;
    }

    /// <summary>Runs check, place, sheets and bom on the file: each exits 2, names <paramref name="place"/> and leaves the file as it was. Returns the last error text.</summary>
    public static string AssertRefused(string file, string place, string? says = null)
    {
        var before = File.ReadAllBytes(file);
        var err = "";
        foreach (var args in new[] { new[] { "check", file }, ["place", file, "--effort", "quick", "-q"], ["sheets", file, "-o", TestPaths.NewTempDir(), "--formats", "svg"], ["bom", file] })
        {
            var result = CliRunner.Run(args);
            Assert.True(result.ExitCode == 2, $"{args[0]} exited {result.ExitCode}: {result.Err}");
            Assert.DoesNotContain("internal error", result.Err, StringComparison.Ordinal);
            Assert.Contains(place, result.Err, StringComparison.Ordinal);
            if (says is not null) Assert.Contains(says, result.Err, StringComparison.Ordinal);
            Assert.Equal(before, File.ReadAllBytes(file));
            err = result.Err;
        }
        return err;
    }

    public static JsonArray Many(int count, Func<int, JsonNode> make) => new([.. Enumerable.Range(0, count).Select(make)]);
}
