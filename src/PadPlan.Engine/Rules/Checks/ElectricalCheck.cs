using PadPlan.Model.Standards;
using PadPlan.Rules.Physics;

namespace PadPlan.Rules.Checks;

/// <summary>High voltage over a pad's own stock edge (IPC-2221 Table 6-1, B2), the usual cautions, and current in narrow copper (IPC-2221 conductor formula).</summary>
internal static class ElectricalCheck
{
    public static IEnumerable<Finding> Run(CheckContext ctx)
    {
        foreach (var c in ctx.Plan.Copper)
        {
            var net = ctx.NetOf(c);
            var volts = ctx.Voltage(net);
            var need = ConductorSpacing.B2(volts);
            if (need > c.StockThickness + CheckContext.Eps)
                yield return Findings.Error(RuleIds.HvCreepage,
                    $"pad {c.Id} (net {net}, {Text.Num(volts)} V) is cut from {Text.Mm(c.StockThickness)} stock; its edge is the only path to the plane and {Text.Num(volts)} V needs {Text.Mm(need)} ({ConductorSpacing.Revision}, B2).",
                    $"Cut the pad from stock at least {Text.Mm(need)} thick, or stand the node off the board; mains safety standards come first.",
                    c.Island.Center, c.Id, net!);
        }

        var high = ctx.Plan.Project.Nets.Where(HighVoltage.Applies).Select(n => n.Name).ToList();
        if (high.Count > 0)
            yield return Findings.Info(RuleIds.HvCaution,
                $"{(high.Count == 1 ? "net" : "nets")} {string.Join(", ", high)} {(high.Count == 1 ? "carries" : "carry")} more than {HighVoltage.Threshold} V or {(high.Count == 1 ? "is" : "are")} marked hv. Capacitors hold a lethal charge after switch-off: discharge through a resistor and measure before touching; keep one hand away from the chassis.",
                "Follow local codes and licensed practice for mains and high-voltage wiring; this check does not replace them.",
                null, high);

        foreach (var c in ctx.Plan.Copper)
        {
            var net = ctx.Plan.Net(ctx.NetOf(c));
            if (net?.Current is not > 0 || net.Ground) continue;
            var width = Math.Min(c.Island.Width, c.Island.Height);
            var need = ConductorCurrent.RequiredWidth(net.Current.Value, ctx.Rules.TempRise, ctx.Rules.CopperThickness);
            if (width < need - CheckContext.Eps)
                yield return Findings.Warning(RuleIds.StripCurrent,
                    $"pad {c.Id} is {Text.Mm(width)} wide; {Text.Num(net.Current.Value)} A on net {net.Name} needs {Text.Mm(need)} of {Text.Mm(ctx.Rules.CopperThickness)} copper for a {Text.Num(ctx.Rules.TempRise)} °C rise (IPC-2221 conductor formula).",
                    "Use a wider strip or pad, or run a wire alongside it.", c.Island.Center, c.Id, net.Name);
        }
    }
}
