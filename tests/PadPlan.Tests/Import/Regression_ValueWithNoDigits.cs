using PadPlan.IO;

namespace PadPlan.Tests.Import;

/// <summary>Issue 15: "R1 a b n2" crashed with exit 3 (ArgumentOutOfRange in ToIecCode). A SPICE value starts with a digit (SPICE2/SPICE3 element line syntax); a word that does not is an input error with file and line.</summary>
public class Regression_ValueWithNoDigits
{
    [Theory]
    [InlineData("t\nR1 a b n2\nR2 a b 1k\n")]
    [InlineData("t\nR2 a b 1k\nC1 a b uf\n")]
    public void A_value_with_no_leading_digit_is_an_input_error_with_file_and_line(string deck)
    {
        var e = Assert.Throws<InputException>(() => ImportFixture.Import(deck, "bad.cir"));
        Assert.Equal("bad.cir", e.File);
        Assert.Equal(deck.StartsWith("t\nR1") ? 2 : 3, e.Line);
        Assert.Contains("bad value", e.Message);
        Assert.Contains("starts with a digit", e.Message);
    }

    [Fact]
    public void A_tiny_resistance_gets_a_code_instead_of_a_crash() =>
        Assert.Equal("200 pΩ", new PadPlan.Model.Values.ComponentValue(2e-10, "Ω").ToIecCode());
}
