using PadPlan.Model;
using PadPlan.Rules.Physics;

namespace PadPlan.Rules.Checks;

/// <summary>Pad capacitance to the plane and lead inductance for each rf net (or every net on request), as lines of text.</summary>
public static class ParasiticEstimates
{
    internal static IEnumerable<string> Run(CheckContext ctx)
    {
        var plan = ctx.Plan;
        var er = plan.Project.Toolkit.StockPermittivity;
        foreach (var net in plan.Project.Nets)
        {
            if (net.Ground || (net.Class != NetClass.Rf && !ctx.Options.ParasiticsForAllNets)) continue;
            var pads = plan.Copper.Where(c => ctx.NetOf(c) == net.Name).ToList();
            var leads = ctx.LandedLeads.Where(l => l.Net == net.Name).ToList();
            var pf = pads.Sum(c => PlateCapacitance.Picofarads(c.Island.Area, c.StockThickness, er));
            // Above a few MHz the current runs on the wire's skin, so rf nets take the high-frequency form.
            var hf = net.Class == NetClass.Rf;
            var nh = leads.Sum(l => hf
                ? WireInductance.HighFrequency(l.Reach, l.Lead.Diameter / 2)
                : WireInductance.LowFrequency(l.Reach, l.Lead.Diameter / 2));
            yield return $"{net.Name} ({net.Class.ToString().ToLowerInvariant()}): {Count(pads.Count, "pad")}, {Text.Num(pf)} pF to the plane; " +
                $"{Count(leads.Count, "lead")}, {Text.Mm(leads.Sum(l => l.Reach))} in all, {Text.Num(nh, "0.#")} nH ({(hf ? "HF" : "LF")}).";
        }
    }

    private static string Count(int n, string what) => n == 1 ? $"1 {what}" : $"{n} {what}s";

    /// <summary>How the estimates are made, for the notes under them.</summary>
    public static IReadOnlyList<string> Method { get; } =
    [
        "C: parallel plate, pad area over the plane through the pad stock (its thickness and permittivity); fringing adds roughly 20-50 % (from memory).",
        "L: straight round wire (Grover; Terman), plan-view lead length; LF = uniform current, HF = skin effect (used for rf nets).",
    ];
}
