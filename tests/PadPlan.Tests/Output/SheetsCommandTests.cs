using PadPlan.IO;
using PadPlan.Cli.Commands;
using PadPlan.Tests.Cli;
using Xunit;

namespace PadPlan.Tests.Output;

/// <summary>`padplan sheets` on the command line.</summary>
public class SheetsCommandTests
{
    [Fact]
    public void Writes_pdf_svg_and_png_for_every_sheet()
    {
        var dir = TestPaths.NewTempDir();
        var result = CliRunner.Run("sheets", TestPaths.TinyBuffer, "-o", dir, "--date", "2025-03-01", "--dpi", "40");
        Assert.Equal(0, result.ExitCode);
        var names = Directory.GetFiles(dir).Select(Path.GetFileName).Where(n => n != OutputSet.ListName).Order().ToList();
        // The report (cautions, check, the picture of the finished board, cut list, the 100 x 160 mm stock drawn 1 : 1, BOM,
        // build order, test plan) takes four pages for this board.
        Assert.Equal(["assembly-1.png", "assembly-1.svg", "report-1.png", "report-1.svg", "report-2.png", "report-2.svg", "report-3.png", "report-3.svg", "report-4.png", "report-4.svg", "sheets.pdf", "template-1.png", "template-1.svg"], names);
        // 210 mm at 40 dpi = 330.7 px
        using var png = RenderedImage.FromPng(File.ReadAllBytes(Path.Combine(dir, "template-1.png")));
        Assert.Equal(331, png.Bitmap.Width);
        // it says what it wrote: pages of each kind, counted against the files, and the assembly view's scale as printed on it
        Assert.Contains("6 pages: 1 template, 1 assembly (scale 3 : 1), 4 report", result.Err);
        Assert.Contains("scale 3 : 1", File.ReadAllText(Path.Combine(dir, "assembly-1.svg")));
    }

    [Fact]
    public void Formats_and_paper_can_be_chosen()
    {
        var dir = TestPaths.NewTempDir();
        var result = CliRunner.Run("sheets", TestPaths.TinyBuffer, "-o", dir, "--date", "2025-03-01", "--formats", "svg", "--paper", "letter");
        Assert.Equal(0, result.ExitCode);
        Assert.All(Directory.GetFiles(dir).Where(f => Path.GetFileName(f) != OutputSet.ListName), f => Assert.EndsWith(".svg", f));
        Assert.Contains("width=\"215.9mm\"", File.ReadAllText(Path.Combine(dir, "template-1.svg")));
    }

    [Theory]
    [InlineData("--paper", "a5", "unknown paper")]
    [InlineData("--formats", "pdf,tiff", "unknown kind")]
    [InlineData("--dpi", "5", "out of range")]
    [InlineData("--date", "1.3.2025", "YYYY-MM-DD")]
    public void Bad_options_exit_2_with_a_message(string option, string value, string message)
    {
        var dir = TestPaths.NewTempDir();
        var result = CliRunner.Run("sheets", TestPaths.TinyBuffer, "-o", dir, option, value);
        Assert.Equal(2, result.ExitCode);
        Assert.Contains(message, result.Err);
        Assert.Empty(Directory.GetFiles(dir));
    }

    [Theory]
    // reproducible-builds.org SOURCE_DATE_EPOCH: seconds since 1970-01-01 UTC; 1740787200 = 2025-03-01T00:00:00Z
    [InlineData("2024-02-29", "1740787200", 2024, 2, 29)]
    [InlineData(null, "1740787200", 2025, 3, 1)]
    [InlineData(null, "1740873599", 2025, 3, 1)]
    public void Date_comes_from_option_then_source_date_epoch(string? option, string? epoch, int y, int m, int d)
    {
        Assert.Equal(new DateOnly(y, m, d), SheetsCommand.ResolveDate(option, epoch));
    }

    [Fact]
    public void Without_option_or_epoch_the_date_is_today()
    {
        var before = DateOnly.FromDateTime(DateTime.Now);
        var got = SheetsCommand.ResolveDate(null, null);
        Assert.InRange(got, before, before.AddDays(1));
    }
}
