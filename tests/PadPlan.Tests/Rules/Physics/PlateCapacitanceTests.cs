using Xunit;
using PadPlan.Rules.Physics;

namespace PadPlan.Tests.Rules.Physics;

public class PlateCapacitanceTests
{
    [Theory]
    // Parallel plate C = e0 er A / d, check values DOMAIN §5: 5 mm disc, er 4.7, on 1.6 mm stock 0.511 pF, on 0.8 mm 1.02 pF.
    [InlineData(1.6, 0.511)]
    [InlineData(0.8, 1.02)]
    public void Five_mm_disc_on_fr4(double thickness, double pf)
    {
        var area = Math.PI * 2.5 * 2.5;
        Assert.Equal(pf, PlateCapacitance.Picofarads(area, thickness, 4.7), 2);
    }

    [Fact]
    public void One_square_metre_one_metre_apart_in_vacuum_is_e0()
    {
        // CODATA 2018: e0 = 8.8541878128e-12 F/m; 1 m² = 1e6 mm², 1 m = 1000 mm.
        Assert.Equal(8.8541878128, PlateCapacitance.Picofarads(1e6, 1000, 1), 9);
    }
}
