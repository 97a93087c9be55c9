namespace PadPlan.Model;

/// <summary>The limits the placer honours and the checker enforces. Defaults are DOMAIN §2 rules of thumb (common practice, no source).</summary>
public sealed record RuleSettings
{
    /// <summary>Pad edge to pad edge (mm).</summary>
    public double PadGap { get; init; } = 1.0;
    /// <summary>Pad edge to a ground landing point (mm).</summary>
    public double GroundGap { get; init; } = 1.0;
    /// <summary>Least room around a bare lead (mm), surface to surface: to a bare lead of another net along their paths, and to the underside of another part's body it passes under.</summary>
    public double LeadGap { get; init; } = 0.5;
    public double MaxLeadRf { get; init; } = 5.0;
    public double MaxLeadAudio { get; init; } = 15.0;
    public double MaxLeadGeneral { get; init; } = 15.0;
    public double MaxLeadPower { get; init; } = 15.0;
    public double MaxLeadHv { get; init; } = 15.0;
    /// <summary>Whether the placer may join pads with wire jumpers.</summary>
    public bool AllowJumpers { get; init; } = true;
    /// <summary>Allowed temperature rise for the IPC-2221 conductor-current check (deg C).</summary>
    public double TempRise { get; init; } = 10.0;
    /// <summary>Pad copper thickness (mm); 1 oz/ft^2 is 0.035 mm.</summary>
    public double CopperThickness { get; init; } = 0.035;

    public static RuleSettings Default { get; } = new();

    /// <summary>The longest lead a net allows: its own limit, else its class default.</summary>
    public double MaxLeadFor(Net net) => net.MaxLead ?? net.Class switch
    {
        NetClass.Rf => MaxLeadRf,
        NetClass.Audio => MaxLeadAudio,
        NetClass.Power => MaxLeadPower,
        NetClass.Hv => MaxLeadHv,
        _ => MaxLeadGeneral,
    };
}
