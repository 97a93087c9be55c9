namespace PadPlan.Model;

/// <summary>How a part sits on the board, which decides how its leads reach pads.</summary>
public enum MountStyle
{
    /// <summary>Lies flat; leads leave the body ends and bend down to pads (resistors, diodes, axial chokes).</summary>
    Axial,
    /// <summary>Stands up; leads leave the underside and splay out to pads (capacitors, TO-92, crystals, LEDs).</summary>
    Upright,
    /// <summary>Sits on scored strips; each lead lands on the segment beneath it (DIP ICs).</summary>
    Strip,
    /// <summary>An off-board wire landing: each wire end lands on a pad near the edge.</summary>
    Landing,
}

/// <summary>One physical lead: where it leaves the body (footprint coordinates, part origin at 0,0) and how far it can reach.</summary>
public sealed record FootprintLead(string Name, Point Exit, double Diameter, double MinReach, double MaxReach)
{
    public string Name { get; } = Guard.Name(Name, "lead name");
    public Point Exit { get; } = Guard.Finite(Exit, "lead exit");
    public double Diameter { get; } = Guard.Positive(Diameter, "lead diameter");
    public double MinReach { get; } = Guard.NonNegative(MinReach, "minimum reach");
    public double MaxReach { get; } = MaxReach >= MinReach && double.IsFinite(MaxReach)
        ? MaxReach : throw new ArgumentOutOfRangeException(nameof(MaxReach), MaxReach, "maximum reach must be at least the minimum reach.");
}

/// <summary>A named pin order: the symbol pin name carried by each physical lead, in lead order (e.g. TO-92 "EBC").</summary>
public sealed record PinVariant(string Name, ValueList<string> Pins)
{
    public string Name { get; } = Guard.Name(Name, "variant name");
}

/// <summary>A printed mark the assembly view draws at one lead, so the builder can turn the part the right way.</summary>
public enum MarkKind
{
    /// <summary>Cathode band across the body at this lead's end (diodes; the flat side of an LED rim).</summary>
    Band,
    /// <summary>A "+" beside this lead (electrolytic capacitors).</summary>
    Plus,
    /// <summary>A dot inside the body beside this lead: pin 1 of an IC or a trimmer.</summary>
    Dot,
    /// <summary>A notch in the body edge at this lead's end: the pin-1 end of a DIP (JEDEC MS-001 index area).</summary>
    Notch,
    /// <summary>A dot where a winding starts at this wire end (toroids and transformers: the phasing dot).</summary>
    Winding,
}

/// <summary>One mark of a footprint and the lead it belongs to.</summary>
public sealed record FootprintMark(MarkKind Kind, string Lead)
{
    public string Lead { get; } = Guard.Name(Lead, "mark lead");
}

/// <summary>
/// What a part may take: the largest DC voltage across it (V), the power it may turn into heat (W) and the largest
/// forward current (A), each null when not known. Footprint figures are typical for the package, not for the part in hand.
/// </summary>
public sealed record Rating(double? Volts = null, double? Watts = null, double? Amps = null)
{
    public static Rating None { get; } = new();

    /// <summary>What builders are told wherever a footprint's typical rating is used.</summary>
    public const string TypicalWarning = "typical, check your part";

    public double? Volts { get; } = Guard.PositiveOrNull(Volts, "rated voltage");
    public double? Watts { get; } = Guard.PositiveOrNull(Watts, "rated power");
    public double? Amps { get; } = Guard.PositiveOrNull(Amps, "rated current");

    /// <summary>What a part is judged against: its own figures (from a parts map) where given, else its footprint's typical ones.</summary>
    public static Rating For(Part part, Footprint? footprint) => (part.Rating ?? None).Over(footprint?.Rating);

    /// <summary>This rating with the other's figures where the other gives them.</summary>
    public Rating Over(Rating? under) => under is null ? this : new(Volts ?? under.Volts, Watts ?? under.Watts, Amps ?? under.Amps);
}

/// <summary>A physical package: plan-view body, height, leads and pin orders.</summary>
public sealed record Footprint
{
    public Footprint(string name, string family, string description, ValueList<Point> body, double height, ValueList<FootprintLead> leads, MountStyle mount, string source, ValueList<PinVariant>? variants = null, ValueList<FootprintMark>? marks = null,
        BodyShape? shape = null, double? leadBend = null, string? outsideLead = null)
    {
        Name = Guard.Name(name, "footprint name");
        Family = family ?? "";
        Description = description ?? "";
        if (body.Count < 3) throw new ArgumentException($"Footprint {name}: the body outline needs at least three points.", nameof(body));
        Body = body;
        Height = Guard.Positive(height, "body height");
        if (leads.Count == 0) throw new ArgumentException($"Footprint {name} has no leads.", nameof(leads));
        var dup = leads.GroupBy(l => l.Name, StringComparer.Ordinal).FirstOrDefault(g => g.Count() > 1);
        if (dup is not null) throw new ArgumentException($"Footprint {name}: lead name '{dup.Key}' appears twice.", nameof(leads));
        Leads = leads;
        Mount = mount;
        Source = source ?? "";
        Variants = variants ?? ValueList<PinVariant>.Empty;
        foreach (var v in Variants)
            if (v.Pins.Count != leads.Count)
                throw new ArgumentException($"Footprint {name}: variant '{v.Name}' names {v.Pins.Count} pins for {leads.Count} leads.", nameof(variants));
        Marks = marks ?? ValueList<FootprintMark>.Empty;
        Shape = shape ?? DefaultShape(mount);
        LeadBend = leadBend is { } bend
            ? (double.IsFinite(bend) && bend >= 0 && bend <= Height ? bend
                : throw new ArgumentOutOfRangeException(nameof(leadBend), bend, $"Footprint {name}: the lead bend height must be from 0 to the body height ({Height} mm)."))
            : DefaultLeadBend(Shape, Height);
        if (outsideLead is not null && !leads.Any(l => string.Equals(l.Name, outsideLead, StringComparison.Ordinal)))
            throw new ArgumentException($"Footprint {name}: the outside lead '{outsideLead}' is not one of its leads; use one of {string.Join(", ", leads.Select(l => l.Name))}.", nameof(outsideLead));
        if (outsideLead is not null && mount != MountStyle.Upright)
            throw new ArgumentException($"Footprint {name}: only an upright part has a lead running down the outside of its body.", nameof(outsideLead));
        OutsideLead = outsideLead;
        foreach (var m in Marks)
            if (!leads.Any(l => string.Equals(l.Name, m.Lead, StringComparison.Ordinal)))
                throw new ArgumentException($"Footprint {name}: the {m.Kind.ToString().ToLowerInvariant()} mark names lead '{m.Lead}', which the footprint does not have; use one of {string.Join(", ", leads.Select(l => l.Name))}.", nameof(marks));
    }

