namespace PadPlan.Model.Standards;

/// <summary>Where PadPlan starts treating a net as high voltage: above 50 V DC or peak AC, the usual extra-low-voltage limit (from memory; common practice), or marked class hv. Import, checker, sheets and tables all use this one threshold.</summary>
public static class HighVoltage
{
    public const double Threshold = 50;

    public static bool Applies(Net net) => !net.Ground && (net.Class == NetClass.Hv || Math.Abs(net.Voltage ?? 0) > Threshold);

    public static bool Applies(double volts) => Math.Abs(volts) > Threshold;
}
