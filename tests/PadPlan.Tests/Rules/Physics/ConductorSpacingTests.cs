using PadPlan.Model.Standards;
using Xunit;
using PadPlan.Rules.Physics;

namespace PadPlan.Tests.Rules.Physics;

public class ConductorSpacingTests
{
    // IPC-2221B, Table 6-1, column B2 (external conductors, uncoated, sea level to 3050 m), one case per row and at row edges.
    [Theory]
    [InlineData(5, 0.1)]      // row 0-15 V
    [InlineData(15, 0.1)]     // row 0-15 V, upper edge
    [InlineData(24, 0.1)]     // row 16-30 V
    [InlineData(48, 0.6)]     // row 31-50 V
    [InlineData(100, 0.6)]    // row 51-100 V
    [InlineData(150, 0.6)]    // row 101-150 V
    [InlineData(160, 1.25)]   // row 151-170 V
    [InlineData(230, 1.25)]   // row 171-250 V
    [InlineData(300, 1.25)]   // row 251-300 V
    [InlineData(400, 2.5)]    // row 301-500 V
    [InlineData(-300, 1.25)]  // the table is for DC or peak AC magnitude
    public void B2_matches_table_6_1(double volts, double mm) => Assert.Equal(mm, ConductorSpacing.B2(volts), 6);

    [Fact]
    public void B2_above_500_V_adds_the_per_volt_figure_to_the_500_V_value()
    {
        // IPC-2221B, Table 6-1, B2: > 500 V, 0.005 mm per volt added to the 500 V value (the table's own note).
        Assert.Equal(2.5 + 100 * 0.005, ConductorSpacing.B2(600), 6);
    }

    // IPC-2221 Table 6-1, column A6 (external component lead, uncoated): values from memory (DOMAIN §5), to be confirmed.
    [Theory]
    [InlineData(10, 0.13)]
    [InlineData(40, 0.4)]
    [InlineData(120, 0.8)]
    [InlineData(450, 1.5)]
    public void A6_matches_the_recalled_column(double volts, double mm) => Assert.Equal(mm, ConductorSpacing.A6(volts), 6);

    [Fact]
    public void The_table_revision_is_stored_beside_it() => Assert.Contains("IPC-2221", ConductorSpacing.Revision);
}
