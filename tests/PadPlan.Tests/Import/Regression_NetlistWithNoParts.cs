using PadPlan.IO;

namespace PadPlan.Tests.Import;

/// <summary>Issue 15: an empty netlist imported 0 parts with exit 0. A netlist with nothing to place is an input error.</summary>
public class Regression_NetlistWithNoParts
{
    [Theory]
    [InlineData("t\n* nothing here\n.end\n", "test.cir")]
    [InlineData("t\nV1 a 0 5\n.end\n", "test.cir")]
    [InlineData("# nothing\n", "test.ppn")]
    public void A_netlist_with_no_parts_is_an_input_error(string deck, string file)
    {
        var e = Assert.Throws<InputException>(() => ImportFixture.Import(deck, file));
        Assert.Contains("no parts", e.Message);
    }
}
