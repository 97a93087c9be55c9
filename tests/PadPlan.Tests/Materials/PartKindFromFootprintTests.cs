using PadPlan.Model;
using PadPlan.Materials;
using PadPlan.Tests.Import;

namespace PadPlan.Tests.Materials;

/// <summary>Issue 11: the BOM called SPICE subcircuit calls (X...) "wire landing", and crystals and trimmers by their letter only. The kind comes from the letter and the footprint family together (class letters: IEEE 315 / ASME Y14.44, from memory).</summary>
public class PartKindFromFootprintTests
{
    private static PartKind KindOf(PadPlan.Model.Project p, string reference)
    {
        var part = p.FindPart(reference)!;
        return PartKinds.Of(part, p.FindFootprint(part.Footprint));
    }

    [Fact]
    public void Subcircuit_calls_crystals_and_trimmers_are_named_right_and_only_landings_are_wire_landings()
    {
        var p = ImportFixture.Import("""
            kinds
            .subckt QUARTZ a b
            R1 a b 1meg
            .ends
            .subckt AMP in+ in- v+ v- out
            R1 in+ in- 1meg
            .ends
            V1 vcc 0 9
            X1 a b QUARTZ
            X2 a b vcc 0 c AMP
            C1 a 0 60p
            J1 c a b JM
            .model JM NJF
            R1 c 0 1k
            R2 b 0 1k
            """, partsMapJson: """{"format": "padplan-parts/1", "parts": {"C1": {"footprint": "trimmer-cap"}, "X1": {"footprint": "hc49-u"}}}""").Project;
        Assert.Equal(PartKind.Crystal, KindOf(p, "X1"));
        Assert.Equal(PartKind.Subcircuit, KindOf(p, "X2"));
        Assert.Equal(PartKind.TrimmerCap, KindOf(p, "C1"));
        Assert.Equal("trimmer capacitor", PartKinds.Name(KindOf(p, "C1")));
        Assert.Equal(PartKind.Jfet, KindOf(p, "J1")); // J is a JFET in SPICE, a connector in a schematic: the footprint says transistor, the D/G/S pins say field-effect
        var landings = p.Parts.Where(x => KindOf(p, x.Ref) == PartKind.Landing).ToList();
        Assert.All(landings, x => Assert.StartsWith("landing", x.Footprint));
        Assert.Single(landings);
    }
}
