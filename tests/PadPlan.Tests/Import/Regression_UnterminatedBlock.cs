using PadPlan.IO;

namespace PadPlan.Tests.Import;

/// <summary>Issue 15: a .subckt with no .ends, or a .control with no .endc, swallowed the rest of the deck and imported 0 parts with exit 0. Each is now an input error at the line that opens the block (ngspice manual: .subckt ... .ends, .control ... .endc).</summary>
public class Regression_UnterminatedBlock
{
    [Theory]
    [InlineData("t\nR1 a 0 1k\n.subckt AMP a b\nR1 a b 1k\nR2 a 0 1k\n", 3, ".subckt AMP is never closed")]
    [InlineData("t\nR1 a 0 1k\n.control\nrun\n", 3, ".control is never closed")]
    [InlineData("t\nR1 a 0 1k\n.ends\n", 3, ".ends with no .subckt open")]
    public void An_unclosed_block_is_an_input_error_at_its_opening_line(string deck, int line, string message)
    {
        var e = Assert.Throws<InputException>(() => ImportFixture.Import(deck, "bad.cir"));
        Assert.Equal(line, e.Line);
        Assert.Contains(message, e.Message);
    }
}
