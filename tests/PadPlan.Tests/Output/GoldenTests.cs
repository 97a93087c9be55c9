using PadPlan.Output.Drawing;
using PadPlan.Output.Sheets;
using Xunit;

namespace PadPlan.Tests.Output;

/// <summary>The sheets of two small plans against stored references (normalised SVG text; PNG within a tolerance, see <see cref="GoldenFiles"/>).</summary>
public class GoldenTests
{
    private const int PreviewDpi = 72;

    public static TheoryData<string, int> Pages => new()
    {
        { "tiny-buffer", 0 },
        { "tiny-buffer", 1 },
        { "dip-strips", 0 },
        { "dip-strips", 1 },
    };

    [Theory]
    [MemberData(nameof(Pages))]
    public void Svg_matches_golden(string plan, int index)
    {
        var sheet = Book(plan).Sheets[index];
        GoldenFiles.AssertSvg($"{plan}-{sheet.FileStem}.svg", SvgWriter.Write(sheet.Page));
    }

    [Theory]
    [MemberData(nameof(Pages))]
    public void Png_matches_golden_within_tolerance(string plan, int index)
    {
        var sheet = Book(plan).Sheets[index];
        GoldenFiles.AssertPng($"{plan}-{sheet.FileStem}.png", PngWriter.Write(sheet.Page, PreviewDpi));
    }

    private static SheetBook Book(string plan) =>
        SheetBook.Build(plan == "tiny-buffer" ? SheetFixtures.TinyBuffer() : SheetFixtures.DipOnStrips(), SheetFixtures.Options(), null, []);
}
