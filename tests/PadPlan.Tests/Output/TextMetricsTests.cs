using PadPlan.Output.Drawing;

namespace PadPlan.Tests.Output;

/// <summary>Fitting and wrapping agree with whole-string measuring, and long text is shortened with an ellipsis.</summary>
public sealed class TextMetricsTests
{
    [Theory]
    [InlineData("QN-41 general purpose NPN transistor in TO-92", 20)]
    [InlineData("100n", 20)]
    [InlineData("ABCDEFGHIJKLMNOPQRSTUVWXYZ", 5)]
    public void Fit_returns_text_no_wider_than_asked_ending_in_an_ellipsis_when_cut(string text, double width)
    {
        var fitted = TextMetrics.Fit(text, 3, width);
        Assert.True(TextMetrics.Width(fitted, 3) <= width + 1e-9);
        if (fitted != text) Assert.EndsWith("…", fitted, StringComparison.Ordinal);
        Assert.StartsWith(fitted.TrimEnd('…'), text, StringComparison.Ordinal);
    }

    [Fact]
    public void Wrap_lines_fit_and_keep_every_character()
    {
        var text = "A 10,000-character part value " + new string('x', 300) + " ends here";
        var lines = TextMetrics.Wrap(text, 2.5, 40);
        Assert.All(lines, l => Assert.True(TextMetrics.Width(l, 2.5) <= 40 + 1e-6, $"'{l}' is too wide"));
        Assert.Equal(text.Replace(" ", "", StringComparison.Ordinal), string.Concat(lines).Replace(" ", "", StringComparison.Ordinal));
    }

    [Fact]
    public void A_label_longer_than_a_sheet_is_shortened_to_the_sheet()
    {
        var label = new string('W', 100_000);
        var fitted = TextMetrics.Fit(label, 3, 190); // A4 less margins, ISO 216
        Assert.EndsWith("…", fitted, StringComparison.Ordinal);
        Assert.True(fitted.Length < 200);
    }
}
