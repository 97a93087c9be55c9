using PadPlan.Model;
using PadPlan.Model.Standards;

namespace PadPlan.Planning;

/// <summary>Works out the scored strips under a DIP-style part: one strip per pin row, widened outward so other parts can land on the segments, and broken at ground pins so those leads reach the plane.</summary>
internal static class StripLayout
{
    /// <summary>Distance from a pin to the inner edge of its strip, beyond half the lead diameter (common practice, no source).</summary>
    private const double InnerEdge = 0.5;
    /// <summary>Copper a segment keeps beyond the lead's diameter, so the joint has a fillet all round (common practice, no source).</summary>
    private const double SegmentCopperBeyondLead = 0.5;
    /// <summary>Scores wider than the toolkit's are rounded up to this step, so the builder can set a saw or file by it.</summary>
    private const double ScoreStep = 0.05;

    public static IReadOnlyList<StripRun> For(Part part, Footprint footprint, Project project)
    {
        var toolkit = project.Toolkit;
        if (toolkit.StripWidths.Count == 0)
            throw new PlacementImpossibleException(new PlacementFailure(
                $"part {part.Ref} sits on scored strips, but the toolkit lists no strip width.", "Add strip widths to toolkit.stripWidths (for example 5 and 8 mm)."));
        var width = toolkit.StripWidths[^1];
        var pitch = toolkit.StripPitch;
        var pins = footprint.PinNames(part.Variant);
        var byX = Rows(footprint, l => l.Exit.X);
        var vertical = byX.Count == 2;
        var rows = vertical ? byX : Rows(footprint, l => l.Exit.Y);
        if (rows.Count != 2)
            throw new PlacementImpossibleException(new PlacementFailure(
                $"footprint {footprint.Name} of part {part.Ref} is strip-mounted but its leads do not form two straight rows.", "Use an upright or axial mount for this footprint, or correct its lead positions."));
        var centre = rows.Average(r => r.Key);
        var runs = new List<StripRun>();
        foreach (var row in rows)
        {
            var leads = row.OrderBy(i => vertical ? footprint.Leads[i].Exit.Y : footprint.Leads[i].Exit.X).ToList();
            for (var k = 1; k < leads.Count; k++)
            {
                var step = Along(footprint.Leads[leads[k]].Exit, vertical) - Along(footprint.Leads[leads[k - 1]].Exit, vertical);
                if (Math.Abs(step - pitch) > 0.05)
                    throw new PlacementImpossibleException(new PlacementFailure(
                        FormattableString.Invariant($"footprint {footprint.Name} of part {part.Ref}: its pins are {step:0.##} mm apart but the toolkit's strips are scored at {pitch:0.##} mm."),
                        "Set toolkit.stripPitch to the part's pin pitch, or mount the part another way."));
            }
            var outward = row.Key >= centre ? 1.0 : -1.0;
            var diameter = leads.Max(i => footprint.Leads[i].Diameter);
            var cross = row.Key + outward * (width / 2 - diameter / 2 - InnerEdge);
            var run = new List<StripPin>();
            void Flush()
            {
                if (run.Count == 0) return;
                var first = Along(footprint.Leads[run[0].Lead].Exit, vertical) - pitch / 2;
                var score = ScoreFor(part, project, run, pitch, diameter);
                runs.Add(new StripRun(vertical, vertical ? new Point(cross, first) : new Point(first, cross), width, pitch, score, run.ToValueList()));
                run = [];
            }
            foreach (var i in leads)
            {
                var net = part.NetOf(pins[i]);
                if (net is not null && project.FindNet(net)?.Ground == true)
                {
                    Flush(); // a ground pin gets no segment: its lead goes down to the plane between two strips
                    continue;
                }
                run.Add(new StripPin(i, pins[i], net));
            }
            Flush();
        }
        return runs;
    }

    /// <summary>
    /// The score between segments is all the bare board there is between neighbouring pins' copper, so where two neighbours carry nets
    /// whose voltage needs more than the toolkit's score (IPC-2221 Table 6-1, B2), the whole strip gets scores that wide.
    /// When the pitch cannot give that and still leave copper for the lead, no strip can carry the pins.
    /// </summary>
    private static double ScoreFor(Part part, Project project, IReadOnlyList<StripPin> pins, double pitch, double diameter)
    {
        var score = project.Toolkit.ScoreWidth;
        for (var k = 1; k < pins.Count; k++)
        {
            var (a, b) = (pins[k - 1], pins[k]);
            if (a.Net is null || b.Net is null || a.Net == b.Net) continue;
            var volts = ConductorSpacing.Between(project.FindNet(a.Net)?.Voltage, project.FindNet(b.Net)?.Voltage);
            var need = ConductorSpacing.B2(volts);
            if (need <= project.Rules.PadGap || need <= score) continue;
            var wide = Math.Ceiling((need + PlacerLimits.Safety) / ScoreStep - 1e-9) * ScoreStep;
            if (pitch - wide < diameter + SegmentCopperBeyondLead)
                throw new PlacementImpossibleException(new PlacementFailure(
                    FormattableString.Invariant($"pins {part.Ref}.{a.Pin} (net {a.Net}) and {part.Ref}.{b.Pin} (net {b.Net}) are {pitch:0.##} mm apart on a scored strip; up to {volts:0.#} V between them needs {need:0.##} mm of bare board ({ConductorSpacing.Revision}, B2), more than a score at this pitch can give."),
                    $"Mount {part.Ref} off the board (a landing footprint with wires to its socket), or leave a pin unconnected between the two nets; mains safety standards come first."));
            score = Math.Max(score, Math.Round(wide, 2));
        }
        return score;
    }

    private static double Along(Point p, bool vertical) => vertical ? p.Y : p.X;

    private static List<IGrouping<double, int>> Rows(Footprint footprint, Func<FootprintLead, double> key) =>
        Enumerable.Range(0, footprint.Leads.Count).GroupBy(i => Math.Round(key(footprint.Leads[i]), 2)).OrderBy(g => g.Key).ToList();
}
