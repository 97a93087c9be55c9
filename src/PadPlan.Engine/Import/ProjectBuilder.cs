using PadPlan.IO;
using PadPlan.Model;
using PadPlan.ProjectFiles;

namespace PadPlan.Import;

/// <summary>Turns a read netlist into a project: footprints chosen and embedded, pins mapped to leads, sections and coupled windings joined, nets given their facts and classes.</summary>
public static class ProjectBuilder
{
    public static ImportResult Build(Netlist netlist, ImportOptions options)
    {
        var file = netlist.File;
        var map = options.PartsMap ?? PartsMap.Empty;
        var notes = new List<ImportNote>(netlist.Notes);
        CheckReferences(netlist.Parts, file);
        if (!netlist.Parts.Any(p => p.Kind != PartKind.Landing))
            throw new InputException(file, "the netlist has no parts to place" + (netlist.Parts.Count > 0 ? " (only sources)" : "") + ". Give at least one part line (R, C, L, D, Q, J, M or X in SPICE; see docs/netlist-format.md).");
        var ledger = new ImportLedger();

        var facts = new Dictionary<string, NetFacts>(StringComparer.Ordinal);
        foreach (var f in netlist.Nets) facts[f.Name] = facts.TryGetValue(f.Name, out var had) ? had.Merge(f) : f;
        foreach (var (f, line) in map.Nets)
        {
            if (!netlist.Parts.Any(p => p.Pins.Any(x => x.Net == f.Name)))
                notes.Add(new ImportNote(map.File, line, $"net {f.Name} is in the parts map but not in the netlist."));
            facts[f.Name] = facts.TryGetValue(f.Name, out var had) ? had.Merge(f) : f;
        }
        var estimated = VoltageEstimator.Estimate(netlist.Parts, facts);

        var merged = WindingMerger.Merge(netlist.Parts, netlist.Couplings, file, ledger.Windings);
        var footprints = new List<Footprint>();
        var parts = new List<Part>();
        foreach (var package in SectionGrouper.Group(merged, map, file, notes))
        {
            RefuseGeneratedForm(package.Ref, file, package.First.Line);
            var part = package.IsSectioned ? Sectioned(package, options.Library, map, file, notes, ledger) : Single(package.First, options.Library, map, file, notes, ledger);
            parts.Add(part);
            if (!footprints.Any(f => string.Equals(f.Name, part.Footprint, StringComparison.OrdinalIgnoreCase)))
                footprints.Add(options.Library.Find(part.Footprint)!);
        }

        var nets = Nets(parts, estimated, netlist, notes);
        if (netlist.Elements is not null) ledger.RfNets(netlist, nets);
        var size = options.BoardSize ?? netlist.BoardSize;
        var project = new Project(
            ProjectName(file),
            size is { } s ? Board.Auto.WithSize(s.Width, s.Height) : Board.Auto,
            Toolkit.Default,
            RuleSettings.Default,
            nets.ToValueList(),
            parts.ToValueList(),
            footprints.ToValueList(),
            Layout: null,
            Description: netlist.Title,
            FootprintDirs: (options.FootprintDirs ?? []).Concat(netlist.FootprintDirs ?? ValueList<string>.Empty).Distinct().ToValueList(),
            Imported: ledger.Record(netlist, parts));
        var problem = ProjectValidator.FirstProblem(project);
        if (problem is not null) throw new InputException(file, $"the imported project does not hold together: {problem.Value.Message}");
        return new ImportResult(project, notes.ToValueList());
    }

    private static string ProjectName(string file)
    {
        var name = Path.GetFileNameWithoutExtension(file);
        return string.IsNullOrWhiteSpace(name) ? "imported" : name;
    }

    private static void CheckReferences(IEnumerable<NetlistPart> parts, string file)
    {
        var seen = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        foreach (var p in parts)
            if (!seen.TryAdd(p.Ref, p.Line))
                throw new InputException(file, $"duplicate reference {p.Ref}: it is already used on line {seen[p.Ref]}. Every part needs its own reference.", p.Line);
    }

