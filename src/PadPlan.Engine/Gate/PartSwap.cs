using System.Globalization;
using PadPlan.Model;
using PadPlan.Planning;
using PadPlan.ProjectFiles.Limits;

namespace PadPlan.Gate;

/// <summary>What the builder has instead of the planned part: another footprint, pin order or value (null keeps the planned one).</summary>
/// <param name="Widen">How many rings of neighbours beyond the first are freed to make room (0: the part and the parts within its reach).</param>
public sealed record SwapRequest(string Ref, string? Footprint = null, string? Variant = null, string? Value = null, int Widen = 0);

/// <summary>The outcome of a swap: the new project, checked, with what was freed and what stayed; or why it could not be done.</summary>
public sealed record SwapOutcome(Project? Project, CheckedPlacement? Placement, IReadOnlyList<string> Freed, int OtherParts, int Unmoved, string? Failure, string? Hint)
{
    public bool Succeeded => Failure is null;
}

/// <summary>
/// Puts a placed part onto what the builder has (a larger resistor, a wider can, another pinout) and re-plans only around it: the part, the
/// parts within its lead reach, and the pads their leads land on are freed; every other part and pad is held where it is, and the placer
/// (through <see cref="CheckedPlacer"/>, so the real checker passes the result) places the freed ones again. Pads are planned afresh for the
/// freed leads, so a net's pad grows, shrinks or splits into two joined by a wire link as the new leads need.
/// </summary>
public static class PartSwap
{
    /// <summary>Why the request cannot be applied to this project (unknown part, footprint with the wrong leads, unknown pin order), or null.</summary>
    public static string? Refusal(Project project, SwapRequest request, Footprint? footprint)
    {
        if (project.FindPart(request.Ref) is not { } part)
            return $"the project has no part {request.Ref}; its parts are {string.Join(", ", project.Parts.Select(p => p.Ref).Take(30))}.";
        if (request.Footprint is not null && footprint is null) return $"no footprint '{request.Footprint}' in the project or the footprint library; 'padplan footprints' lists them.";
        var target = footprint ?? project.FootprintOf(part);
        if (request.Widen is < 0 or > 10) return "--widen must be 0 to 10 rings of neighbours.";
        var variant = VariantFor(part, target, request);
        if (variant is not null && !target.Variants.Any(v => string.Equals(v.Name, variant, StringComparison.OrdinalIgnoreCase)))
            return $"footprint {target.Name} has no pin order '{variant}'" + (target.Variants.Count > 0 ? $"; it has {string.Join(", ", target.Variants.Select(v => v.Name))}." : "; it has none.");
        var old = project.FootprintOf(part);
        if (target.Leads.Count != old.Leads.Count)
            return $"{part.Ref} has {old.Leads.Count} leads on {old.Name}, but {target.Name} has {target.Leads.Count}; choose a footprint with {old.Leads.Count} leads.";
        var names = target.PinNames(variant);
        var missing = part.Pins.Where(p => !names.Contains(p.Pin, StringComparer.OrdinalIgnoreCase)).Select(p => p.Pin).ToList();
        if (missing.Count > 0)
            return $"on {target.Name}" + (variant is null ? "" : $" ({variant})") + $" no lead carries pin {string.Join(", ", missing)} of {part.Ref}; its leads carry {string.Join(", ", names)}." +
                   (target.Variants.Count > 0 ? $" Choose a pin order: {string.Join(", ", target.Variants.Select(v => v.Name))}." : "");
        if (request.Value is { } value && value.Length > InputLimits.MaxValueLength)
            return $"the value is {value.Length} characters long; at most {InputLimits.MaxValueLength}.";
        return null;
    }

    /// <summary>The footprints a part can be swapped onto: the same number of leads, each pin carried by a lead, sorted by name (the editor lists these).</summary>
    public static IEnumerable<string> Candidates(Project project, Part part, IEnumerable<Footprint> library)
    {
        var count = project.FootprintOf(part).Leads.Count;
        return project.Footprints.Concat(library).Where(f => f.Leads.Count == count && f.Mount != MountStyle.Landing && Refusal(project, new SwapRequest(part.Ref, f.Name), f) is null)
            .Select(f => f.Name).Distinct(StringComparer.OrdinalIgnoreCase).Order(StringComparer.Ordinal);
    }

