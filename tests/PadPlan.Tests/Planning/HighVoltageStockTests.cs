using PadPlan.Model;
using PadPlan.Planning;
using PadPlan.ProjectFiles;

namespace PadPlan.Tests.Planning;

/// <summary>A pad's stock edge is its only insulation from the plane: stock thinner than the voltage needs cannot be placed around.</summary>
public sealed class HighVoltageStockTests
{
    private static Project TinyAt(double volts, double stock)
    {
        var tiny = ProjectFile.Read(TestPaths.TinyBuffer);
        return tiny with
        {
            Layout = null,
            Nets = tiny.Nets.Select(n => n.Name == "VCC" ? new Net(n.Name, n.Ground, n.Class, volts) : n).ToValueList(),
            Toolkit = tiny.Toolkit with { StockThickness = stock },
        };
    }

    [Fact]
    public void A_300_volt_net_on_0_8_mm_stock_is_refused_with_what_to_change()
    {
        // IPC-2221B Table 6-1, B2: 301-500 V needs 2.5 mm; 251-300 V needs 1.25 mm. 300 V on 0.8 mm stock fails.
        var result = Placer.Place(TinyAt(300, 0.8), new PlacerSettings(Effort: Effort.Quick));
        Assert.False(result.Succeeded);
        Assert.Contains("1.25 mm", result.Failure!.Message);
        Assert.Contains("stockThickness", result.Failure.Hint);
    }

    [Fact]
    public void The_same_net_on_1_6_mm_stock_places()
    {
        // IPC-2221B Table 6-1, B2: 1.25 mm for 300 V, so 1.6 mm stock is enough.
        var result = Placer.Place(TinyAt(300, 1.6), new PlacerSettings(Effort: Effort.Quick));
        Assert.True(result.Succeeded, result.Failure?.Message);
    }
}
