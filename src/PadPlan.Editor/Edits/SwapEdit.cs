using PadPlan.Gate;
using PadPlan.Import;
using PadPlan.IO;
using PadPlan.Model;
using PadPlan.Planning;

namespace PadPlan.Editor.Edits;

/// <summary>"Swap part" as the page sends it: the part, and what it becomes (null keeps the planned one).</summary>
public sealed class SwapEditRequest
{
    public string? Ref { get; set; }
    public string? Footprint { get; set; }
    public string? Variant { get; set; }
    public string? Value { get; set; }
    /// <summary>Rings of neighbours beyond the first to free (as `padplan swap --widen`).</summary>
    public int Widen { get; set; }
}

/// <summary>One footprint the page offers for a swap, with its pin orders.</summary>
public sealed record SwapChoice(string Name, string Description, IReadOnlyList<string> Variants);

/// <summary>What the page lists under "Swap part" for one part: its footprint, pin order and value now, and the footprints with the right leads.</summary>
public sealed record SwapChoices(string Ref, string Footprint, string? Variant, string Value, IReadOnlyList<SwapChoice> Footprints);

/// <summary>The editor's side of <see cref="PartSwap"/>: the same swap as `padplan swap`, on the plan the page holds.</summary>
public sealed class SwapEdit(Func<Project, IEnumerable<Footprint>> library)
{
    /// <summary>The bundled library plus the project's own footprint folders; a folder that cannot be read is left out (the project holds the footprints it uses).</summary>
    public static IEnumerable<Footprint> LibraryFor(Project project)
    {
        try
        {
            return FootprintLibrary.Load(project.FootprintDirs).Footprints;
        }
        catch (InputException)
        {
            return FootprintLibrary.Load().Footprints;
        }
    }

    public SwapChoices Choices(Project project, string reference)
    {
        var part = project.FindPart(reference) ?? throw new EditRefused($"there is no part {reference}.");
        var all = project.Footprints.Concat(library(project)).ToList();
        var names = PartSwap.Candidates(project, part, all);
        var choices = names.Select(n => all.First(f => string.Equals(f.Name, n, StringComparison.OrdinalIgnoreCase)))
            .Select(f => new SwapChoice(f.Name, f.Description, f.Variants.Select(v => v.Name).ToList())).ToList();
        return new SwapChoices(part.Ref, part.Footprint, part.Variant, part.Value, choices);
    }

    /// <summary>The swapped and re-placed plan, passed by the checker; <see cref="EditRefused"/> with the reason (and the widening to try) otherwise.</summary>
    /// <remarks>The same settings as `padplan swap` (seed 1, normal effort), so the page and the command give the same plan.</remarks>
    public Project Apply(Project project, SwapEditRequest edit)
    {
        var reference = string.IsNullOrWhiteSpace(edit.Ref) ? throw new EditRefused("the swap needs \"ref\".") : edit.Ref;
        var request = new SwapRequest(reference, Blank(edit.Footprint), Blank(edit.Variant), edit.Value, edit.Widen);
        var footprint = request.Footprint is { } name
            ? project.FindFootprint(name) ?? library(project).FirstOrDefault(f => string.Equals(f.Name, name, StringComparison.OrdinalIgnoreCase))
            : null;
        if (PartSwap.Refusal(project, request, footprint) is { } refusal) throw new EditRefused(refusal);
        var outcome = PartSwap.Swap(project, request, footprint, new PlacerSettings(Seed: 1, Effort: Effort.Normal));
        if (!outcome.Succeeded) throw new EditRefused($"{outcome.Failure}. Set \"free more\" to {edit.Widen + 1} to free the parts next to those too; or {outcome.Hint}");
        return outcome.Project!;
    }

    private static string? Blank(string? text) => string.IsNullOrWhiteSpace(text) ? null : text;
}