    /// <summary>A part named like a pad or a jumper would share its id with one in the build steps and the check report.</summary>
    private static void RefuseGeneratedForm(string reference, string file, int line)
    {
        if (GeneratedIds.ClashOf(reference) is not { } prefix) return;
        var what = prefix == GeneratedIds.JumperPrefix ? $"jumpers ({GeneratedIds.Jumper(1)}, {GeneratedIds.Jumper(2)}...)" : $"pads ({GeneratedIds.Pad(1)}, {GeneratedIds.Pad(2)}...)";
        throw new InputException(file, $"part reference {reference} has the form PadPlan gives {what}, so the build steps would name two things {reference}. Rename the part (e.g. {reference}A or J{reference[prefix.Length..]}).", line);
    }

    private static Part Single(NetlistPart part, FootprintLibrary library, PartsMap map, string file, List<ImportNote> notes, ImportLedger ledger)
    {
        InputException Bad(string message) => new(file, $"{part.Ref}: {message}", part.Line);
        var entry = map.For(part.Ref, part.Value, part.Model);
        IReadOnlyDictionary<string, string>? rename = entry?.Pins;
        string? name = entry?.Footprint ?? part.Footprint;
        var assumed = false;
        if (name is null && part.Kind == PartKind.Subcircuit && OpAmpPinout.FromNames(part.Pins.Select(p => p.Name).ToList()) is { } roles)
        {
            name = "dip-8";
            rename = part.Pins.Select((p, i) => (p.Name, Lead: OpAmpPinout.Lead(1, 0, roles[i]).Lead.ToString(System.Globalization.CultureInfo.InvariantCulture)))
                .ToDictionary(x => x.Name, x => x.Lead, StringComparer.OrdinalIgnoreCase);
            notes.Add(new ImportNote(file, part.Line, $"{part.Ref}: a single op-amp by its pin names; put on dip-8 with the usual single pinout (2 -in, 3 +in, 4 V-, 6 out, 7 V+). Check the data sheet; a parts map can say otherwise."));
            ledger.Pinout = "single op-amp pinout by pin names";
        }
        if (name is null && part.Kind == PartKind.Subcircuit && StandardPinouts.Find(part) is { } standard)
        {
            (name, rename) = (standard.Footprint, standard.Leads);
            notes.Add(new ImportNote(file, part.Line, $"{part.Ref}: {standard.Note} Check the data sheet; a parts map can say otherwise."));
            ledger.Pinout = standard.Name;
        }
        if (name is null)
        {
            var chosen = DefaultFootprints.For(part)
                ?? throw Bad(part.Kind == PartKind.Subcircuit
                    ? $"no footprint in the library has {part.Pins.Count} pins. Add \"{part.Model ?? part.Ref}\" with a footprint and its \"pins\" under \"values\" in a parts map (--parts)."
                    : $"no default footprint fits this {part.Kind.ToString().ToLowerInvariant()}; name one in a parts map (--parts).");
            (name, assumed) = chosen;
            if (assumed) notes.Add(new ImportNote(file, part.Line, AssumedNote(part, name)));
        }
        var footprint = entry?.Footprint is not null ? library.Require(name, map.File, entry.Line) : library.Require(name, file, part.Line);
        var mapped = PinMapper.Map(part, footprint, entry?.Variant ?? part.Variant, rename, Bad);
        ledger.Mapped(part, part.Ref, mapped, footprint.Name, entry is not null, assumed);
        if (mapped.Guessed && part.Kind is PartKind.Bjt or PartKind.Jfet or PartKind.Mosfet)
            ledger.Assumed(part.Ref, $"pin order {mapped.Variant} on {footprint.Name}");
        if (mapped.Guessed && part.Kind is PartKind.Bjt or PartKind.Jfet or PartKind.Mosfet)
            notes.Add(new ImportNote(file, part.Line, $"{part.Ref}: pin order not given, so {footprint.Name} pin order {mapped.Variant} is assumed (lead 1 = {footprint.PinNames(mapped.Variant)[0]}). Pinouts differ between types: check the data sheet and set \"variant\" for {part.Ref} in a parts map, or write {footprint.Name}/ORDER in a .ppn file."));
        return new Part(part.Ref, entry?.Value ?? part.Value, footprint.Name, mapped.Pins, mapped.Variant, FootprintAssumed: assumed, Rating: entry?.Rating);
    }

