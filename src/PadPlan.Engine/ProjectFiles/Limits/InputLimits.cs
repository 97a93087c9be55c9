namespace PadPlan.ProjectFiles.Limits;

/// <summary>
/// The documented limits of every number, list and text in PadPlan's JSON files (docs/limits.md, and the same values in
/// docs/*.schema.json). They are generous for a hand-built pad board and keep the placer's and checker's time and memory
/// bounded; anything outside is refused with exit 2 before any work starts.
/// </summary>
public static class InputLimits
{
    /// <summary>Largest JSON file read (bytes).</summary>
    public const int MaxFileBytes = 16 * 1024 * 1024;
    /// <summary>Largest netlist read (bytes): a 500-part deck with its models is well under a megabyte.</summary>
    public const int MaxNetlistBytes = 4 * 1024 * 1024;
    /// <summary>Longest netlist line (characters), a SPICE line with its '+' continuations joined: what the project keeps of a line (<see cref="MaxNoteLength"/>) must hold it.</summary>
    public const int MaxNetlistLineLength = MaxNoteLength;

    public const int MaxParts = 500;
    public const int MaxNets = 2000;
    public const int MaxFootprints = 500;
    public const int MaxKeepouts = 200;
    public const int MaxPads = 2000;
    public const int MaxJumpers = 1000;
    public const int MaxLeadsPerPart = 100;
    public const int MaxNameLength = 100;
    public const int MaxValueLength = 200;
    public const int MaxNoteLength = 2000;
    /// <summary>Lines of an import record (summary lines, element lines, simulation lines of the deck).</summary>
    public const int MaxImportLines = 10_000;

    /// <summary>Any position on or around a board: within ±2 m of the origin.</summary>
    public static NumberRange Coordinate { get; } = new(-2000, 2000, "mm");
    /// <summary>A point of a footprint, relative to the part origin: a part fits in a 1 m square.</summary>
    public static NumberRange PartCoordinate { get; } = new(-500, 500, "mm");
    /// <summary>A length or size: positive and under 1 m.</summary>
    public static NumberRange Size { get; } = new(0, 1000, "mm", MinExclusive: true, MaxExclusive: true);
    /// <summary>A gap between copper: zero or more and under 50 mm.</summary>
    public static NumberRange Gap { get; } = new(0, 50, "mm", MaxExclusive: true);
    /// <summary>A hand punch: 0.5 to 50 mm.</summary>
    public static NumberRange Punch { get; } = new(0.5, 50, "mm");
    /// <summary>A thickness of board or pad stock.</summary>
    public static NumberRange Thickness { get; } = new(0, 10, "mm", MinExclusive: true);
    /// <summary>Lead spacing and strip pitch: a small fraction would give absurd lead capacities.</summary>
    public static NumberRange Pitch { get; } = new(0.5, 50, "mm");
    /// <summary>A reach: zero or more and under 1 m.</summary>
    public static NumberRange Reach { get; } = new(0, 1000, "mm", MaxExclusive: true);
    /// <summary>The board margin: the board must still have room inside it (also checked against the board size).</summary>
    public static NumberRange Margin { get; } = new(0, 100, "mm");
    public static NumberRange Voltage { get; } = new(-100_000, 100_000, "V");
    public static NumberRange Current { get; } = new(0, 1000, "A");
    public static NumberRange RatedVoltage { get; } = new(0, 100_000, "V", MinExclusive: true);
    public static NumberRange RatedPower { get; } = new(0, 10_000, "W", MinExclusive: true);
    public static NumberRange RatedCurrent { get; } = new(0, 1000, "A", MinExclusive: true);

    public static LimitTable Project { get; } = BuildProject();
    public static LimitTable FootprintFile { get; } = BuildFootprintFile();
    public static LimitTable PartsMap { get; } = BuildPartsMap();

