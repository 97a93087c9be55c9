using PadPlan.Model.Values;

namespace PadPlan.Model;

/// <summary>A part's value read as a number where it is one (IEC 60062 code or SI prefix), with the unit its kind implies.</summary>
public static class PartValue
{
    /// <summary>The value as a number with unit, or null when the text is a description ("NPN small-signal").</summary>
    public static ComponentValue? Read(Part part, PartKind kind)
    {
        if (!ComponentValue.TryParse(part.Value, ValueSyntax.SI, out var value, out _)) return null;
        return value.Unit.Length == 0 ? value with { Unit = PartKinds.UnitOf(kind) } : value;
    }

    /// <summary>Ohms of a resistor's value, or null when the part is not a resistor with a readable value.</summary>
    public static double? Ohms(Part part, PartKind kind) =>
        kind == PartKind.Resistor && Read(part, kind) is { Unit: "Ω" } v ? v.Number : null;

    /// <summary>The value as printed: normalised engineering text for numbers, the text as given otherwise.</summary>
    public static string Display(Part part, PartKind kind) => Read(part, kind)?.ToDisplay() ?? part.Value.Trim();
}
