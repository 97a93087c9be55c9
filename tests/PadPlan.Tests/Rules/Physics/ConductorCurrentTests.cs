using Xunit;
using PadPlan.Rules.Physics;

namespace PadPlan.Tests.Rules.Physics;

public class ConductorCurrentTests
{
    [Fact]
    public void One_amp_ten_degrees_one_ounce_external_needs_0_30_mm()
    {
        // IPC-2221 conductor formula, worked example (DOMAIN §5): 1 A, dT 10 deg C, 1 oz (1.378 mil) external -> 0.300 mm wide.
        var oneOunce = 1.378 * 0.0254;
        Assert.Equal(0.300, ConductorCurrent.RequiredWidth(1.0, 10, oneOunce), 3);
    }

    [Fact]
    public void Width_and_current_are_inverse()
    {
        // IPC-2221: I = k dT^0.44 A^0.725; the width found for a current must carry exactly that current.
        var w = ConductorCurrent.RequiredWidth(2.5, 20, 0.035);
        Assert.Equal(2.5, ConductorCurrent.Amps(w, 0.035, 20), 9);
    }

    [Fact]
    public void Internal_conductors_need_more_width()
    {
        // IPC-2221: k = 0.024 internal against 0.048 external, so for the same current A grows by 2^(1/0.725).
        var ext = ConductorCurrent.RequiredWidth(1, 10, 0.035);
        var inner = ConductorCurrent.RequiredWidth(1, 10, 0.035, external: false);
        Assert.Equal(Math.Pow(2, 1 / 0.725), inner / ext, 6);
    }
}