    private static LimitTable BuildProject()
    {
        var t = new Builder("project");
        t.Text("$.format", MaxNameLength).Text("$.name", MaxValueLength).Text("$.description", MaxNoteLength);
        t.Number("$.board.width", Size).Number("$.board.height", Size).Number("$.board.cornerRadius", new NumberRange(0, 500, "mm"))
            .Number("$.board.margin", Margin).Number("$.board.thickness", Thickness);
        t.List("$.board.keepouts", MaxKeepouts).Text("$.board.keepouts[*].id", MaxNameLength).Text("$.board.keepouts[*].shape", MaxNameLength)
            .Number("$.board.keepouts[*].x", Coordinate).Number("$.board.keepouts[*].y", Coordinate)
            .Number("$.board.keepouts[*].d", Size).Number("$.board.keepouts[*].w", Size).Number("$.board.keepouts[*].h", Size);
        t.List("$.toolkit.punches", 20).Number("$.toolkit.punches[*]", Punch)
            .Number("$.toolkit.stockThickness", Thickness).Number("$.toolkit.permittivity", new NumberRange(1, 100, ""))
            .List("$.toolkit.stripWidths", 20).Number("$.toolkit.stripWidths[*]", Size)
            .List("$.toolkit.leadCapacity", 20).Number("$.toolkit.leadCapacity[*].padSize", Size)
            .Number("$.toolkit.leadCapacity[*].leads", new NumberRange(1, 100, "leads", WholeNumber: true))
            .Number("$.toolkit.leadSpacing", Pitch).Number("$.toolkit.stripPitch", Pitch).Number("$.toolkit.scoreWidth", new NumberRange(0, 10, "mm", MinExclusive: true));
        t.Number("$.rules.padGap", Gap).Number("$.rules.groundGap", Gap).Number("$.rules.leadGap", Gap)
            .Number("$.rules.maxLeadRf", Size).Number("$.rules.maxLeadAudio", Size).Number("$.rules.maxLeadGeneral", Size)
            .Number("$.rules.maxLeadPower", Size).Number("$.rules.maxLeadHv", Size)
            .Number("$.rules.tempRise", new NumberRange(0, 100, "°C")).Number("$.rules.copperThickness", new NumberRange(0, 1, "mm"));
        t.List("$.footprintDirs", 20).Text("$.footprintDirs[*]", MaxNoteLength);
        t.List("$.nets", MaxNets);
        Net(t, "$.nets[*]");
        t.List("$.parts", MaxParts).Text("$.parts[*].ref", MaxNameLength).Text("$.parts[*].value", MaxValueLength)
            .Text("$.parts[*].footprint", MaxNameLength).Text("$.parts[*].variant", MaxNameLength)
            .Map("$.parts[*].pins", MaxLeadsPerPart).Text("$.parts[*].pins.*", MaxNameLength)
            .Number("$.parts[*].ratedVoltage", RatedVoltage).Number("$.parts[*].ratedPower", RatedPower).Number("$.parts[*].ratedCurrent", RatedCurrent);
        t.List("$.footprints", MaxFootprints);
        Footprint(t, "$.footprints[*]");
        const string pads = "$.layout.pads";
        t.List(pads, MaxPads).Text($"{pads}[*].id", MaxNameLength).Text($"{pads}[*].shape", MaxNameLength).Text($"{pads}[*].net", MaxNameLength)
            .Number($"{pads}[*].x", Coordinate).Number($"{pads}[*].y", Coordinate)
            .Number($"{pads}[*].d", Size).Number($"{pads}[*].w", Size).Number($"{pads}[*].h", Size)
            .Number($"{pads}[*].stock", Thickness).Number($"{pads}[*].score", new NumberRange(0, 10, "mm", MinExclusive: true))
            .List($"{pads}[*].segments", 200).Text($"{pads}[*].segments[*].id", MaxNameLength).Text($"{pads}[*].segments[*].net", MaxNameLength)
            .Number($"{pads}[*].segments[*].length", Size);
        const string placements = "$.layout.placements";
        t.List(placements, MaxParts).Text($"{placements}[*].ref", MaxNameLength)
            .Number($"{placements}[*].x", Coordinate).Number($"{placements}[*].y", Coordinate)
            .Number($"{placements}[*].rotation", new NumberRange(-360, 360, "degrees", WholeNumber: true))
            .List($"{placements}[*].leads", MaxLeadsPerPart).Text($"{placements}[*].leads[*].pin", MaxNameLength).Text($"{placements}[*].leads[*].pad", MaxNameLength)
            .Number($"{placements}[*].leads[*].x", Coordinate).Number($"{placements}[*].leads[*].y", Coordinate);
        const string jumpers = "$.layout.jumpers";
        t.List(jumpers, MaxJumpers).Text($"{jumpers}[*].id", MaxNameLength).Text($"{jumpers}[*].from", MaxNameLength).Text($"{jumpers}[*].to", MaxNameLength)
            .List($"{jumpers}[*].path", 100).List($"{jumpers}[*].path[*]", 2).Number($"{jumpers}[*].path[*][*]", Coordinate);
        const string imported = "$.imported";
        t.List($"{imported}.summary", MaxImportLines).Text($"{imported}.summary[*].topic", MaxNameLength)
            .Text($"{imported}.summary[*].item", MaxNoteLength).Text($"{imported}.summary[*].became", MaxNoteLength)
            .List($"{imported}.elements", MaxImportLines).Text($"{imported}.elements[*].name", MaxNameLength).Text($"{imported}.elements[*].part", MaxNameLength)
            .List($"{imported}.elements[*].nodes", MaxLeadsPerPart).Text($"{imported}.elements[*].nodes[*].pin", MaxNameLength)
            .Text($"{imported}.elements[*].nodes[*].net", MaxNameLength).Text($"{imported}.elements[*].tail", MaxNoteLength)
            .List($"{imported}.deckLines", MaxImportLines).Text($"{imported}.deckLines[*]", MaxNoteLength);
        return t.Build();
    }

