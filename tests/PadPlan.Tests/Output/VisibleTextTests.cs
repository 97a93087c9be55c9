using PadPlan.Output;
using PadPlan.Output.Drawing;

namespace PadPlan.Tests.Output;

/// <summary>Control characters become Unicode control pictures (Unicode 15, block U+2400) and bidi controls (Unicode TR #9) are dropped, in drawings and text alike.</summary>
public sealed class VisibleTextTests
{
    [Theory]
    [InlineData("plain 10k", "plain 10k")]
    [InlineData("a\u0000b", "a\u2400b")] // NUL -> SYMBOL FOR NULL
    [InlineData("\u001b[2J", "\u241b[2J")] // ESC -> SYMBOL FOR ESCAPE
    [InlineData("x\u007fy", "x\u2421y")] // DEL -> SYMBOL FOR DELETE
    [InlineData("a\u0085b", "a\ufffdb")] // C1 NEL -> replacement character
    [InlineData("abc\u202Egnp.exe", "abcgnp.exe")] // RIGHT-TO-LEFT OVERRIDE (CVE-2021-42574 "Trojan Source")
    [InlineData("\u2066x\u2069\u200F", "x")] // isolates and RLM
    public void Controls_are_made_visible_and_bidi_controls_removed(string text, string expected) =>
        Assert.Equal(expected, VisibleText.Of(text));

    [Fact]
    public void Line_breaks_stay_when_asked() => Assert.Equal("a\nb\t\u241b", VisibleText.Of("a\nb\t\u001b", keepLineBreaks: true));

    [Fact]
    public void Drawn_text_is_made_visible_once_for_every_back_end()
    {
        var shape = new TextShape("R1 \u001b\u202E10k\u0007", new PadPlan.Model.Point(0, 0), 3);
        Assert.Equal("R1 \u241b10k\u2407", shape.Text);
    }

    [Fact]
    public void The_terminal_never_gets_an_escape_character()
    {
        var sink = new StringWriter();
        var writer = new PadPlan.Cli.VisibleTextWriter(sink);
        writer.WriteLine("part \u001b]0;title\u0007 \u202Eevil");
        writer.Write('\u001b');
        Assert.Equal("part \u241b]0;title\u2407 evil" + Environment.NewLine + "\u241b", sink.ToString());
    }
}
