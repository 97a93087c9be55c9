namespace PadPlan.Model.Values;

/// <summary>How a scale letter after a number is read.</summary>
public enum ValueSyntax
{
    /// <summary>Case-sensitive SI: "M" is mega, "m" is milli (PadPlan's own netlists, BOM text).</summary>
    SI,
    /// <summary>SPICE: case-insensitive; "m" and "M" are milli, "meg" is mega.</summary>
    Spice,
}
