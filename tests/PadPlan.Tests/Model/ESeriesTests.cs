using PadPlan.Model.Values;

namespace PadPlan.Tests.Model;

public sealed class ESeriesTests
{
    // IEC 60063, E12 table: 1.0 1.2 1.5 1.8 2.2 2.7 3.3 3.9 4.7 5.6 6.8 8.2, at any decade.
    [Theory]
    [InlineData(4700)]
    [InlineData(0.47)]
    [InlineData(100e-9)]
    [InlineData(3.3e6)]
    [InlineData(82)]
    [InlineData(2.7e-12)]
    public void E12_values_are_in_E12_and_E24(double value)
    {
        Assert.True(ESeries.InE12(value));
        Assert.True(ESeries.InE24(value));
        Assert.Equal("E12", ESeries.SeriesOf(value));
    }

    // IEC 60063, E24 adds 1.1 1.3 1.6 2.0 2.4 3.0 3.6 4.3 5.1 6.2 7.5 9.1.
    [Theory]
    [InlineData(5100)]
    [InlineData(910)]
    [InlineData(3.0e-6)]
    [InlineData(43)]
    public void E24_only_values(double value)
    {
        Assert.False(ESeries.InE12(value));
        Assert.True(ESeries.InE24(value));
        Assert.Equal("E24", ESeries.SeriesOf(value));
    }

    // IEC 60063 lists 2.7, 3.3, 4.7 and 8.2 where 10^(k/24) would give 2.61, 3.16, 4.64 and 8.25: the table rules.
    [Theory]
    [InlineData(2.61)]
    [InlineData(3.16)]
    [InlineData(4.64)]
    [InlineData(4990)]
    [InlineData(0)]
    [InlineData(-4.7)]
    public void Values_off_the_table_are_in_neither(double value)
    {
        Assert.False(ESeries.InE24(value));
        Assert.Equal("", ESeries.SeriesOf(value));
    }
}