    /// <summary>The part as swapped, and the project holding it (with the new footprint added and one no part uses any more dropped); the layout is unchanged.</summary>
    public static Project Apply(Project project, SwapRequest request, Footprint? footprint)
    {
        var part = project.FindPart(request.Ref)!;
        var target = footprint ?? project.FootprintOf(part);
        var swapped = new Part(part.Ref, request.Value ?? part.Value, target.Name, part.Pins, VariantFor(part, target, request), part.Locked, FootprintAssumed: false);
        var parts = project.Parts.Select(p => p.Ref == part.Ref ? swapped : p).ToList();
        var footprints = project.Footprints.Where(f => parts.Any(p => string.Equals(p.Footprint, f.Name, StringComparison.OrdinalIgnoreCase))).ToList();
        if (!footprints.Any(f => string.Equals(f.Name, target.Name, StringComparison.OrdinalIgnoreCase))) footprints.Add(target);
        return project with { Parts = parts.ToValueList(), Footprints = footprints.OrderBy(f => f.Name, StringComparer.Ordinal).ToValueList() };
    }

    /// <summary>Swaps the part and re-plans around it; the request must have passed <see cref="Refusal"/>.</summary>
    public static SwapOutcome Swap(Project project, SwapRequest request, Footprint? footprint, PlacerSettings settings, IProgress<PlacerProgress>? progress = null)
    {
        var swapped = Apply(project, request, footprint);
        var layout = project.Layout;
        var others = project.Parts.Count - 1;
        var (old, now) = (project.FindPart(request.Ref)!, swapped.FindPart(request.Ref)!);
        var sameLeads = string.Equals(old.Footprint, now.Footprint, StringComparison.OrdinalIgnoreCase) && string.Equals(old.Variant, now.Variant, StringComparison.OrdinalIgnoreCase);
        // Not placed yet, or only the value changes: nothing on the board moves.
        if (layout is null || !layout.Placements.Any(p => p.Ref == request.Ref) || sameLeads)
            return new SwapOutcome(swapped, null, [], others, others, null, null);

        // First only the parts right in the new body's way, then (or straight away when the builder widens) those within an
        // elbow of it: as few parts move as will let the swap fit.
        var margins = request.Widen == 0 ? new[] { InTheWay, Elbow } : [Elbow];
        HashSet<string> freed = [];
        CheckedPlacement result = null!;
        foreach (var margin in margins)
        {
            var wider = FreedParts(swapped, layout, request.Ref, request.Widen, margin);
            if (result is not null && wider.SetEquals(freed)) continue;
            freed = wider;
            result = PlaceFreed(swapped, layout, freed, settings, progress);
            if (result.Succeeded) break;
        }
        var freedList = freed.Order(StringComparer.Ordinal).ToList();
        if (!result.Succeeded)
            return new SwapOutcome(null, result, freedList, others, 0,
                $"{request.Ref} on {swapped.FindPart(request.Ref)!.Footprint} does not fit without moving more: freeing {string.Join(", ", freedList)} was not enough ({result.Failure!.Message})",
                "choose a smaller footprint, or place the whole board again ('padplan place --force', which may also need a larger --board).");

        // Back to the builder's own holds: what was held before stays held, everything else is free again.
        var padLocks = layout.Pads.ToDictionary(p => p.Id, p => p.Locked, StringComparer.Ordinal);
        var placed = result.Project!;
        var final = placed with
        {
            Parts = swapped.Parts,
            Layout = placed.Layout! with
            {
                Pads = placed.Layout.Pads.Select(p => p with { Locked = padLocks.GetValueOrDefault(p.Id) }).ToValueList(),
            },
        };
        var before = layout.Placements.ToDictionary(p => p.Ref, StringComparer.Ordinal);
        var unmoved = final.Layout!.Placements.Count(p => p.Ref != request.Ref && before.TryGetValue(p.Ref, out var b) && b.Position == p.Position && b.Rotation == p.Rotation);
        return new SwapOutcome(final, result with { Project = final }, freedList, others, unmoved, null, null);
    }

    /// <summary>Places the freed parts (and their re-planned pads) with everything else held, trying a few seeds.</summary>
    private static CheckedPlacement PlaceFreed(Project swapped, Layout layout, HashSet<string> freed, PlacerSettings settings, IProgress<PlacerProgress>? progress)
    {
        var freedPads = FreedPads(swapped, layout, freed);
        var held = new Layout(
            layout.Pads.Where(p => !freedPads.Contains(p.Id)).Select(p => p with { Locked = true }).ToValueList(),
            layout.Placements.Where(p => !freed.Contains(p.Ref)).ToValueList(),
            ValueList<Jumper>.Empty);
        var trial = swapped with
        {
            Parts = swapped.Parts.Select(p => freed.Contains(p.Ref) ? p with { Locked = false } : p with { Locked = true }).ToValueList(),
            Layout = held,
        };
        // With most of the board held, one run can corner itself where another seed does not: a few seeds before saying no.
        CheckedPlacement result = null!;
        for (var t = 0; t < SeedsTried; t++)
        {
            result = CheckedPlacer.Place(trial, settings with { KeepExisting = false, Seed = settings.Seed + t * SeedStep }, progress);
            if (result.Succeeded) break;
        }
        return result;
    }

