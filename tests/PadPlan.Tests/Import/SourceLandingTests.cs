using PadPlan.Model;

namespace PadPlan.Tests.Import;

/// <summary>Independent sources become wire landings, named for what their wires carry.</summary>
public sealed class SourceLandingTests
{
    [Fact]
    public void Supply_input_and_zero_current_port_sources_become_named_landings()
    {
        // SPICE (Berkeley SPICE / ngspice manual, independent sources): V name n+ n- DC value; SIN(offset amplitude freq); I name n+ n- value.
        var p = ImportFixture.Import("""
            port test
            VCC  vcc 0 DC 12
            VSIG in  0 SIN(0 0.1 1k)
            IOUT out 0 0
            R1 in  vcc 10k
            R2 out in  1k
            .end
            """).Project;
        var landings = p.Parts.Where(x => p.FootprintOf(x).Mount == MountStyle.Landing).Select(x => x.Value).Order(StringComparer.Ordinal).ToList();
        Assert.Equal(["input wires (VSIG, 100 mV peak)", "output wires (IOUT)", "supply wires (VCC, 12 V DC)"], landings);
        Assert.Equal(12, p.FindNet("vcc")!.Voltage);
    }
}
