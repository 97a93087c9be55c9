using PadPlan.IO;
using PadPlan.Model;

namespace PadPlan.ProjectFiles;

/// <summary>Turns file DTOs into model records, naming the JSON path (and line) of anything missing or wrong.</summary>
internal sealed partial class DtoReader(string file, byte[] text)
{
    public InputException Fail(string path, string message) =>
        new(file, message, JsonLineLocator.LineOf(text, path), jsonPath: path);

    public T Need<T>(T? value, string path, string what) where T : struct =>
        value ?? throw Fail(path, $"missing {what}.");

    public string Need(string? value, string path, string what) =>
        !string.IsNullOrWhiteSpace(value) ? value : throw Fail(path, $"missing {what}.");

    public List<T> Need<T>(List<T>? value, string path, string what) =>
        value ?? throw Fail(path, $"missing {what} (a JSON list).");

    /// <summary>Runs a model constructor and reports its complaint at the given path.</summary>
    public T Build<T>(string path, Func<T> make)
    {
        try
        {
            return make();
        }
        catch (ArgumentException e)
        {
            throw Fail(path, StripParamName(e.Message));
        }
    }

    public Point Point(double[]? xy, string path, string what)
    {
        if (xy is null) throw Fail(path, $"missing {what}: give it as [x, y] in mm.");
        if (xy.Length != 2) throw Fail(path, $"{what} must be [x, y] (two numbers), found {xy.Length}.");
        return new Point(xy[0], xy[1]);
    }

    public TEnum Enum<TEnum>(string? value, string path, string what, TEnum fallback) where TEnum : struct, Enum
    {
        if (value is null) return fallback;
        if (System.Enum.TryParse<TEnum>(value, ignoreCase: true, out var parsed) && !int.TryParse(value, out _)) return parsed;
        var allowed = string.Join(", ", System.Enum.GetNames<TEnum>().Select(n => $"\"{n.ToLowerInvariant()}\""));
        throw Fail(path, $"{what} \"{value}\" is not known; use one of {allowed}.");
    }

    private static string StripParamName(string message)
    {
        var cut = message.IndexOf(" (Parameter '", StringComparison.Ordinal);
        message = cut >= 0 ? message[..cut] : message;
        var actual = message.IndexOf(Environment.NewLine + "Actual value was", StringComparison.Ordinal);
        return actual >= 0 ? message[..actual] : message;
    }

    public Board Board(BoardDto? dto, string path)
    {
        if (dto is null) return Model.Board.Auto;
        var keepouts = (dto.Keepouts ?? []).Select((k, i) => Keepout(k, $"{path}.keepouts[{i}]", i)).ToValueList();
        var margin = dto.Margin ?? 2.0;
        if (dto.Width is { } w && dto.Height is { } h && 2 * margin >= Math.Min(w, h))
            throw Fail($"{path}.margin", FormattableString.Invariant($"a margin of {margin} mm on each side leaves no room on a {w} x {h} mm board; it must be less than {Math.Min(w, h) / 2} mm."));
        return Build(path, () => new Board(dto.Width, dto.Height, dto.CornerRadius ?? 0, margin, dto.Thickness ?? 1.6, keepouts));
    }

