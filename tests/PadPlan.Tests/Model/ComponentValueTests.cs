using PadPlan.Model.Values;

namespace PadPlan.Tests.Model;

public sealed class ComponentValueTests
{
    // IEC 60062, letter-and-digit code: the letter stands in place of the decimal sign.
    [Theory]
    [InlineData("R47", 0.47)]      // IEC 60062 example R47 = 0.47 ohm
    [InlineData("4R7", 4.7)]       // IEC 60062 example 4R7 = 4.7 ohm
    [InlineData("470R", 470)]      // IEC 60062 example 470R
    [InlineData("K47", 470)]       // IEC 60062 example K47 = 0.47 kohm
    [InlineData("4K7", 4700)]      // IEC 60062 example 4K7 = 4.7 kohm
    [InlineData("4k7", 4700)]      // lower-case k as commonly printed
    [InlineData("47K3", 47300)]    // IEC 60062 example 47K3 = 47.3 kohm
    [InlineData("M47", 470e3)]     // IEC 60062 example M47 = 0.47 Mohm
    [InlineData("4M7", 4.7e6)]     // IEC 60062 example 4M7
    [InlineData("4p7", 4.7e-12)]   // IEC 60062 example 4p7 = 4.7 pF
    [InlineData("p47", 0.47e-12)]  // IEC 60062 example p47
    [InlineData("4n7", 4.7e-9)]    // IEC 60062 example 4n7
    [InlineData("2u2", 2.2e-6)]    // IEC 60062 example 2µ2, written with u
    [InlineData("2µ2", 2.2e-6)]    // IEC 60062 example 2µ2
    [InlineData("4u7", 4.7e-6)]    // DOMAIN §5, IEC 60062 form
    public void Reads_IEC_60062_codes(string text, double expected)
    {
        var value = ComponentValue.Parse(text);
        Assert.Equal(expected, value.Number, expected * 1e-9);
    }

    // SI prefixes (BIPM SI Brochure, prefix table) with trailing units.
    [Theory]
    [InlineData("100nF", 100e-9, "F")]
    [InlineData("4.7uH", 4.7e-6, "H")]
    [InlineData("2.2µH", 2.2e-6, "H")]
    [InlineData("4.7k", 4700, "")]
    [InlineData("1meg", 1e6, "")]
    [InlineData("10M", 10e6, "")]      // SI: capital M is mega
    [InlineData("10m", 10e-3, "")]
    [InlineData("150ohm", 150, "Ω")]
    [InlineData("7.1MHz", 7.1e6, "Hz")]
    [InlineData("250V", 250, "V")]
    [InlineData("1e3", 1000, "")]
    public void Reads_SI_prefixes_and_units(string text, double expected, string unit)
    {
        var value = ComponentValue.Parse(text, ValueSyntax.SI);
        Assert.Equal(expected, value.Number, expected * 1e-9);
        Assert.Equal(unit, value.Unit);
    }

    // SPICE scale factors (SPICE2/ngspice manual, "scale factors"): case-insensitive, M = milli, MEG = mega, MIL = 25.4e-6.
    [Theory]
    [InlineData("100M", 0.1)]
    [InlineData("100MEG", 100e6)]
    [InlineData("1meg", 1e6)]
    [InlineData("10U", 10e-6)]
    [InlineData("1MIL", 25.4e-6)]
    [InlineData("100nF", 100e-9)]
    [InlineData("3.3K", 3300)]
    [InlineData("1F", 1e-15)]           // F is femto in SPICE
    [InlineData("10Ohms", 10)]          // SPICE ignores letters after the scale
    public void Reads_SPICE_scale_factors(string text, double expected)
    {
        var value = ComponentValue.Parse(text, ValueSyntax.Spice);
        Assert.Equal(expected, value.Number, expected * 1e-9);
    }

    [Theory]
    [InlineData("")]
    [InlineData("abc")]
    [InlineData("{rval}")]
    [InlineData("4.7q")]
    [InlineData("k")]
    public void Rejects_what_is_not_a_value(string text)
    {
        Assert.False(ComponentValue.TryParse(text, ValueSyntax.SI, out _, out var error));
        Assert.False(string.IsNullOrWhiteSpace(error));
    }

    // IEC 60062 codes written back from the number.
    [Theory]
    [InlineData(0.47, "Ω", "R47")]
    [InlineData(4.7, "Ω", "4R7")]
    [InlineData(470, "Ω", "470R")]
    [InlineData(4700, "Ω", "4k7")]
    [InlineData(47300, "Ω", "47k3")]
    [InlineData(4.7e6, "Ω", "4M7")]
    [InlineData(4.7e-12, "F", "4p7")]
    [InlineData(100e-9, "F", "100n")]
    [InlineData(2.2e-6, "H", "2u2")]
    public void Writes_IEC_60062_codes(double number, string unit, string code) =>
        Assert.Equal(code, new ComponentValue(number, unit).ToIecCode());

    [Theory]
    [InlineData(4700, "Ω", "4.7 kΩ")]
    [InlineData(100e-9, "F", "100 nF")]
    [InlineData(2.2e-6, "H", "2.2 µH")]
    [InlineData(0.47, "Ω", "470 mΩ")]
    [InlineData(1e6, "", "1 M")]
    public void Writes_engineering_text(double number, string unit, string text) =>
        Assert.Equal(text, new ComponentValue(number, unit).ToDisplay());
}