    private static LimitTable BuildFootprintFile()
    {
        var t = new Builder("footprint file");
        t.Text("$.format", MaxNameLength).Text("$.family", MaxNameLength).List("$.footprints", MaxFootprints);
        Footprint(t, "$.footprints[*]");
        return t.Build();
    }

    private static LimitTable BuildPartsMap()
    {
        var t = new Builder("parts map");
        t.Text("$.format", MaxNameLength);
        foreach (var group in new[] { "$.parts", "$.values" })
        {
            t.Map(group, MaxParts).Text($"{group}.*.footprint", MaxNameLength).Text($"{group}.*.variant", MaxNameLength).Text($"{group}.*.value", MaxValueLength)
                .Map($"{group}.*.pins", MaxLeadsPerPart).Text($"{group}.*.pins.*", MaxNameLength)
                .Map($"{group}.*.sections", 26).Map($"{group}.*.sections.*", MaxLeadsPerPart).Text($"{group}.*.sections.*.*", MaxNameLength)
                .Number($"{group}.*.ratedVoltage", RatedVoltage).Number($"{group}.*.ratedPower", RatedPower).Number($"{group}.*.ratedCurrent", RatedCurrent);
        }
        t.Map("$.nets", MaxNets);
        Net(t, "$.nets.*");
        return t.Build();
    }

    private static void Net(Builder t, string net) =>
        t.Text($"{net}.name", MaxNameLength).Text($"{net}.class", MaxNameLength).Text($"{net}.role", MaxNameLength)
            .Number($"{net}.voltage", Voltage).Number($"{net}.current", Current).Number($"{net}.maxLead", Size);

    private static void Footprint(Builder t, string f) =>
        t.Text($"{f}.name", MaxNameLength).Text($"{f}.family", MaxNameLength).Text($"{f}.mount", MaxNameLength)
            .Text($"{f}.description", MaxNoteLength).Text($"{f}.source", MaxNoteLength)
            .Number($"{f}.height", Size).Text($"{f}.shape", MaxNameLength).Number($"{f}.leadBend", new NumberRange(0, 1000, "mm"))
            .Text($"{f}.outsideLead", MaxNameLength)
            .Number($"{f}.ratedVoltage", RatedVoltage).Number($"{f}.ratedPower", RatedPower).Number($"{f}.ratedCurrent", RatedCurrent)
            .List($"{f}.body", 200).List($"{f}.body[*]", 2).Number($"{f}.body[*][*]", PartCoordinate)
            .List($"{f}.leads", MaxLeadsPerPart).Text($"{f}.leads[*].name", MaxNameLength)
            .List($"{f}.leads[*].exit", 2).Number($"{f}.leads[*].exit[*]", PartCoordinate)
            .Number($"{f}.leads[*].diameter", new NumberRange(0, 50, "mm", MinExclusive: true))
            .Number($"{f}.leads[*].minReach", Reach).Number($"{f}.leads[*].maxReach", Reach)
            .List($"{f}.variants", 50).Text($"{f}.variants[*].name", MaxNameLength)
            .List($"{f}.variants[*].pins", MaxLeadsPerPart).Text($"{f}.variants[*].pins[*]", MaxNameLength)
            .List($"{f}.marks", MaxLeadsPerPart).Text($"{f}.marks[*].kind", MaxNameLength).Text($"{f}.marks[*].lead", MaxNameLength);

    /// <summary>Collects one file kind's limits.</summary>
    private sealed class Builder(string kind)
    {
        private readonly Dictionary<string, NumberRange> _numbers = [];
        private readonly Dictionary<string, int> _items = [];
        private readonly Dictionary<string, int> _length = [];
        private readonly HashSet<string> _maps = [];

        public Builder Number(string path, NumberRange range) { _numbers.Add(path, range); return this; }
        public Builder List(string path, int maxItems) { _items.Add(path, maxItems); return this; }
        public Builder Map(string path, int maxItems) { _maps.Add(path); return List(path, maxItems); }
        public Builder Text(string path, int maxLength) { _length.Add(path, maxLength); return this; }

        public LimitTable Build() => new(kind, _numbers, _items, _length, _maps);
    }
}
