using PadPlan.Model;

namespace PadPlan.ProjectFiles;

/// <summary>Checks that a project's names refer to things that exist: unique references, known nets, footprints, pins and pads. Physical rules are the checker's job, not this one's.</summary>
public static class ProjectValidator
{
    /// <summary>A problem and the JSON path where it sits.</summary>
    public readonly record struct Problem(string Path, string Message);

    public static Problem? FirstProblem(Project project) => Problems(project).Cast<Problem?>().FirstOrDefault();

    public static IEnumerable<Problem> Problems(Project project)
    {
        var nets = new HashSet<string>(StringComparer.Ordinal);
        for (var i = 0; i < project.Nets.Count; i++)
            if (!nets.Add(project.Nets[i].Name))
                yield return new($"$.nets[{i}].name", $"net \"{project.Nets[i].Name}\" is listed twice; give each net once.");

        var footprints = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        for (var i = 0; i < project.Footprints.Count; i++)
            if (!footprints.Add(project.Footprints[i].Name))
                yield return new($"$.footprints[{i}].name", $"footprint \"{project.Footprints[i].Name}\" is defined twice in this project.");

        var refs = new HashSet<string>(StringComparer.Ordinal);
        for (var i = 0; i < project.Parts.Count; i++)
        {
            var part = project.Parts[i];
            var path = $"$.parts[{i}]";
            if (!refs.Add(part.Ref))
                yield return new($"{path}.ref", $"part reference \"{part.Ref}\" is used twice; every part needs its own reference.");
            var footprint = project.FindFootprint(part.Footprint);
            if (footprint is null)
            {
                yield return new($"{path}.footprint", $"part {part.Ref} uses footprint \"{part.Footprint}\", which is not in this project's \"footprints\" list. Re-import the netlist or copy the footprint in.");
                continue;
            }
            if (part.Variant is not null && !footprint.Variants.Any(v => string.Equals(v.Name, part.Variant, StringComparison.OrdinalIgnoreCase)))
            {
                var known = footprint.Variants.Count == 0 ? "it has none" : "use one of " + string.Join(", ", footprint.Variants.Select(v => v.Name));
                yield return new($"{path}.variant", $"footprint {footprint.Name} has no pin order \"{part.Variant}\"; {known}.");
                continue;
            }
            foreach (var pin in part.Pins)
            {
                if (!nets.Contains(pin.Net))
                    yield return new($"{path}.pins.{pin.Pin}", $"pin {part.Ref}.{pin.Pin} is on net \"{pin.Net}\", which is not in the \"nets\" list. Add the net or correct the name.");
                if (footprint.LeadForPin(pin.Pin, part.Variant) is null)
                    yield return new($"{path}.pins.{pin.Pin}", $"footprint {footprint.Name} has no pin \"{pin.Pin}\"; its pins are {string.Join(", ", footprint.PinNames(part.Variant))}.");
            }
            var twice = part.Pins.GroupBy(p => p.Pin, StringComparer.OrdinalIgnoreCase).FirstOrDefault(g => g.Count() > 1);
            if (twice is not null)
                yield return new($"{path}.pins", $"pin {part.Ref}.{twice.Key} is given twice.");
        }

        if (project.Layout is null) yield break;
        var layout = project.Layout;
        var ids = new HashSet<string>(StringComparer.Ordinal);
        for (var i = 0; i < layout.Pads.Count; i++)
        {
            var pad = layout.Pads[i];
            var path = $"$.layout.pads[{i}]";
            if (!ids.Add(pad.Id)) yield return new($"{path}.id", $"pad id \"{pad.Id}\" is used twice; pad and segment ids must be unique.");
            if (pad is StripPad strip)
                for (var s = 0; s < strip.Segments.Count; s++)
                    if (!ids.Add(strip.Segments[s].Id)) yield return new($"{path}.segments[{s}].id", $"segment id \"{strip.Segments[s].Id}\" is used twice; pad and segment ids must be unique.");
            foreach (var island in pad.Islands())
                if (island.Net is not null && !nets.Contains(island.Net))
                    yield return new($"{path}", $"pad {island.Id} is marked for net \"{island.Net}\", which is not in the \"nets\" list.");
        }

        var placed = new HashSet<string>(StringComparer.Ordinal);
        for (var i = 0; i < layout.Placements.Count; i++)
        {
            var placement = layout.Placements[i];
            var path = $"$.layout.placements[{i}]";
            if (!placed.Add(placement.Ref)) yield return new($"{path}.ref", $"part {placement.Ref} is placed twice.");
            var part = project.FindPart(placement.Ref);
            if (part is null)
            {
                yield return new($"{path}.ref", $"placement names part \"{placement.Ref}\", which is not in the \"parts\" list.");
                continue;
            }
            var footprint = project.FindFootprint(part.Footprint);
            if (footprint is null) continue;
            for (var j = 0; j < placement.Leads.Count; j++)
            {
                var lead = placement.Leads[j];
                if (footprint.LeadForPin(lead.Pin, part.Variant) is null)
                    yield return new($"{path}.leads[{j}].pin", $"part {part.Ref} has no pin \"{lead.Pin}\".");
                if (lead.Pad is not null && !ids.Contains(lead.Pad))
                    yield return new($"{path}.leads[{j}].pad", $"lead {part.Ref}.{lead.Pin} lands on pad \"{lead.Pad}\", which the layout does not have.");
            }
        }

        for (var i = 0; i < layout.Jumpers.Count; i++)
        {
            var jumper = layout.Jumpers[i];
            if (!ids.Contains(jumper.From)) yield return new($"$.layout.jumpers[{i}].from", $"jumper {jumper.Id} starts at pad \"{jumper.From}\", which the layout does not have.");
            if (!ids.Contains(jumper.To)) yield return new($"$.layout.jumpers[{i}].to", $"jumper {jumper.Id} ends at pad \"{jumper.To}\", which the layout does not have.");
        }
    }
}
