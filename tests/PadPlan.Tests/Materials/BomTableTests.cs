using PadPlan.Output.Tables;
using PadPlan.Model;
using PadPlan.Materials;
using static PadPlan.Tests.Materials.Circuits;

namespace PadPlan.Tests.Materials;

public sealed class BomTableTests
{
    private static string[] Line(PadPlan.Output.Tables.ReportTable table, string reference) =>
        table.Rows.Single(r => r[7].Split(' ').Contains(reference)).ToArray();

    // IEC 60062: 4k7, 4.7k and 4700 are one value, 4.7 kΩ; IEC 60063: 4.7 is in E12, 5.1 only in E24, 4.99 in neither.
    [Fact]
    public void Values_written_differently_group_together_with_code_and_series()
    {
        var project = Project(
            [
                Part("R1", "4k7", "res", "1=A", "2=B"), Part("R10", "4.7k", "res", "1=A", "2=B"), Part("R2", "4700", "res", "1=A", "2=B"),
                Part("R3", "5.1k", "res", "1=A", "2=B"), Part("R4", "4.99k", "res", "1=A", "2=B"),
                Part("C1", "100n", "cap", "1=A", "2=B"), Part("C2", "100nF", "cap", "1=A", "2=B"), Part("C3", "100n", "elko", "1=A", "2=B"),
                Part("Q1", "NPN small-signal", "to92", "C=A", "B=B", "E=GND"),
            ],
            Nets("GND", "A", "B"));
        var bom = BomTable.From(project);
        Assert.Equal(["3", "resistor", "4.7 kΩ", "4k7", "E12", "", "res", "R1 R2 R10"], Line(bom, "R1"));
        Assert.Equal(["1", "resistor", "5.1 kΩ", "5k1", "E24", "", "res", "R3"], Line(bom, "R3"));
        Assert.Equal("off E24", Line(bom, "R4")[4]);
        // Same value, different footprint: separate lines.
        Assert.Equal(["2", "capacitor", "100 nF", "100n", "E12", "", "cap", "C1 C2"], Line(bom, "C1"));
        Assert.Equal("C3", Line(bom, "C3")[7]);
        // A description is kept as written, with no code or series.
        Assert.Equal(["1", "transistor", "NPN small-signal", "", "", "", "to92", "Q1"], Line(bom, "Q1"));
        Assert.Equal(9, bom.Rows.Sum(r => int.Parse(r[0])));
    }

    [Fact]
    public void The_tiny_buffer_bom_has_every_part_once()
    {
        var project = PadPlan.ProjectFiles.ProjectFile.Read(TestPaths.TinyBuffer);
        var bom = BomTable.From(project);
        var refs = bom.Rows.SelectMany(r => r[7].Split(' ')).Order().ToList();
        Assert.Equal(project.Parts.Select(p => p.Ref).Order(), refs);
        Assert.Equal(["2", "resistor", "47 kΩ", "47k", "E12", "0.25\u00A0W", "res-axial-250mw", "R1 R2"], Line(bom, "R1"));
    }

    /// <summary>
    /// The BOM shows the rating the operating-point check judges each part against, so the builder buys parts rated at
    /// least that: the footprint's typical figure (the library's 6.3 mm can: 25 V; a 250 mW resistor), else the part's own
    /// from a parts map, which splits a line. The figures are the library's, typical for the package (common practice, no source).
    /// </summary>
    [Fact]
    public void Each_line_shows_the_rating_the_check_judges_its_parts_against()
    {
        var library = PadPlan.Import.FootprintLibrary.Load();
        var footprints = new[] { "cap-elec-6.3mm", "res-axial-250mw", "diode-glass-do35" }.Select(n => library.Find(n)!).ToValueList();
        var project = Project(
            [
                Part("C1", "10u", "cap-elec-6.3mm", "+=A", "-=GND"), Part("C2", "10u", "cap-elec-6.3mm", "+=B", "-=GND"),
                Part("C3", "10u", "cap-elec-6.3mm", "+=B", "-=GND") with { Rating = new Rating(Volts: 63) },
                Part("R1", "1k", "res-axial-250mw", "1=A", "2=B"), Part("D1", "1N4148", "diode-glass-do35", "A=A", "K=B"),
            ],
            Nets("GND", "A", "B")) with { Footprints = footprints };
        var bom = BomTable.From(project);
        Assert.Equal("Rating", bom.Columns[5]);
        Assert.Equal(["2", "25\u00A0V", "C1 C2"], Line(bom, "C1").Where((_, i) => i is 0 or 5 or 7));
        Assert.Equal(["1", "63\u00A0V", "C3"], Line(bom, "C3").Where((_, i) => i is 0 or 5 or 7)); // its own rating: a line of its own
        Assert.Equal("0.25\u00A0W", Line(bom, "R1")[5]);
        Assert.Equal("0.5\u00A0W, 0.2\u00A0A", Line(bom, "D1")[5]); // no-break spaces keep each figure whole when a column wraps
        Assert.Contains(bom.Notes, n => n.StartsWith("Rating: what the check judges the part against", StringComparison.Ordinal));
        // the same figure the check uses
        Assert.Equal(25, Rating.For(project.FindPart("C1")!, project.FindFootprint("cap-elec-6.3mm")).Volts);
    }

    [Theory]
    [InlineData("R2", "R10", -1)]
    [InlineData("C1", "R1", -1)]
    [InlineData("U1.2", "U1.10", -1)]
    [InlineData("R1", "R1", 0)]
    public void References_sort_as_a_builder_reads_them(string a, string b, int sign) =>
        Assert.Equal(sign, Math.Sign(NaturalOrder.Compare(a, b)));
}
