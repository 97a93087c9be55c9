using PadPlan.Output.Tables;
using PadPlan.Model;
using PadPlan.Materials;
using static PadPlan.Tests.Materials.Circuits;

namespace PadPlan.Tests.Materials;

public sealed class BomTableTests
{
    private static string[] Line(PadPlan.Output.Tables.ReportTable table, string reference) =>
        table.Rows.Single(r => r[6].Split(' ').Contains(reference)).ToArray();

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
        Assert.Equal(["3", "resistor", "4.7 kΩ", "4k7", "E12", "res", "R1 R2 R10"], Line(bom, "R1"));
        Assert.Equal(["1", "resistor", "5.1 kΩ", "5k1", "E24", "res", "R3"], Line(bom, "R3"));
        Assert.Equal("off E24", Line(bom, "R4")[4]);
        // Same value, different footprint: separate lines.
        Assert.Equal(["2", "capacitor", "100 nF", "100n", "E12", "cap", "C1 C2"], Line(bom, "C1"));
        Assert.Equal("C3", Line(bom, "C3")[6]);
        // A description is kept as written, with no code or series.
        Assert.Equal(["1", "transistor", "NPN small-signal", "", "", "to92", "Q1"], Line(bom, "Q1"));
        Assert.Equal(9, bom.Rows.Sum(r => int.Parse(r[0])));
    }

    [Fact]
    public void The_tiny_buffer_bom_has_every_part_once()
    {
        var project = PadPlan.ProjectFiles.ProjectFile.Read(TestPaths.TinyBuffer);
        var bom = BomTable.From(project);
        var refs = bom.Rows.SelectMany(r => r[6].Split(' ')).Order().ToList();
        Assert.Equal(project.Parts.Select(p => p.Ref).Order(), refs);
        Assert.Equal(["2", "resistor", "47 kΩ", "47k", "E12", "res-axial-250mw", "R1 R2"], Line(bom, "R1"));
    }

    [Theory]
    [InlineData("R2", "R10", -1)]
    [InlineData("C1", "R1", -1)]
    [InlineData("U1.2", "U1.10", -1)]
    [InlineData("R1", "R1", 0)]
    public void References_sort_as_a_builder_reads_them(string a, string b, int sign) =>
        Assert.Equal(sign, Math.Sign(NaturalOrder.Compare(a, b)));
}
