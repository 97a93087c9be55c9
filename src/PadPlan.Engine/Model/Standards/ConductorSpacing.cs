namespace PadPlan.Model.Standards;

/// <summary>Minimum conductor spacing by voltage, IPC-2221 Table 6-1 (DC or peak AC volts, mm). Reference data: the placer honours it and the checker judges by it.</summary>
public static class ConductorSpacing
{
    /// <summary>The table revision the numbers come from. The B2 column is the published table; the A6 column was recalled from memory (DOMAIN §5) and awaits confirmation.</summary>
    public const string Revision = "IPC-2221B (2012), Table 6-1";

    // Upper voltage of each row, B2 (external conductors, uncoated, sea level to 3050 m),
    // A6 (external component lead or termination, uncoated; from memory).
    private static readonly (double UpTo, double B2, double A6)[] Rows =
    [
        (15, 0.1, 0.13),
        (30, 0.1, 0.25),
        (50, 0.6, 0.4),
        (100, 0.6, 0.5),
        (150, 0.6, 0.8),
        (170, 1.25, 0.8),
        (250, 1.25, 0.8),
        (300, 1.25, 0.8),
        (500, 2.5, 1.5),
    ];

    // Above 500 V the table gives a per-volt figure that is added to the 500 V value.
    private const double B2PerVoltAbove500 = 0.005;
    private const double A6PerVoltAbove500 = 0.00305;

    /// <summary>External bare conductor to conductor (column B2), the spacing pad copper needs from other copper.</summary>
    public static double B2(double volts) => Lookup(volts, r => r.B2, B2PerVoltAbove500);

    /// <summary>External bare component lead to conductor (column A6, from memory).</summary>
    public static double A6(double volts) => Lookup(volts, r => r.A6, A6PerVoltAbove500);

    private static double Lookup(double volts, Func<(double UpTo, double B2, double A6), double> column, double perVolt)
    {
        var v = Math.Abs(volts);
        if (!double.IsFinite(v)) throw new ArgumentOutOfRangeException(nameof(volts), volts, "voltage must be a finite number.");
        foreach (var row in Rows)
            if (v <= row.UpTo) return column(row);
        return column(Rows[^1]) + (v - Rows[^1].UpTo) * perVolt;
    }

    /// <summary>The voltage that can stand between two nets, each given to ground (null = unknown, taken as 0): the worst of either alone and their difference, so opposite polarities add.</summary>
    public static double Between(double? a, double? b)
    {
        var va = a ?? 0;
        var vb = b ?? 0;
        return Math.Max(Math.Max(Math.Abs(va), Math.Abs(vb)), Math.Abs(va - vb));
    }
}
