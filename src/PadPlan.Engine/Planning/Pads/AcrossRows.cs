using PadPlan.Model;

namespace PadPlan.Planning;

/// <summary>
/// Nets that a part wires to both rows of one IC on scored strips. Such a part has a lead to each row's segments, which lie
/// on either side of the IC's body, so wherever it stands, one lead runs under the body unless the part stands off the
/// IC's end and both pins are near that end. On a large circuit each such net is planned from the start with pads of its
/// own, one for every such part (<see cref="ProblemBuilder"/>), so the part's lead can land on a pad beside it and a jumper
/// join that pad to the far row (common practice, no source). A lead still lands on the segment when that is nearer and
/// clear, and a pad no lead lands on is not written.
/// </summary>
internal static class AcrossRows
{
    /// <summary>The nets, each with how many parts wire it across rows (the pads it gets at least).</summary>
    public static IReadOnlyDictionary<string, int> Of(Project project)
    {
        var grounds = project.Nets.Where(n => n.Ground).Select(n => n.Name).ToHashSet(StringComparer.Ordinal);
        var across = new SortedDictionary<string, int>(StringComparer.Ordinal);
        foreach (var ic in project.Parts)
        {
            var footprint = project.FootprintOf(ic);
            if (footprint.Mount != MountStyle.Strip) continue;
            var rows = RowsOf(ic, footprint, grounds);
            if (rows.Count == 0) continue;
            foreach (var part in project.Parts)
            {
                if (ReferenceEquals(part, ic)) continue;
                var nets = part.Pins.Select(p => p.Net).OfType<string>().Where(rows.ContainsKey).Distinct(StringComparer.Ordinal).ToList();
                if (nets.Select(n => rows[n]).Distinct().Count() < 2) continue;
                foreach (var net in nets) across[net] = across.GetValueOrDefault(net) + 1;
            }
        }
        return across;
    }

    /// <summary>Each non-ground net on the IC's pins with the row its pins are in (-1 or 1), leaving out nets on both rows (a lead may land on either).</summary>
    private static Dictionary<string, int> RowsOf(Part ic, Footprint footprint, HashSet<string> grounds)
    {
        var exits = ic.Pins.Where(p => p.Net is not null && !grounds.Contains(p.Net))
            .Select(p => (Net: p.Net!, Exit: footprint.LeadForPin(p.Pin, ic.Variant)?.Exit)).Where(x => x.Exit is not null).ToList();
        // The rows lie either side of the body along x (DIP footprints as drawn) or, failing that, along y.
        var alongX = footprint.Leads.Select(l => Math.Sign(l.Exit.X)).Where(s => s != 0).Distinct().Count() == 2;
        return exits.GroupBy(x => x.Net, StringComparer.Ordinal)
            .Select(g => (Net: g.Key, Rows: g.Select(x => Math.Sign(alongX ? x.Exit!.Value.X : x.Exit!.Value.Y)).Distinct().ToList()))
            .Where(x => x.Rows.Count == 1 && x.Rows[0] != 0)
            .ToDictionary(x => x.Net, x => x.Rows[0], StringComparer.Ordinal);
    }
}