    public string Name { get; init; }
    public string Family { get; init; }
    public string Description { get; init; }
    /// <summary>Body outline in plan view, footprint coordinates (mm), part origin at (0,0).</summary>
    public ValueList<Point> Body { get; init; }
    /// <summary>Height of the body's top above the surface the part stands on (the pad tops), mm.</summary>
    public double Height { get; init; }
    /// <summary>The body's solid in the 3D model.</summary>
    public BodyShape Shape { get; }
    /// <summary>Height above the pad tops where the leads leave the body and bend toward their pads, mm: the lead axis of a lying part, the underside of a standing one.</summary>
    public double LeadBend { get; }
    /// <summary>For an upright part mounted like a hairpin: the lead that leaves the top of the body and runs down its outside; null otherwise.</summary>
    public string? OutsideLead { get; }
    public ValueList<FootprintLead> Leads { get; init; }
    public MountStyle Mount { get; init; }
    /// <summary>Where the dimensions come from: a JEDEC outline, or "typical, common practice".</summary>
    public string Source { get; init; }
    public ValueList<PinVariant> Variants { get; init; }
    /// <summary>Polarity and orientation marks printed on the assembly view, each at a lead (by lead name).</summary>
    public ValueList<FootprintMark> Marks { get; init; }
    /// <summary>The package's typical rating (voltage, power, forward current); a part's own rating overrides it.</summary>
    public Rating Rating { get; init; } = Rating.None;

    /// <summary>Height of the body's underside above the pad tops, mm: a lying body is centred on its lead axis, any other sits on its lead bend.</summary>
    public double BodyBottom => Shape == BodyShape.Lying ? Math.Max(0, 2 * LeadBend - Height) : LeadBend;

    /// <summary>The shape a footprint without one is drawn as: its mount's usual body.</summary>
    public static BodyShape DefaultShape(MountStyle mount) => mount switch
    {
        MountStyle.Axial => BodyShape.Lying,
        MountStyle.Strip => BodyShape.Dip,
        MountStyle.Landing => BodyShape.Wires,
        _ => BodyShape.Box,
    };

    /// <summary>The lead bend height a footprint without one gets: the axis of a lying body, otherwise on the pad tops (the lowest a body can sit).</summary>
    public static double DefaultLeadBend(BodyShape shape, double height) => shape == BodyShape.Lying ? height / 2 : 0;

    /// <summary>What builders are told wherever a footprint's figures are nominal.</summary>
    public const string NominalWarning = "typical size, check your part";

    /// <summary>The figures are nominal, not a published outline: the source does not name a JEDEC outline, or says it is recalled from memory.</summary>
    public bool IsNominal => !Source.StartsWith("JEDEC", StringComparison.OrdinalIgnoreCase) || Source.Contains("from memory", StringComparison.OrdinalIgnoreCase);

    /// <summary>The symbol pins on a polarised part's + and - leads (the footprint marks the + lead: an electrolytic), or null.</summary>
    public (string Plus, string Minus)? PolarisedLeads(Part part)
    {
        var mark = Marks.FirstOrDefault(m => m.Kind == MarkKind.Plus);
        if (mark is null || Leads.Count != 2 || part.Pins.Count != 2) return null;
        var names = PinNames(part.Variant);
        var index = Leads.ToList().FindIndex(l => l.Name == mark.Lead);
        var plus = names[index];
        var minus = names[1 - index];
        return part.NetOf(plus) is null || part.NetOf(minus) is null ? null : (plus, minus);
    }

    /// <summary>The symbol pin name each lead carries, in lead order, for a variant (or the lead names when none is given).</summary>
    public IReadOnlyList<string> PinNames(string? variant)
    {
        if (string.IsNullOrEmpty(variant)) return Variants.Count > 0 ? Variants[0].Pins : Leads.Select(l => l.Name).ToList();
        var v = Variants.FirstOrDefault(x => string.Equals(x.Name, variant, StringComparison.OrdinalIgnoreCase))
            ?? throw new ArgumentException($"Footprint {Name} has no pin-order variant '{variant}'; it has {string.Join(", ", Variants.Select(x => x.Name))}.", nameof(variant));
        return v.Pins;
    }

    /// <summary>The lead that carries a symbol pin under a variant, or null when no lead does.</summary>
    public FootprintLead? LeadForPin(string pin, string? variant)
    {
        var names = PinNames(variant);
        for (var i = 0; i < names.Count; i++)
            if (string.Equals(names[i], pin, StringComparison.OrdinalIgnoreCase)) return Leads[i];
        return null;
    }
}