    private static string? VariantFor(Part part, Footprint target, SwapRequest request)
    {
        if (request.Variant is { } v) return v;
        if (part.Variant is { } old && target.Variants.Any(x => string.Equals(x.Name, old, StringComparison.OrdinalIgnoreCase))) return old;
        return null;
    }

    /// <summary>Seeds tried (spaced by <see cref="SeedStep"/>, so they do not overlap the gate's own next seeds) before a swap is called impossible.</summary>
    public const int SeedsTried = 3;
    private const int SeedStep = 101;

    /// <summary>Room kept around a body when looking for the parts in its way (mm): a lead's bend and a pad's edge; common practice, no source.</summary>
    public const double Elbow = 3.0;

    /// <summary>Room kept around the new body on the first try (mm): only the parts it would touch or nearly touch move; common practice, no source.</summary>
    public const double InTheWay = 1.0;

    /// <summary>
    /// The part itself and every part that is not held, not on strips and not an off-board landing, whose body comes within
    /// <paramref name="margin"/> of the part's new body where it stands (<see cref="InTheWay"/>: the parts in its way;
    /// <see cref="Elbow"/>: its close neighbours too); each ring of widening adds the parts within that distance of the freed ones.
    /// </summary>
    private static HashSet<string> FreedParts(Project project, Layout layout, string reference, int widen, double margin)
    {
        var freed = new HashSet<string>(StringComparer.Ordinal) { reference };
        for (var ring = 0; ring <= widen; ring++)
        {
            var boxes = layout.Placements.Where(p => freed.Contains(p.Ref)).Select(p => Box(project, p, margin)).ToList();
            foreach (var placement in layout.Placements)
            {
                if (freed.Contains(placement.Ref) || project.FindPart(placement.Ref) is not { } part || part.Locked) continue;
                if (project.FootprintOf(part).Mount is MountStyle.Strip or MountStyle.Landing) continue;
                var box = Box(project, placement, 0);
                if (boxes.Any(b => b.MinX < box.MaxX && box.MinX < b.MaxX && b.MinY < box.MaxY && box.MinY < b.MaxY)) freed.Add(placement.Ref);
            }
        }
        return freed;
    }

    /// <summary>A placed part's body box on the board, grown by a margin.</summary>
    private static (double MinX, double MinY, double MaxX, double MaxY) Box(Project project, Placement placement, double grow)
    {
        var corners = project.FootprintOf(project.FindPart(placement.Ref)!).Body.Select(placement.ToBoard).ToList();
        return (corners.Min(p => p.X) - grow, corners.Min(p => p.Y) - grow, corners.Max(p => p.X) + grow, corners.Max(p => p.Y) + grow);
    }

    /// <summary>The pads the freed parts' leads land on (re-planned for the new leads) and the strips of a freed strip-mounted part; held pads stay.</summary>
    private static HashSet<string> FreedPads(Project project, Layout layout, HashSet<string> freed)
    {
        var ids = new HashSet<string>(StringComparer.Ordinal);
        foreach (var placement in layout.Placements.Where(p => freed.Contains(p.Ref)))
            foreach (var landing in placement.Leads)
                if (landing.Pad is { } pad) ids.Add(pad);
        var result = new HashSet<string>(StringComparer.Ordinal);
        foreach (var pad in layout.Pads)
        {
            if (pad is StripPad strip)
            {
                if (freed.Any(r => strip.Id.StartsWith(r + "-S", StringComparison.Ordinal))) result.Add(pad.Id);
            }
            else if (!pad.Locked && ids.Contains(pad.Id)) result.Add(pad.Id);
        }
        return result;
    }

    /// <summary>One line: how many of the other parts kept their place.</summary>
    public static string UnmovedLine(SwapOutcome outcome) => string.Create(CultureInfo.InvariantCulture,
        $"{outcome.Unmoved} of {outcome.OtherParts} other parts kept their place ({(outcome.OtherParts == 0 ? 100 : 100.0 * outcome.Unmoved / outcome.OtherParts):0} %); freed and placed again: {string.Join(", ", outcome.Freed)}");
}
