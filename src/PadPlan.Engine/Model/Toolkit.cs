namespace PadPlan.Model;

/// <summary>How many leads one pad of a given size takes (DOMAIN §2: common practice, no source).</summary>
public sealed record LeadCapacity(double PadSize, int MaxLeads)
{
    public double PadSize { get; } = Guard.Positive(PadSize, "pad size");
    public int MaxLeads { get; } = MaxLeads > 0 ? MaxLeads : throw new ArgumentOutOfRangeException(nameof(MaxLeads), MaxLeads, "a pad must take at least one lead.");
}

/// <summary>What the builder has to make pads with: punches, pad stock and strip widths.</summary>
public sealed record Toolkit
{
    public Toolkit(ValueList<double> punchDiameters, double stockThickness, double stockPermittivity, ValueList<double> stripWidths, ValueList<LeadCapacity> leadCapacities, double leadSpacing = 2.54, double stripPitch = 2.54, double scoreWidth = 0.6)
    {
        if (punchDiameters.Count == 0) throw new ArgumentException("The toolkit needs at least one punch diameter.", nameof(punchDiameters));
        foreach (var d in punchDiameters) Guard.Positive(d, "punch diameter");
        foreach (var w in stripWidths) Guard.Positive(w, "strip width");
        if (leadCapacities.Count == 0) throw new ArgumentException("The toolkit needs a lead-capacity table.", nameof(leadCapacities));
        PunchDiameters = punchDiameters.OrderBy(d => d).ToValueList();
        StockThickness = Guard.Positive(stockThickness, "pad stock thickness");
        StockPermittivity = stockPermittivity >= 1 && double.IsFinite(stockPermittivity)
            ? stockPermittivity : throw new ArgumentOutOfRangeException(nameof(stockPermittivity), stockPermittivity, "relative permittivity must be 1 or more.");
        StripWidths = stripWidths.OrderBy(w => w).ToValueList();
        LeadCapacities = leadCapacities.OrderBy(c => c.PadSize).ToValueList();
        LeadSpacing = Guard.Positive(leadSpacing, "lead spacing");
        StripPitch = Guard.Positive(stripPitch, "strip pitch");
        ScoreWidth = Guard.Positive(scoreWidth, "score width");
    }

    /// <summary>Hand-punch diameters, smallest first (mm).</summary>
    public ValueList<double> PunchDiameters { get; init; }
    public double StockThickness { get; init; }
    /// <summary>Relative permittivity of the pad stock (FR-4 about 4.7 at 1 MHz).</summary>
    public double StockPermittivity { get; init; }
    /// <summary>Widths of strips the builder cuts for IC rows and rectangles (mm).</summary>
    public ValueList<double> StripWidths { get; init; }
    /// <summary>Leads per round pad by diameter, smallest first.</summary>
    public ValueList<LeadCapacity> LeadCapacities { get; init; }
    /// <summary>Room one lead needs along a rectangle or strip segment (mm); common practice, no source.</summary>
    public double LeadSpacing { get; init; }
    /// <summary>Segment pitch of scored strips for DIP rows (mm, JEDEC MS-001).</summary>
    public double StripPitch { get; init; }
    /// <summary>Width of the saw or knife score that isolates strip segments (mm).</summary>
    public double ScoreWidth { get; init; }

    /// <summary>Defaults from DOMAIN §1-2: the four usual punch steps, 1.6 mm FR-4 stock.</summary>
    public static Toolkit Default { get; } = new(
        ValueList.Of(3.18, 3.97, 4.76, 6.35),
        stockThickness: 1.6,
        stockPermittivity: 4.7,
        stripWidths: ValueList.Of(3.0, 5.0, 8.0),
        leadCapacities: ValueList.Of(new LeadCapacity(3.18, 2), new LeadCapacity(3.97, 2), new LeadCapacity(4.76, 3), new LeadCapacity(6.35, 4)));

    /// <summary>Leads a round pad of this diameter takes: the entry of the largest table size not above it (0.05 mm tolerance).</summary>
    public int RoundCapacity(double diameter)
    {
        var fit = LeadCapacities.LastOrDefault(c => c.PadSize <= diameter + 0.05);
        return fit?.MaxLeads ?? 1;
    }

    /// <summary>Leads a rectangle takes: one per lead spacing in each direction, and never fewer than two. Common practice, no source.</summary>
    public int RectCapacity(double width, double height) => Math.Max(2, LeadsOn(width, height));

    /// <summary>Leads a piece of copper takes side by side: one per lead spacing in each direction, at least one. Common practice, no source.</summary>
    public int LeadsOn(double width, double height) =>
        Math.Max(1, (int)Math.Floor(width / LeadSpacing + 1e-9)) * Math.Max(1, (int)Math.Floor(height / LeadSpacing + 1e-9));

    /// <summary>Leads one copper island takes: round pads by the table, rectangles and strip segments by <see cref="RectCapacity"/>.</summary>
    public int CapacityOf(Island island) => island.Shape == IslandShape.Round
        ? RoundCapacity(island.Width)
        : RectCapacity(island.Width, island.Height);
}
