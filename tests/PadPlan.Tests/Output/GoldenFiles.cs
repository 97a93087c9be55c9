using System.Globalization;
using System.Text.RegularExpressions;
using SkiaSharp;
using Xunit;

namespace PadPlan.Tests.Output;

/// <summary>
/// Stored reference outputs under tests/PadPlan.Tests/Output/Golden. Set PADPLAN_UPDATE_GOLDEN=1 to rewrite them after a
/// deliberate change of the look, then inspect the new PNGs before committing.
/// </summary>
public static partial class GoldenFiles
{
    public static string Folder => Path.Combine(TestPaths.RepoRoot, "tests", "PadPlan.Tests", "Output", "Golden");
    private static bool Updating => Environment.GetEnvironmentVariable("PADPLAN_UPDATE_GOLDEN") == "1";

    /// <summary>Compares SVG text after normalising line ends and rounding every number to 0.01 mm, so float noise below print resolution does not count.</summary>
    public static void AssertSvg(string name, string actual)
    {
        var normal = NormaliseSvg(actual);
        var path = Path.Combine(Folder, name);
        if (Updating) File.WriteAllText(path, normal);
        Assert.True(File.Exists(path), $"golden file {path} is missing; run the tests with PADPLAN_UPDATE_GOLDEN=1 to create it.");
        var expected = NormaliseSvg(File.ReadAllText(path));
        if (expected == normal) return;
        var (e, a) = (expected.Split('\n'), normal.Split('\n'));
        var line = Enumerable.Range(0, Math.Min(e.Length, a.Length)).FirstOrDefault(i => e[i] != a[i], Math.Min(e.Length, a.Length));
        Assert.Fail($"{name} differs from its golden file at line {line + 1}:\n expected: {(line < e.Length ? e[line] : "(end)")}\n actual:   {(line < a.Length ? a[line] : "(end)")}");
    }

    /// <summary>Compares a PNG with its golden image: same size, mean channel difference under 1 level in 255, and under 0.5 % of pixels off by more than a quarter.</summary>
    public static void AssertPng(string name, byte[] actual)
    {
        var path = Path.Combine(Folder, name);
        if (Updating) File.WriteAllBytes(path, actual);
        Assert.True(File.Exists(path), $"golden file {path} is missing; run the tests with PADPLAN_UPDATE_GOLDEN=1 to create it.");
        using var expected = SKBitmap.Decode(File.ReadAllBytes(path));
        using var got = SKBitmap.Decode(actual);
        Assert.Equal((expected.Width, expected.Height), (got.Width, got.Height));
        double sum = 0;
        var far = 0;
        for (var y = 0; y < got.Height; y++)
            for (var x = 0; x < got.Width; x++)
            {
                var (p, q) = (expected.GetPixel(x, y), got.GetPixel(x, y));
                var d = (Math.Abs(p.Red - q.Red) + Math.Abs(p.Green - q.Green) + Math.Abs(p.Blue - q.Blue)) / 3.0;
                sum += d;
                if (d > 64) far++;
            }
        var pixels = (double)got.Width * got.Height;
        Assert.True(sum / pixels < 1.0, $"{name}: mean difference {sum / pixels:0.00} levels, limit 1.0");
        Assert.True(far / pixels < 0.005, $"{name}: {far} pixels ({100 * far / pixels:0.00} %) differ strongly, limit 0.5 %");
    }

    public static string NormaliseSvg(string svg) =>
        Number().Replace(svg.ReplaceLineEndings("\n"), m =>
        {
            var v = Math.Round(double.Parse(m.Value, CultureInfo.InvariantCulture), 2, MidpointRounding.AwayFromZero);
            return (v == 0 ? 0 : v).ToString("0.##", CultureInfo.InvariantCulture);
        });

    [GeneratedRegex(@"-?\d+\.\d+")]
    private static partial Regex Number();
}
