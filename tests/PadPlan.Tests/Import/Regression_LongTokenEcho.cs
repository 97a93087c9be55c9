using PadPlan.Import;
using PadPlan.IO;

namespace PadPlan.Tests.Import;

/// <summary>Issue 15: a 5 MB token was echoed whole in the error message. Words from the user's file are cut to 80 characters in messages.</summary>
public class Regression_LongTokenEcho
{
    [Theory]
    [InlineData("t\nR1 a 0 {0}\n")]           // a bad value
    [InlineData("t\nR1 a 0 1k\n9{0} a b\n")]  // an unknown element
    [InlineData("t\nR1 a 0 1k\nR{0} a\n")]    // missing nodes, echoing the name
    public void Messages_echo_at_most_80_characters_of_a_word(string template)
    {
        // the longest word a netlist line may hold (InputLimits.MaxNetlistLineLength); a longer line is refused whole
        var word = new string('x', 1900);
        var e = Assert.Throws<InputException>(() => ImportFixture.Import(string.Format(System.Globalization.CultureInfo.InvariantCulture, template, word), "bad.cir"));
        Assert.True(e.Message.Length < 400, e.Message[..Math.Min(e.Message.Length, 600)]);
        Assert.Contains(new string('x', NetlistText.EchoLimit - 4) + "...", e.Message);
    }

    [Fact]
    public void Warnings_echo_at_most_80_characters_too()
    {
        var r = ImportFixture.Import($"t\nR1 a 0 1k\nE{new string('y', 1900)} a 0 b 0 2\n");
        Assert.All(r.Notes, n => Assert.True(n.Message.Length < 600));
    }
}
