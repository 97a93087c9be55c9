using Xunit;
using PadPlan.Rules.Physics;

namespace PadPlan.Tests.Rules.Physics;

public class WireInductanceTests
{
    [Fact]
    public void Ten_mm_of_0_6_mm_wire()
    {
        // Straight-wire formula (Rosa; Grover, "Inductance Calculations"), check values DOMAIN §5: 6.90 nH LF, 6.40 nH HF.
        Assert.Equal(6.90, WireInductance.LowFrequency(10, 0.3), 2);
        Assert.Equal(6.40, WireInductance.HighFrequency(10, 0.3), 2);
    }

    [Fact]
    public void One_inch_of_22_gauge_wire_is_about_20_to_22_nH()
    {
        // Terman, "Radio Engineers' Handbook" / Grover: 25.4 mm of 0.645 mm wire is about 20-22 nH (DOMAIN §5).
        var lf = WireInductance.LowFrequency(25.4, 0.645 / 2);
        var hf = WireInductance.HighFrequency(25.4, 0.645 / 2);
        Assert.InRange(lf, 20, 22);
        Assert.InRange(hf, 20, 22);
    }

    [Fact]
    public void About_one_nH_per_mm_for_usual_leads()
    {
        // Common practice, no source: "about 1 nH per mm" for a lead of a few mm (DOMAIN §2).
        Assert.InRange(WireInductance.LowFrequency(10, 0.3) / 10, 0.5, 1.0);
    }

    [Fact]
    public void A_stub_shorter_than_the_formula_covers_is_held_at_zero() =>
        Assert.Equal(0, WireInductance.HighFrequency(0.2, 0.3));
}
