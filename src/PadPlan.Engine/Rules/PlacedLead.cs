using PadPlan.Model;

namespace PadPlan.Rules;

/// <summary>One physical lead of a placed part in board coordinates: the symbol pin it carries, the net the circuit wants on it, where it leaves the body and where (if anywhere) it lands.</summary>
public sealed record PlacedLead(string Ref, string Pin, string? Net, Point Exit, LeadLanding? Landing, FootprintLead Lead)
{
    /// <summary>"R1.2": part reference and pin, the way a builder names a lead.</summary>
    public string Name => $"{Ref}.{Pin}";

    /// <summary>Plan-view distance from exit to landing (mm); zero when the lead has no landing.</summary>
    public double Reach => Landing is null ? 0 : Exit.DistanceTo(Landing.At);
}
