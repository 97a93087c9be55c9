using PadPlan.Model;
using PadPlan.ProjectFiles;
using PadPlan.Rules;
using PadPlan.Rules.Shapes;

namespace PadPlan.Tests.Rules;

/// <summary>The plan raised into 3D from footprint heights (docs/rules.md, "Heights"): where parts stand and how their leads run.</summary>
public class SolidsTests
{
    private static readonly Project Tiny = ProjectFile.Read(TestPaths.TinyBuffer);

    [Fact]
    public void A_part_stands_on_its_pads_and_its_leads_drop_onto_their_landings()
    {
        var solids = Solids.Of(ResolvedPlan.Of(Tiny));
        var r1 = solids.Single(s => s.Ref == "R1");
        // R1 (1/4 W resistor, 2.4 mm body, lead axis 1.2 mm) lands on P3 and P2, pads cut from 1.6 mm stock.
        Assert.Equal(1.6, r1.Seat, 9);
        Assert.Equal(1.6, r1.Bottom, 9);
        Assert.Equal(4.0, r1.Top, 9);
        foreach (var lead in r1.Leads)
        {
            Assert.Equal(2.8, lead.Points[0].Z, 9);            // leaves the body on its axis
            Assert.Equal(lead.Lead.Landing!.At, lead.End.Plan);  // ends on its landing point
            Assert.Equal(1.6, lead.End.Z, 9);                   // on the pad's top
            Assert.False(lead.OnPlane);
        }
        // R2's lead 2 lands on the plane: soldered there, at height 0.
        var ground = solids.Single(s => s.Ref == "R2").Leads.Single(l => l.Lead.Pin == "2");
        Assert.True(ground.OnPlane);
        Assert.Equal(0, ground.End.Z, 9);
    }

    [Fact]
    public void An_outside_lead_comes_over_the_top_of_an_upright_body()
    {
        // R1 stood on end like a hairpin: body 2.4 mm across, 8 mm tall on 1 mm of lead; lead 2 runs down its outside.
        var body = ValueList.Of(new Point(-1.2, -1.2), new Point(1.2, -1.2), new Point(1.2, 1.2), new Point(-1.2, 1.2));
        var leads = ValueList.Of(new FootprintLead("1", new Point(0, 0), 0.6, 0, 12), new FootprintLead("2", new Point(0, -1.5), 0.6, 0, 12));
        var hairpin = new Footprint("res-upright", "resistors", "upright resistor", body, 8, leads, MountStyle.Upright, "test", shape: BodyShape.Cylinder, leadBend: 1, outsideLead: "2");
        var project = Tiny with
        {
            Footprints = Tiny.Footprints.Add(hairpin),
            Parts = Tiny.Parts.Select(p => p.Ref != "R1" ? p : new Part(p.Ref, p.Value, hairpin.Name, p.Pins)).ToValueList(),
        };
        var r1 = Solids.Of(ResolvedPlan.Of(project)).Single(s => s.Ref == "R1");
        Assert.Equal(2.6, r1.Bottom, 9);
        Assert.Equal(9.6, r1.Top, 9);
        var outside = r1.Leads.Single(l => l.Lead.Pin == "2").Points;
        Assert.Equal(9.6, outside[0].Z, 9);   // out of the top of the body
        Assert.Equal(9.6, outside[1].Z, 9);   // over the rim to the outside
        Assert.Equal(2.6, outside[2].Z, 9);   // down the outside to the lead bend
        Assert.Equal(1.6, outside[^1].Z, 9);  // onto its pad
        Assert.Equal(2.6, r1.Leads.Single(l => l.Lead.Pin == "1").Points[0].Z, 9);
    }

    [Fact]
    public void Only_an_upright_part_has_an_outside_lead_and_it_must_be_one_of_its_leads()
    {
        var body = ValueList.Of(new Point(-1, -1), new Point(1, -1), new Point(1, 1));
        var leads = ValueList.Of(new FootprintLead("1", new Point(0, 0), 0.6, 0, 12));
        Assert.Throws<ArgumentException>(() => new Footprint("x", "", "", body, 5, leads, MountStyle.Axial, "", outsideLead: "1"));
        Assert.Throws<ArgumentException>(() => new Footprint("x", "", "", body, 5, leads, MountStyle.Upright, "", outsideLead: "9"));
        Assert.Throws<ArgumentOutOfRangeException>(() => new Footprint("x", "", "", body, 5, leads, MountStyle.Upright, "", leadBend: 6));
    }
}
