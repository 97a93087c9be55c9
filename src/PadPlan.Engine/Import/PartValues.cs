using PadPlan.Model;
using PadPlan.Model.Values;

namespace PadPlan.Import;

/// <summary>Reads the value of a resistor, capacitor or inductor and gives the BOM its IEC 60062 code.</summary>
public static class PartValues
{
    /// <summary>Whether a part of this kind carries a number (ohms, farads, henries) that must parse.</summary>
    public static bool HasNumber(PartKind kind) => kind is PartKind.Resistor or PartKind.Capacitor or PartKind.Inductor or PartKind.Trimmer or PartKind.TrimmerCap;

    public static string UnitOf(PartKind kind) => kind switch
    {
        PartKind.Resistor or PartKind.Trimmer => "Ω",
        PartKind.Capacitor or PartKind.TrimmerCap => "F",
        PartKind.Inductor => "H",
        _ => "",
    };

    /// <summary>Parses a value; on success gives the number (with its kind's unit) and BOM text such as "4k7" or "100n".</summary>
    public static bool TryRead(PartKind kind, string text, ValueSyntax syntax, out ComponentValue value, out string display, out string error)
    {
        display = text;
        if (!ComponentValue.TryParse(text, syntax, out value, out error)) return false;
        var unit = UnitOf(kind);
        if (value.Unit.Length > 0 && value.Unit != unit)
        {
            error = $"\"{text}\" is in {value.Unit}, but a {kind.ToString().ToLowerInvariant()} value is in {unit}.";
            return false;
        }
        if (!(value.Number > 0))
        {
            error = $"\"{text}\": a {kind.ToString().ToLowerInvariant()} value must be more than zero.";
            return false;
        }
        value = value with { Unit = unit };
        // The IEC code without the unit letter, as builders write it on a BOM: 4k7, 100n, 2u2, R47.
        display = value.ToIecCode();
        return true;
    }
}
