using PadPlan.Output.Spice;
using PadPlan.Planning;
using PadPlan.Tests.Import;

namespace PadPlan.Tests.Lvs;

/// <summary>
/// Values as SPICE reads them. IEC 60062 codes ("4k7", "2R2": the letter stands for the decimal sign and gives the
/// scale) are read as the builder means them; SPICE number syntax (SPICE3 and ngspice: a number, one scale factor, and
/// letters after it ignored) reads "4k7" as 4k. ngspice itself is the oracle for how SPICE reads them: each circuit is
/// one resistor across a 1 V source, so the source current is 1 / R (Ohm's law).
/// </summary>
public class SpiceValueReadingTests
{
    private static double Ohms(string value)
    {
        var op = Ngspice.OperatingPoint($"one resistor\nV1 a 0 1\nR1 a 0 {value}\n.end\n");
        return 1 / -op["v1#branch"];
    }

    [NgspiceTheory]
    [InlineData("4k7", 4000)]
    [InlineData("2R2", 2)]
    [InlineData("4kk7x", 4000)]
    [InlineData("1k5", 1000)]
    public void Ngspice_ignores_letters_after_the_scale_factor(string value, double ohms) =>
        // the fact the import warnings state: ngspice's reading, measured (1e-6 relative)
        Assert.Equal(ohms, Ohms(value), ohms * 1e-6);

    [NgspiceTheory]
    [InlineData("4k7", 4700.0, 4000.0)]
    [InlineData("2R2", 2.2, 2.0)]
    public void An_iec_code_is_read_as_the_builder_means_it_with_a_warning_naming_the_line_and_the_spice_reading(string value, double builder, double spice)
    {
        var result = ImportFixture.Import($"an IEC code\nV1 a 0 1\nR1 a 0 {value}\n.end\n", "iec.cir");
        var note = Assert.Single(result.Notes, n => n.Message.Contains("IEC 60062", StringComparison.Ordinal));
        Assert.Equal(3, note.Line);
        Assert.Contains("ngspice", note.Message, StringComparison.Ordinal);
        Assert.Contains(new PadPlan.Model.Values.ComponentValue(spice, "Ω").ToDisplay(), note.Message, StringComparison.Ordinal);
        Assert.Equal(spice, Ohms(value), spice * 1e-6); // what the warning says SPICE reads, by ngspice
        // the exported deck writes the builder's value as a plain number, and ngspice then reads the builder's value
        var placed = Placer.Place(result.Project, new PlacerSettings(Effort: Effort.Quick)).Project!;
        var deck = ExtractedDeck.Write(placed);
        var r1 = deck.Split('\n').Single(l => l.StartsWith("R1 ", StringComparison.Ordinal));
        Assert.Equal(PadPlan.Model.Spice.SpiceText.Number(builder), r1.Split(' ')[^1]);
        var op = Ngspice.OperatingPoint(deck);
        Assert.Equal(builder, 1 / -op["v1#branch"], builder * 1e-6);
    }

    [NgspiceFact]
    public void Letters_after_the_scale_factor_get_a_warning_naming_the_line_and_the_deck_agrees_with_ngspice()
    {
        var result = ImportFixture.Import("ignored letters\nV1 a 0 1\nR1 a 0 4kk7x\n.end\n", "letters.cir");
        var note = Assert.Single(result.Notes, n => n.Message.Contains("ignores", StringComparison.Ordinal));
        Assert.Equal(3, note.Line);
        Assert.Contains("\"k7x\"", note.Message, StringComparison.Ordinal);
        var placed = Placer.Place(result.Project, new PlacerSettings(Effort: Effort.Quick)).Project!;
        var op = Ngspice.OperatingPoint(ExtractedDeck.Write(placed));
        Assert.Equal(Ohms("4kk7x"), 1 / -op["v1#branch"], 1e-3); // ngspice on the raw value and on the export agree
    }

    [Theory]
    [InlineData("4.7k")]
    [InlineData("100n")]
    [InlineData("10uF")]
    [InlineData("47R")]
    [InlineData("1kohm")]
    [InlineData("1meg")]
    public void Plain_values_and_unit_letters_get_no_warning(string value)
    {
        var result = ImportFixture.Import($"plain\nV1 a 0 1\nR1 a 0 {value.Replace("uF", "u", StringComparison.Ordinal)}\nC1 a 0 {(value.EndsWith('F') ? value : "1u")}\n.end\n", "plain.cir");
        Assert.DoesNotContain(result.Notes, n => n.Message.Contains("IEC 60062", StringComparison.Ordinal) || n.Message.Contains("ignores", StringComparison.Ordinal));
    }
}
