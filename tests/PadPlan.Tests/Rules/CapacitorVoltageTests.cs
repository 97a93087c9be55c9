using PadPlan.Model;
using PadPlan.Rules;
using PadPlan.Simulation;
using PadPlan.Tests.Import;
using PadPlan.Tests.Lvs;

namespace PadPlan.Tests.Rules;

/// <summary>
/// Every capacitor's DC voltage is judged, not only an electrolytic's: a film or ceramic capacitor across a high-voltage
/// node must be rated for it. Worked example by hand (Ohm's law): 200 V over two equal 100k resistors puts 100 V across C1,
/// a 100 nF capacitor the import puts on a disc ceramic footprint, which states no rating. Small ceramic and film parts
/// are often rated only 50 V (common practice, no source; from memory), so above 80 % of that a rating must be stated.
/// </summary>
public class CapacitorVoltageTests
{
    private const string Deck = """
        film capacitor at a high-voltage node
        V1 hv 0 DC 200
        R1 hv mid 100k
        R2 mid 0 100k
        C1 mid 0 100n
        .end
        """;

    private static List<Finding> CapVoltage(string? rated)
    {
        var map = rated is null ? null : $$"""{ "format": "padplan-parts/1", "parts": { "C1": { "ratedVoltage": {{rated}} } } }""";
        var project = ImportFixture.Import(Deck, "t.cir", map).Project;
        var simulation = Simulator.Run(project);
        Assert.Equal(100, simulation.Point!.Volts("mid")!.Value, 3);
        return [.. Checker.Check(project with { Layout = Layout.Empty }, new CheckOptions(Simulation: simulation)).Findings.Where(f => f.RuleId == RuleIds.CapVoltage)];
    }

    [NgspiceFact]
    public void An_unrated_capacitor_across_100_V_must_have_its_rating_stated()
    {
        var f = Assert.Single(CapVoltage(null));
        Assert.Equal(Severity.Warning, f.Severity);
        Assert.Contains("C1 (100n) has 100.00 V across it, and neither the part nor its cap-disc-5mm footprint states a rating", f.Message);
        Assert.Contains("rated at least 125.00 V", f.Hint); // 100 V / 0.8
    }

    [NgspiceFact]
    public void A_stated_rating_below_the_voltage_is_an_error_and_one_well_above_it_passes()
    {
        var over = Assert.Single(CapVoltage("63"));
        Assert.Equal(Severity.Error, over.Severity);
        Assert.Contains("its own rating is 63.00 V", over.Message);
        Assert.Empty(CapVoltage("400"));
    }
}