    private static string AssumedNote(NetlistPart part, string footprint) => part.Kind switch
    {
        PartKind.Subcircuit when !part.Positional => $"{part.Ref}: no footprint given, so the generic {footprint} is assumed, its pins taken as lead numbers. Name the footprint after the value (see 'padplan footprints').",
        PartKind.Subcircuit => $"{part.Ref}: {part.Model ?? "this part"} has no known footprint, so the generic {footprint} is assumed, pins in call order on leads 1, 2, 3... Add \"{part.Model ?? part.Ref}\": {{\"footprint\": \"...\", \"pins\": {{...}}}} under \"values\" in a parts map (--parts).",
        PartKind.Bjt or PartKind.Jfet or PartKind.Mosfet => $"{part.Ref}: transistor {part.Model ?? part.Value} is not a type number PadPlan knows, so the small {footprint} is assumed, and its power is judged against that package's rating. A power device goes on to126 or to220: name the footprint in a parts map.",
        PartKind.Diode => $"{part.Ref}: diode {part.Model ?? part.Value} is not a type number PadPlan knows, so the small-signal {footprint} is assumed, and its current is judged against that package's rating. A rectifier goes on diode-plastic-do41 (1 A) or diode-plastic-do201 (3 A): name the footprint in a parts map.",
        PartKind.Transformer => $"{part.Ref}: coupled windings ({part.Value}) are put on {footprint}; the core size is a guess. In a parts map, add \"{part.Model}\" (the K line) under \"values\", or \"{part.Ref}\" under \"parts\", with the right toroid.",
        _ => $"{part.Ref}: value {part.Value} is not known, so {footprint} is assumed; name the footprint in a parts map.",
    };

