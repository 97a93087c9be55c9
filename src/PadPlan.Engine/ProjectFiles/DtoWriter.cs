using PadPlan.Model;

namespace PadPlan.ProjectFiles;

/// <summary>Turns model records into file DTOs. Values the reader would default are still written, so a file shows every setting in force.</summary>
internal static partial class DtoWriter
{
    public static ProjectDto Project(Project p) => new()
    {
        Format = ProjectFile.FormatTag,
        Name = p.Name,
        Description = string.IsNullOrEmpty(p.Description) ? null : p.Description,
        Board = Board(p.Board),
        Toolkit = Toolkit(p.Toolkit),
        Rules = Rules(p.Rules),
        FootprintDirs = p.FootprintDirs.Count == 0 ? null : [.. p.FootprintDirs],
        Nets = [.. p.Nets.Select(Net)],
        Parts = [.. p.Parts.Select(Part)],
        Footprints = [.. p.Footprints.Select(f => Footprint(f, includeFamily: true))],
        Layout = p.Layout is null ? null : Layout(p.Layout),
        Imported = p.Imported is null ? null : Imported(p.Imported),
    };

    private static BoardDto Board(Board b) => new()
    {
        Width = b.Width,
        Height = b.Height,
        CornerRadius = b.CornerRadius,
        Margin = b.Margin,
        Thickness = b.Thickness,
        Keepouts = [.. b.Keepouts.Select(k => k switch
        {
            CircleKeepout c => new ShapeDto { Id = c.Id, Shape = "circle", X = c.Center.X, Y = c.Center.Y, D = c.Diameter },
            RectKeepout r => new ShapeDto { Id = r.Id, Shape = "rect", X = r.Center.X, Y = r.Center.Y, W = r.Width, H = r.Height },
            _ => throw new InvalidOperationException($"unknown keep-out type {k.GetType().Name}"),
        })],
    };

    private static ToolkitDto Toolkit(Toolkit t) => new()
    {
        Punches = [.. t.PunchDiameters],
        StockThickness = t.StockThickness,
        Permittivity = t.StockPermittivity,
        StripWidths = [.. t.StripWidths],
        LeadCapacity = [.. t.LeadCapacities.Select(c => new LeadCapacityDto { PadSize = c.PadSize, Leads = c.MaxLeads })],
        LeadSpacing = t.LeadSpacing,
        StripPitch = t.StripPitch,
        ScoreWidth = t.ScoreWidth,
    };

    private static RulesDto Rules(RuleSettings r) => new()
    {
        PadGap = r.PadGap,
        GroundGap = r.GroundGap,
        LeadGap = r.LeadGap,
        MaxLeadRf = r.MaxLeadRf,
        MaxLeadAudio = r.MaxLeadAudio,
        MaxLeadGeneral = r.MaxLeadGeneral,
        MaxLeadPower = r.MaxLeadPower,
        MaxLeadHv = r.MaxLeadHv,
        AllowJumpers = r.AllowJumpers,
        TempRise = r.TempRise,
        CopperThickness = r.CopperThickness,
    };

    private static NetDto Net(Net n) => new()
    {
        Name = n.Name,
        Ground = n.Ground ? true : null,
        Class = n.Class.ToString().ToLowerInvariant(),
        Voltage = n.Voltage,
        VoltageEstimated = n.VoltageEstimated ? true : null,
        Current = n.Current,
        MaxLead = n.MaxLead,
        Role = n.Role == SignalRole.None ? null : n.Role.ToString().ToLowerInvariant(),
        OpenEnded = n.OpenEnded ? true : null,
    };

    private static PartDto Part(Part p)
    {
        var pins = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var pin in p.Pins) pins[pin.Pin] = pin.Net;
        return new PartDto
        {
            Ref = p.Ref,
            Value = p.Value,
            Footprint = p.Footprint,
            Variant = p.Variant,
            Pins = pins,
            Locked = p.Locked ? true : null,
            FootprintAssumed = p.FootprintAssumed ? true : null,
            RatedVoltage = p.Rating?.Volts,
            RatedPower = p.Rating?.Watts,
            RatedCurrent = p.Rating?.Amps,
        };
    }

    public static FootprintDto Footprint(Footprint f, bool includeFamily) => new()
    {
        Name = f.Name,
        Family = includeFamily && f.Family.Length > 0 ? f.Family : null,
        Description = f.Description,
        RatedVoltage = f.Rating.Volts,
        RatedPower = f.Rating.Watts,
        RatedCurrent = f.Rating.Amps,
        Mount = f.Mount.ToString().ToLowerInvariant(),
        Height = f.Height,
        Shape = f.Shape.ToString().ToLowerInvariant(),
        LeadBend = f.LeadBend,
        OutsideLead = f.OutsideLead,
        Source = f.Source,
        Body = [.. f.Body.Select(XY)],
        Leads = [.. f.Leads.Select(l => new FootprintLeadDto { Name = l.Name, Exit = XY(l.Exit), Diameter = l.Diameter, MinReach = l.MinReach, MaxReach = l.MaxReach })],
        Variants = f.Variants.Count == 0 ? null : [.. f.Variants.Select(v => new PinVariantDto { Name = v.Name, Pins = [.. v.Pins] })],
        Marks = f.Marks.Count == 0 ? null : [.. f.Marks.Select(m => new FootprintMarkDto { Kind = m.Kind.ToString().ToLowerInvariant(), Lead = m.Lead })],
    };

    private static LayoutDto Layout(Layout l) => new()
    {
        Pads = [.. l.Pads.Select(Pad)],
        Placements = [.. l.Placements.Select(p => new PlacementDto
        {
            Ref = p.Ref,
            X = p.Position.X,
            Y = p.Position.Y,
            Rotation = p.Rotation.Degrees(),
            Leads = [.. p.Leads.Select(lead => new LandingDto { Pin = lead.Pin, Pad = lead.Pad, X = lead.At.X, Y = lead.At.Y })],
        })],
        Jumpers = [.. l.Jumpers.Select(j => new JumperDto { Id = j.Id, From = j.From, To = j.To, Path = j.Path.Count == 0 ? null : [.. j.Path.Select(XY)] })],
    };

    private static PadDto Pad(Pad pad) => pad switch
    {
        RoundPad r => new PadDto { Id = r.Id, Shape = "round", Net = r.Net, X = r.Center.X, Y = r.Center.Y, D = r.Diameter, Stock = r.StockThickness, Locked = r.Locked ? true : null },
        RectPad r => new PadDto { Id = r.Id, Shape = "rect", Net = r.Net, X = r.Center.X, Y = r.Center.Y, W = r.Width, H = r.Height, Stock = r.StockThickness, Locked = r.Locked ? true : null },
        StripPad s => new PadDto
        {
            Id = s.Id, Shape = "strip", X = s.Start.X, Y = s.Start.Y, W = s.Width, Vertical = s.Vertical ? true : null, Score = s.ScoreWidth,
            Stock = s.StockThickness, Locked = s.Locked ? true : null,
            Segments = [.. s.Segments.Select(g => new SegmentDto { Id = g.Id, Net = g.Net, Length = g.Length })],
        },
        _ => throw new InvalidOperationException($"unknown pad type {pad.GetType().Name}"),
    };

    private static double[] XY(Point p) => [p.X, p.Y];
}
