using System.Text;
using PadPlan.Tests.Cli;

namespace PadPlan.Tests.Regressions;

/// <summary>Regression: a UTF-8 BOM or a UTF-16 file got a parser message ("'0xEF' is an invalid start of a value").</summary>
public sealed class Regression_ByteOrderMark
{
    [Fact]
    public void A_utf8_project_with_a_byte_order_mark_is_read()
    {
        var file = Path.Combine(TestPaths.NewTempDir(), "bom.padplan.json");
        File.WriteAllBytes(file, [0xEF, 0xBB, 0xBF, .. File.ReadAllBytes(TestPaths.TinyBuffer)]);
        var result = CliRunner.Run("check", file);
        Assert.True(result.ExitCode == 0, result.Err);
    }

    [Theory]
    [InlineData("utf-16")]
    [InlineData("utf-16BE")]
    [InlineData("utf-32")]
    public void A_utf16_or_utf32_project_is_refused_with_save_it_as_utf8(string encoding)
    {
        var file = Path.Combine(TestPaths.NewTempDir(), "wide.padplan.json");
        var enc = Encoding.GetEncoding(encoding);
        File.WriteAllBytes(file, [.. enc.GetPreamble(), .. enc.GetBytes(File.ReadAllText(TestPaths.TinyBuffer))]);
        var result = CliRunner.Run("check", file);
        Assert.Equal(2, result.ExitCode);
        Assert.Contains("save it as UTF-8", result.Err, StringComparison.Ordinal);
        Assert.DoesNotContain("0xEF", result.Err, StringComparison.Ordinal);
    }
}
