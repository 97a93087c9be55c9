namespace PadPlan.Rules;

/// <summary>What a check reports beyond the rules: parasitic estimates for every net, not only those of class rf.</summary>
public sealed record CheckOptions(bool ParasiticsForAllNets = false)
{
    public static CheckOptions Default { get; } = new();
}
