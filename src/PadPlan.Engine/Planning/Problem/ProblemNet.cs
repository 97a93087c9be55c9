using PadPlan.Model;

namespace PadPlan.Planning;

/// <summary>One non-ground net in the engine: its islands and the leads that land on them.</summary>
internal sealed class ProblemNet
{
    public required Net Net;
    public int[] Islands = [];
    public int[] Leads = [];
    /// <summary>Leads that choose their island (not pinned over a strip segment).</summary>
    public int[] FreeLeads = [];
    public double MaxLead;
}