    private Keepout Keepout(ShapeDto k, string path, int index)
    {
        var id = k.Id ?? $"K{index + 1}";
        var center = new Point(Need(k.X, $"{path}.x", "keep-out centre x"), Need(k.Y, $"{path}.y", "keep-out centre y"));
        return k.Shape?.ToLowerInvariant() switch
        {
            "circle" => Build(path, () => (Keepout)new CircleKeepout(id, center, Need(k.D, $"{path}.d", "keep-out diameter d"))),
            "rect" => Build(path, () => (Keepout)new RectKeepout(id, center, Need(k.W, $"{path}.w", "keep-out width w"), Need(k.H, $"{path}.h", "keep-out height h"))),
            _ => throw Fail($"{path}.shape", $"keep-out shape must be \"circle\" or \"rect\" (found {(k.Shape is null ? "nothing" : $"\"{k.Shape}\"")})."),
        };
    }

    public Toolkit Toolkit(ToolkitDto? dto, string path)
    {
        var d = Model.Toolkit.Default;
        if (dto is null) return d;
        var caps = dto.LeadCapacity?.Select((c, i) => Build($"{path}.leadCapacity[{i}]",
            () => new LeadCapacity(Need(c.PadSize, $"{path}.leadCapacity[{i}].padSize", "pad size"), Need(c.Leads, $"{path}.leadCapacity[{i}].leads", "lead count")))).ToValueList();
        return Build(path, () => new Toolkit(
            dto.Punches?.ToValueList() ?? d.PunchDiameters,
            dto.StockThickness ?? d.StockThickness,
            dto.Permittivity ?? d.StockPermittivity,
            dto.StripWidths?.ToValueList() ?? d.StripWidths,
            caps ?? d.LeadCapacities,
            dto.LeadSpacing ?? d.LeadSpacing,
            dto.StripPitch ?? d.StripPitch,
            dto.ScoreWidth ?? d.ScoreWidth));
    }

    public RuleSettings Rules(RulesDto? dto, string path)
    {
        var d = RuleSettings.Default;
        if (dto is null) return d;
        var rules = new RuleSettings
        {
            PadGap = dto.PadGap ?? d.PadGap,
            GroundGap = dto.GroundGap ?? d.GroundGap,
            LeadGap = dto.LeadGap ?? d.LeadGap,
            MaxLeadRf = dto.MaxLeadRf ?? d.MaxLeadRf,
            MaxLeadAudio = dto.MaxLeadAudio ?? d.MaxLeadAudio,
            MaxLeadGeneral = dto.MaxLeadGeneral ?? d.MaxLeadGeneral,
            MaxLeadPower = dto.MaxLeadPower ?? d.MaxLeadPower,
            MaxLeadHv = dto.MaxLeadHv ?? d.MaxLeadHv,
            AllowJumpers = dto.AllowJumpers ?? d.AllowJumpers,
            TempRise = dto.TempRise ?? d.TempRise,
            CopperThickness = dto.CopperThickness ?? d.CopperThickness,
        };
        foreach (var (name, value) in new[] { ("padGap", rules.PadGap), ("groundGap", rules.GroundGap), ("leadGap", rules.LeadGap), ("tempRise", rules.TempRise), ("copperThickness", rules.CopperThickness) })
            if (!(value >= 0) || !double.IsFinite(value)) throw Fail($"{path}.{name}", $"{name} must be zero or more (got {value}).");
        foreach (var (name, value) in new[] { ("maxLeadRf", rules.MaxLeadRf), ("maxLeadAudio", rules.MaxLeadAudio), ("maxLeadGeneral", rules.MaxLeadGeneral), ("maxLeadPower", rules.MaxLeadPower), ("maxLeadHv", rules.MaxLeadHv) })
            if (!(value > 0) || !double.IsFinite(value)) throw Fail($"{path}.{name}", $"{name} must be a positive length in mm (got {value}).");
        return rules;
    }

    public Net Net(NetDto n, string path) => Build(path, () => new Net(
        Need(n.Name, $"{path}.name", "net name"),
        n.Ground ?? false,
        Enum(n.Class, $"{path}.class", "net class", NetClass.General),
        n.Voltage,
        n.VoltageEstimated ?? false,
        n.Current,
        n.MaxLead,
        Enum(n.Role, $"{path}.role", "signal role", SignalRole.None),
        n.OpenEnded ?? false));

    public Part Part(PartDto p, string path)
    {
        var reference = Need(p.Ref, $"{path}.ref", "part reference (e.g. \"R1\")");
        var pins = Need(p.Pins?.ToList(), $"{path}.pins", "pin map (an object of pin name to net name)")
            .Select(kv => Build($"{path}.pins.{kv.Key}", () => new PinNet(kv.Key, kv.Value))).ToValueList();
        var rating = p.RatedVoltage is null && p.RatedPower is null && p.RatedCurrent is null ? null : Rating(p.RatedVoltage, p.RatedPower, p.RatedCurrent, path);
        return Build(path, () => new Part(reference, p.Value ?? "", Need(p.Footprint, $"{path}.footprint", "footprint name"), pins, p.Variant, p.Locked ?? false, p.FootprintAssumed ?? false, rating));
    }

    /// <summary>A rating from its three optional figures (V, W, A), each checked to be above zero.</summary>
    public Rating Rating(double? volts, double? watts, double? amps, string path) => Build(path, () => new Rating(volts, watts, amps));

    public Footprint Footprint(FootprintDto f, string path, string? family = null)
    {
        var name = Need(f.Name, $"{path}.name", "footprint name");
        var body = Need(f.Body, $"{path}.body", "body outline").Select((xy, i) => Point(xy, $"{path}.body[{i}]", "body point")).ToValueList();
        var leads = Need(f.Leads, $"{path}.leads", "lead list").Select((l, i) =>
        {
            var lp = $"{path}.leads[{i}]";
            return Build(lp, () => new FootprintLead(
                Need(l.Name, $"{lp}.name", "lead name"),
                Point(l.Exit, $"{lp}.exit", "lead exit point"),
                Need(l.Diameter, $"{lp}.diameter", "lead diameter"),
                Need(l.MinReach, $"{lp}.minReach", "minimum reach"),
                Need(l.MaxReach, $"{lp}.maxReach", "maximum reach")));
        }).ToValueList();
        var variants = (f.Variants ?? []).Select((v, i) => Build($"{path}.variants[{i}]",
            () => new PinVariant(Need(v.Name, $"{path}.variants[{i}].name", "variant name"), Need(v.Pins, $"{path}.variants[{i}].pins", "variant pin list").ToValueList()))).ToValueList();
        var marks = (f.Marks ?? []).Select((m, i) =>
        {
            var mp = $"{path}.marks[{i}]";
            var kind = Enum(Need(m.Kind, $"{mp}.kind", "mark kind"), $"{mp}.kind", "mark kind", MarkKind.Dot);
            return Build(mp, () => new FootprintMark(kind, Need(m.Lead, $"{mp}.lead", "lead name the mark sits at")));
        }).ToValueList();
        var mount = Enum(Need(f.Mount, $"{path}.mount", "mount style"), $"{path}.mount", "mount style", MountStyle.Axial);
        var rating = Rating(f.RatedVoltage, f.RatedPower, f.RatedCurrent, path);
        BodyShape? shape = f.Shape is null ? null : Enum(f.Shape, $"{path}.shape", "body shape", BodyShape.Box);
        return Build(path, () => new Footprint(name, f.Family ?? family ?? "", f.Description ?? "", body, Need(f.Height, $"{path}.height", "body height"), leads, mount, f.Source ?? "", variants, marks,
            shape, f.LeadBend, f.OutsideLead) { Rating = rating });
    }

    public Layout Layout(LayoutDto l, string path)
    {
        var pads = (l.Pads ?? []).Select((p, i) => Pad(p, $"{path}.pads[{i}]")).ToValueList();
        var placements = (l.Placements ?? []).Select((p, i) =>
        {
            var pp = $"{path}.placements[{i}]";
            var degrees = p.Rotation ?? 0;
            if (!Rotations.TryFromDegrees(degrees, out var rotation)) throw Fail($"{pp}.rotation", $"rotation must be 0, 90, 180 or 270 degrees (got {degrees}).");
            var leads = (p.Leads ?? []).Select((lead, j) =>
            {
                var lp = $"{pp}.leads[{j}]";
                return Build(lp, () => new LeadLanding(Need(lead.Pin, $"{lp}.pin", "lead pin"), lead.Pad,
                    new Point(Need(lead.X, $"{lp}.x", "landing x"), Need(lead.Y, $"{lp}.y", "landing y"))));
            }).ToValueList();
            return Build(pp, () => new Placement(Need(p.Ref, $"{pp}.ref", "part reference"),
                new Point(Need(p.X, $"{pp}.x", "part x"), Need(p.Y, $"{pp}.y", "part y")), rotation, leads));
        }).ToValueList();
        var jumpers = (l.Jumpers ?? []).Select((j, i) =>
        {
            var jp = $"{path}.jumpers[{i}]";
            var route = (j.Path ?? []).Select((xy, k) => Point(xy, $"{jp}.path[{k}]", "jumper bend point")).ToValueList();
            return Build(jp, () => new Jumper(Need(j.Id, $"{jp}.id", "jumper id"), Need(j.From, $"{jp}.from", "jumper start pad"), Need(j.To, $"{jp}.to", "jumper end pad"), route));
        }).ToValueList();
        return new Layout(pads, placements, jumpers);
    }

    private Pad Pad(PadDto p, string path)
    {
        var id = Need(p.Id, $"{path}.id", "pad id");
        var at = new Point(Need(p.X, $"{path}.x", "pad x"), Need(p.Y, $"{path}.y", "pad y"));
        var stock = p.Stock ?? 1.6;
        var locked = p.Locked ?? false;
        return p.Shape?.ToLowerInvariant() switch
        {
            "round" => Build(path, () => (Pad)new RoundPad(id, p.Net, at, Need(p.D, $"{path}.d", "pad diameter d"), stock, locked)),
            "rect" => Build(path, () => (Pad)new RectPad(id, p.Net, at, Need(p.W, $"{path}.w", "pad width w"), Need(p.H, $"{path}.h", "pad height h"), stock, locked)),
            "strip" => Build(path, () => (Pad)new StripPad(id, at, p.Vertical ?? false, Need(p.W, $"{path}.w", "strip width w"),
                Need(p.Segments, $"{path}.segments", "segment list").Select((s, i) => Build($"{path}.segments[{i}]",
                    () => new StripSegment(Need(s.Id, $"{path}.segments[{i}].id", "segment id"), s.Net, Need(s.Length, $"{path}.segments[{i}].length", "segment length")))).ToValueList(),
                p.Score ?? 0.6, stock, locked)),
            _ => throw Fail($"{path}.shape", $"pad shape must be \"round\", \"rect\" or \"strip\" (found {(p.Shape is null ? "nothing" : $"\"{p.Shape}\"")})."),
        };
    }
}
