using PadPlan.Model;

namespace PadPlan.Tests.Import;

/// <summary>RF nets read from a SPICE deck: marked by a comment line, or inferred from source frequencies, crystals and LC resonance.</summary>
public class SpiceRfNetTests
{
    private const string Tank = """
        a 5 MHz tank driven through a small capacitor, buffered into a load
        *padplan rf out
        V1 vcc 0 9
        Vdrv drv 0 dc 0 sin(0 0.1 5meg)
        C1 drv tank 10p
        L1 tank 0 10u
        C2 tank 0 100p
        R1 tank out 1k
        R2 out 0 10k
        R3 vcc 0 10k
        L2 vcc bias 100u
        C3 bias 0 1n
        R4 bias 0 1k
        .end
        """;

    [Fact]
    public void Lc_resonance_follows_the_textbook_formula()
    {
        // f = 1/(2 pi sqrt(LC)) (Thomson's formula; Terman, "Radio Engineers' Handbook", resonant circuits), worked by hand:
        // 10 uH with 100 pF: sqrt(1e-15) = 3.1623e-8 s, 2 pi times that is 1.98692e-7 s, so f = 5.0329 MHz.
        Assert.Equal(5.0329, PadPlan.Import.RfNets.Resonance(10e-6, 100e-12) / 1e6, 4);
        // 100 uH with 1 nF: ten times the inductance and capacitance, a tenth of the frequency, 503.29 kHz
        Assert.Equal(503.29, PadPlan.Import.RfNets.Resonance(100e-6, 1e-9) / 1e3, 2);
    }

    [Fact]
    public void Rf_nets_come_from_the_comment_line_the_source_frequency_and_the_tank_with_their_reasons()
    {
        var r = ImportFixture.Import(Tank);
        var rf = r.Project.Nets.Where(n => n.Class == NetClass.Rf).Select(n => n.Name).Order(StringComparer.Ordinal).ToList();
        Assert.Equal(["drv", "out", "tank"], rf);
        var lines = r.Project.Imported!.Summary.Where(l => l.Topic == "rf").ToDictionary(l => l.Item, l => l.Became);
        Assert.StartsWith("marked *padplan rf", lines["out"]);
        Assert.Equal("source Vdrv at 5 MHz", lines["drv"]);
        // the first pair found names the net: L1 with the 10 pF C1 (15.915 MHz) or with the 100 pF C2 (5.033 MHz)
        Assert.Matches(@"^L1 and (C1 resonate at 15\.915|C2 resonate at 5\.033) MHz$", lines["tank"]);
        // L2 (100 uH) with C3 (1 nF) resonates at 503 kHz, below 1 MHz: the bias net is not RF
        Assert.DoesNotContain("bias", lines.Keys);
        // an RF net's leads are held to the RF limit (5 mm by default)
        Assert.Equal(RuleSettings.Default.MaxLeadRf, RuleSettings.Default.MaxLeadFor(r.Project.Nets.Single(n => n.Name == "tank")));
    }

    [Fact]
    public void A_deck_with_no_rf_net_says_so_and_that_the_rf_checks_are_off()
    {
        var r = SpiceCorpus.Import("src-dc-bare");
        Assert.DoesNotContain(r.Project.Nets, n => n.Class == NetClass.Rf);
        var line = Assert.Single(r.Project.Imported!.Summary, l => l.Topic == "rf");
        Assert.Equal("none", line.Item);
        Assert.Contains("RF checks", line.Became);
        Assert.Contains("*padplan rf", line.Became);
    }

    [Fact]
    public void A_crystal_puts_both_its_nets_on_rf()
    {
        var r = ImportFixture.Import("""
            a crystal between two nodes of an oscillator
            .subckt XTAL7 a b
            C1 a b 5p
            .ends
            V1 vcc 0 9
            R1 vcc x1 10k
            X1 x1 x2 XTAL7
            R2 x2 0 10k
            .end
            """);
        var rf = r.Project.Imported!.Summary.Where(l => l.Topic == "rf").ToList();
        Assert.Equal(["x1", "x2"], rf.Select(l => l.Item).Order(StringComparer.Ordinal));
        Assert.All(rf, l => Assert.Equal("crystal X1", l.Became));
    }

    [Fact]
    public void The_rf_comment_line_must_name_a_net()
    {
        var e = Assert.Throws<PadPlan.IO.InputException>(() => ImportFixture.Import("t\n*padplan rf\nR1 a 0 1k\nR2 a 0 1k\n.end\n"));
        Assert.Contains("names no node", e.Message);
        Assert.Equal(2, e.Line);
    }
}
