namespace PadPlan.Model;

/// <summary>One symbol pin of a part and the net it joins.</summary>
public sealed record PinNet(string Pin, string Net)
{
    public string Pin { get; } = Guard.Name(Pin, "pin name");
    public string Net { get; } = Guard.Name(Net, "net name");
}

/// <summary>A component of the circuit: reference, value, footprint and the net of each pin.</summary>
/// <remarks>Rating, when given, is the part's own (from a parts map) and overrides its footprint's typical rating.</remarks>
public sealed record Part(string Ref, string Value, string Footprint, ValueList<PinNet> Pins, string? Variant = null, bool Locked = false, bool FootprintAssumed = false, Rating? Rating = null)
{
    public string Ref { get; } = Guard.Name(Ref, "part reference");
    public string Value { get; } = Value ?? "";
    public string Footprint { get; } = Guard.Name(Footprint, "footprint name");

    public string? NetOf(string pin) => Pins.FirstOrDefault(p => string.Equals(p.Pin, pin, StringComparison.OrdinalIgnoreCase))?.Net;
}