    private static Part Sectioned(PartSections package, FootprintLibrary library, PartsMap map, string file, List<ImportNote> notes, ImportLedger ledger)
    {
        var first = package.First;
        InputException Bad(string message, int? line = null) => new(file, $"{package.Ref}: {message}", line ?? first.Line);
        var entry = map.For(package.Ref, first.Value, first.Model);
        var letters = string.Join(", ", package.Sections.Select(s => s.Letter));
        string name;
        var assumed = false;
        Func<char, NetlistPart, IReadOnlyDictionary<string, string>?> pinsOf;
        if (entry?.Footprint is not null || first.Footprint is not null || !first.Positional)
        {
            assumed = entry?.Footprint is null && first.Footprint is null;
            var highest = package.Sections.Max(s => DefaultFootprints.PinsNeeded(s.Part));
            name = entry?.Footprint ?? first.Footprint ?? DefaultFootprints.GenericDip(highest)
                ?? throw Bad($"its pins go up to {highest}, more than any generic footprint; name the footprint.");
            if (assumed) notes.Add(new ImportNote(file, first.Line, $"{package.Ref}: no footprint given, so the generic {name} is assumed; name it after the value."));
            pinsOf = (letter, part) => entry is null ? null
                : entry.Sections.TryGetValue(letter.ToString(), out var pins) ? pins
                : entry.Sections.Count > 0 ? throw Bad($"the parts map gives no pin mapping for section {letter}; add \"{letter}\" under \"sections\".", part.Line)
                : entry.Pins;
        }
        else if (package.Sections.All(s => s.Part.Pins.Count == 5) && package.Sections.All(s => s.Letter <= 'D'))
        {
            var sectionCount = package.Sections.Max(s => s.Letter) <= 'B' ? 2 : 4;
            var byName = OpAmpPinout.FromNames(first.Pins.Select(p => p.Name).ToList());
            var roles = byName ?? OpAmpPinout.MacromodelOrder;
            name = OpAmpPinout.Lead(sectionCount, 0, roles[0]).Footprint;
            notes.Add(new ImportNote(file, first.Line, $"{package.Ref}: sections {letters} of {first.Model} are put on {name} with the usual {(sectionCount == 2 ? "dual" : "quad")} op-amp pinout" +
                (byName is null ? ", taking the pins in the usual macromodel order +in, -in, V+, V-, out" : "") + ". Check the data sheet; a parts map can say otherwise."));
            pinsOf = (letter, part) => part.Pins.Select((p, i) => (p.Name, Lead: OpAmpPinout.Lead(sectionCount, letter - 'A', roles[i]).Lead.ToString(System.Globalization.CultureInfo.InvariantCulture)))
                .ToDictionary(x => x.Name, x => x.Lead, StringComparer.OrdinalIgnoreCase);
        }
        else
        {
            var total = package.Sections.Sum(s => s.Part.Pins.Count);
            name = DefaultFootprints.GenericDip(total) ?? throw Bad($"its sections have {total} pins together, more than any generic footprint. Add \"{package.Ref}\" with a footprint and \"sections\" to a parts map (--parts).");
            assumed = true;
            notes.Add(new ImportNote(file, first.Line, $"{package.Ref}: sections {letters} of {first.Model} have no known footprint, so the generic {name} is assumed, their pins in turn on leads 1, 2, 3... Add \"{package.Ref}\" with a footprint and \"sections\" to a parts map (--parts)."));
            var offsets = new Dictionary<char, int>();
            var at = 0;
            foreach (var (letter, part) in package.Sections) { offsets[letter] = at; at += part.Pins.Count; }
            pinsOf = (letter, part) => part.Pins.Select((p, i) => (p.Name, Lead: (offsets[letter] + i + 1).ToString(System.Globalization.CultureInfo.InvariantCulture)))
                .ToDictionary(x => x.Name, x => x.Lead, StringComparer.OrdinalIgnoreCase);
        }
        var footprint = entry?.Footprint is not null ? library.Require(name, map.File, entry.Line) : library.Require(name, file, first.Line);
        var variant = entry?.Variant ?? first.Variant;
        var pins = new List<PinNet>();
        foreach (var (letter, part) in package.Sections)
        {
            var mapped = PinMapper.Map(part, footprint, variant, pinsOf(letter, part), m => Bad($"section {letter}: {m}", part.Line));
            ledger.Pinout = $"section {letter}";
            ledger.Mapped(part, package.Ref, mapped, footprint.Name, entry is not null, assumed);
            variant = mapped.Variant;
            foreach (var pin in mapped.Pins)
            {
                var had = pins.FirstOrDefault(p => p.Pin == pin.Pin);
                if (had is null) pins.Add(pin);
                else if (had.Net != pin.Net)
                    throw Bad($"section {letter} puts lead {pin.Pin} on net {pin.Net}, but another section put it on {had.Net}. Shared pins (supplies) must be on the same net in every section.", part.Line);
            }
        }
        var ordered = pins.OrderBy(p => footprint.PinNames(variant).ToList().FindIndex(n => n == p.Pin)).ToValueList();
        return new Part(package.Ref, entry?.Value ?? first.Value, footprint.Name, ordered, variant, FootprintAssumed: assumed, Rating: entry?.Rating);
    }

    private static List<Net> Nets(List<Part> parts, IReadOnlyDictionary<string, NetFacts> facts, Netlist netlist, List<ImportNote> notes)
    {
        var order = new List<string>();
        var uses = new Dictionary<string, List<string>>(StringComparer.Ordinal);
        foreach (var part in parts)
            foreach (var pin in part.Pins)
            {
                if (!uses.TryGetValue(pin.Net, out var list)) { uses[pin.Net] = list = []; order.Add(pin.Net); }
                list.Add($"{part.Ref} pin {pin.Pin}");
            }
        foreach (var f in netlist.Nets.Where(f => !uses.ContainsKey(f.Name)))
            notes.Add(new ImportNote(netlist.File, null, $"net {f.Name} is described, but no part is on it; it is left out."));
        var nets = order.Select(name => NetClassifier.ToNet(facts.GetValueOrDefault(name) ?? new NetFacts(name))).ToList();
        foreach (var net in nets.Where(n => uses[n.Name].Count == 1 && !n.Ground && !n.OpenEnded))
            notes.Add(new ImportNote(netlist.File, null, $"net {net.Name} has only one connection ({uses[net.Name][0]}); a pad for it would join nothing. Check the netlist for a misspelt net name."));
        return nets.OrderBy(n => n.Ground ? 0 : 1).ToList();
    }
}
