namespace PadPlan.Tests.Import;

/// <summary>
/// A SPICE diode or transistor with no footprint named goes on the package its type number is made in, so that it fits the
/// board and its current and power are judged against the right rating (the library's DO-35 is rated 0.2 A, DO-41 1 A,
/// DO-201AD 3 A; TO-92 0.625 W, TO-126 1.25 W, TO-220 2 W). Packages per the makers' data sheets for these types, from
/// memory: 1N4001-1N4007 and 1N5817-1N5819 in DO-41, 1N5400-1N5408 and 1N5820-1N5822 in DO-201AD, 1N4728A-1N4764A (1 W
/// zeners) and BZX85 in DO-41, 1N4148, 1N914, 1N5221B-1N5281B and BZX79 in DO-35; TIP31C, TIP120, IRF510 and IRFZ44N in
/// TO-220, BD139 in TO-126, 2N4401, BC547B, 2N7000 and J310 in TO-92.
/// </summary>
public class TypePackageTests
{
    /// <summary>A supply, a resistor and one diode of the given model, as a SPICE deck.</summary>
    private static PadPlan.Import.ImportResult WithDiode(string model) =>
        ImportFixture.Import($"test\nV1 a 0 DC 5\nR1 a k 1k\nD1 k 0 {model}\n.model {model} D(IS=1n)\n.end\n");

    [Theory]
    [InlineData("D1N4001", "diode-plastic-do41")]
    [InlineData("1n4007", "diode-plastic-do41")]
    [InlineData("D1N5819", "diode-plastic-do41")]
    [InlineData("1N4742A", "diode-plastic-do41")]
    [InlineData("BZX85C12", "diode-plastic-do41")]
    [InlineData("D1N5408", "diode-plastic-do201")]
    [InlineData("1N5822", "diode-plastic-do201")]
    [InlineData("D1N4148", "diode-glass-do35")]
    [InlineData("D1N914", "diode-glass-do35")]
    [InlineData("1N5231B", "diode-glass-do35")]
    [InlineData("BZX79C5V1", "diode-glass-do35")]
    [InlineData("DRECT", "diode-plastic-do41")] // the name says rectifier: the 1 A class, as before
    public void A_known_type_number_chooses_its_package_and_is_not_a_guess(string model, string footprint)
    {
        var r = WithDiode(model);
        var d1 = r.Project.FindPart("D1")!;
        Assert.Equal(footprint, d1.Footprint);
        Assert.False(d1.FootprintAssumed);
        Assert.DoesNotContain(r.Notes, n => n.Message.StartsWith("D1:", StringComparison.Ordinal));
    }

    /// <summary>A type the importer does not know goes on the small-signal package, marked as assumed, with a note that names the rectifier packages.</summary>
    [Theory]
    [InlineData("DMOD")]
    [InlineData("D1N9999")] // a type number outside every range above
    public void An_unknown_diode_goes_on_the_small_signal_package_marked_as_a_guess(string model)
    {
        var r = WithDiode(model);
        var d1 = r.Project.FindPart("D1")!;
        Assert.Equal("diode-glass-do35", d1.Footprint);
        Assert.True(d1.FootprintAssumed);
        var note = Assert.Single(r.Notes, n => n.Message.StartsWith("D1:", StringComparison.Ordinal));
        Assert.Contains("diode-plastic-do41 (1 A)", note.Message);
        Assert.Contains("parts map", note.Message);
    }

    /// <summary>A supply, a resistor and one transistor of the given model and kind letter, as a SPICE deck.</summary>
    private static PadPlan.Import.ImportResult WithTransistor(string letter, string model, string kind) =>
        ImportFixture.Import($"test\nV1 a 0 DC 12\nR1 a c 1k\nR2 a b 100k\n{letter}1 c b 0 {model}\n.model {model} {kind}\n.end\n");

    [Theory]
    [InlineData("Q", "TIP31C", "NPN(BF=50)", "to220")]
    [InlineData("Q", "QTIP120", "NPN(BF=1000)", "to220")]
    [InlineData("M", "MIRF510", "NMOS(VTO=4)", "to220")]
    [InlineData("M", "IRFZ44N", "NMOS(VTO=3)", "to220")]
    [InlineData("Q", "BD139", "NPN(BF=100)", "to126")]
    [InlineData("Q", "Q2N4401", "NPN(BF=300)", "to92")]
    [InlineData("Q", "BC547B", "NPN(BF=300)", "to92")]
    [InlineData("M", "M2N7000", "NMOS(VTO=2)", "to92")]
    [InlineData("J", "J310", "NJF(VTO=-3)", "to92")]
    public void A_known_transistor_type_chooses_its_package_and_is_not_a_guess(string letter, string model, string kind, string footprint)
    {
        var r = WithTransistor(letter, model, kind);
        var part = r.Project.Parts.Single(p => p.Ref.StartsWith(letter, StringComparison.OrdinalIgnoreCase));
        Assert.Equal(footprint, part.Footprint);
        Assert.False(part.FootprintAssumed);
    }

    [Fact]
    public void An_unknown_transistor_goes_on_to92_marked_as_a_guess_with_a_note_naming_the_power_packages()
    {
        var r = WithTransistor("Q", "QGENERIC", "NPN(BF=100)");
        var q1 = r.Project.FindPart("Q1")!;
        Assert.Equal("to92", q1.Footprint);
        Assert.True(q1.FootprintAssumed);
        Assert.Contains(r.Notes, n => n.Message.StartsWith("Q1: transistor QGENERIC is not a type number", StringComparison.Ordinal) && n.Message.Contains("to220"));
    }
}
