using System.Text.RegularExpressions;
using PadPlan.IO;
using PadPlan.Model;

namespace PadPlan.Import;

/// <summary>Finds the sections of one package: references that differ only by a trailing letter after a digit (U2A, U2B). Subcircuit calls and own-format parts are joined; other elements only when a parts map describes the package.</summary>
public static partial class SectionGrouper
{
    public static List<PartSections> Group(IReadOnlyList<NetlistPart> parts, PartsMap map, string file, List<ImportNote> notes)
    {
        var result = new List<PartSections>();
        var open = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        var plainRefs = new HashSet<string>(parts.Select(p => p.Ref), StringComparer.OrdinalIgnoreCase);
        var told = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        foreach (var part in parts)
        {
            var m = SectionRef().Match(part.Ref);
            var joinable = m.Success && (part.Kind == PartKind.Subcircuit || map.For(m.Groups[1].Value, null, null)?.Sections.Count > 0);
            if (!joinable)
            {
                if (m.Success && told.Add(m.Groups[1].Value) && parts.Count(p => SectionRef().Match(p.Ref) is { Success: true } o && string.Equals(o.Groups[1].Value, m.Groups[1].Value, StringComparison.OrdinalIgnoreCase)) > 1)
                    notes.Add(new ImportNote(file, part.Line, $"{m.Groups[1].Value}{m.Groups[2].Value} and its neighbours look like sections of one package {m.Groups[1].Value}; they stay separate parts. To join them, add \"{m.Groups[1].Value}\" with a footprint and \"sections\" to the parts map."));
                result.Add(new PartSections(part.Ref, ValueList.Of((Letter: '\0', Part: part))));
                continue;
            }
            var baseRef = m.Groups[1].Value;
            var letter = char.ToUpperInvariant(m.Groups[2].Value[0]);
            if (plainRefs.Contains(baseRef))
                throw new InputException(file, $"{part.Ref} is a section of {baseRef}, but {baseRef} is also a part of its own. Rename one of them.", part.Line);
            if (open.TryGetValue(baseRef, out var index))
            {
                var group = result[index];
                if (group.First.Kind != part.Kind || !string.Equals(group.First.Model, part.Model, StringComparison.OrdinalIgnoreCase))
                    throw new InputException(file, $"{part.Ref} is a section of {baseRef}, but it is a different part from {group.Sections[0].Part.Ref} (line {group.First.Line}). Sections of one package share one model.", part.Line);
                result[index] = group with { Sections = group.Sections.Add((letter, part)).OrderBy(s => s.Letter).ToValueList() };
            }
            else
            {
                open[baseRef] = result.Count;
                result.Add(new PartSections(baseRef, ValueList.Of((letter, part))));
            }
        }
        return result;
    }

    [GeneratedRegex(@"^(.*\d)([A-Za-z])$")]
    private static partial Regex SectionRef();
}
