using PadPlan.Model;

namespace PadPlan.Materials;

/// <summary>
/// Tells a part's kind from its reference letters (IEEE 315 / ASME Y14.44 class letters: R, C, L, T, D or CR, Q, U,
/// Y, F, J/P; from memory), falling back on the footprint's family and mount when the letters say nothing.
/// </summary>
public static class PartKinds
{
    private static readonly Dictionary<string, PartKind> Prefixes = new(StringComparer.OrdinalIgnoreCase)
    {
        ["R"] = PartKind.Resistor, ["RV"] = PartKind.Potentiometer, ["VR"] = PartKind.Potentiometer, ["POT"] = PartKind.Potentiometer,
        ["C"] = PartKind.Capacitor, ["VC"] = PartKind.Capacitor,
        ["L"] = PartKind.Inductor, ["FB"] = PartKind.FerriteBead,
        ["T"] = PartKind.Transformer,
        ["D"] = PartKind.Diode, ["CR"] = PartKind.Diode, ["LED"] = PartKind.Diode, ["ZD"] = PartKind.Diode,
        ["Q"] = PartKind.Transistor,
        ["U"] = PartKind.IntegratedCircuit, ["IC"] = PartKind.IntegratedCircuit,
        ["Y"] = PartKind.Crystal, ["XTAL"] = PartKind.Crystal,
        ["F"] = PartKind.Fuse,
        ["J"] = PartKind.Wire, ["P"] = PartKind.Wire, ["W"] = PartKind.Wire, ["CN"] = PartKind.Wire, ["X"] = PartKind.Wire,
    };

    private static readonly (string Word, PartKind Kind)[] Families =
    [
        ("landing", PartKind.Wire), ("resistor", PartKind.Resistor), ("capacitor", PartKind.Capacitor), ("inductor", PartKind.Inductor),
        ("choke", PartKind.Inductor), ("transformer", PartKind.Transformer), ("diode", PartKind.Diode), ("transistor", PartKind.Transistor),
        ("ic", PartKind.IntegratedCircuit), ("crystal", PartKind.Crystal), ("fuse", PartKind.Fuse),
    ];

    public static PartKind Of(Part part, Footprint? footprint)
    {
        var letters = new string(part.Ref.TakeWhile(char.IsAsciiLetter).ToArray());
        if (Prefixes.TryGetValue(letters, out var kind)) return kind;
        if (footprint is null) return PartKind.Other;
        if (footprint.Mount == MountStyle.Landing) return PartKind.Wire;
        foreach (var (word, k) in Families)
            if (footprint.Family.StartsWith(word, StringComparison.OrdinalIgnoreCase)) return k;
        return PartKind.Other;
    }

    /// <summary>The unit a bare value of this kind is in ("47k" on a resistor is 47 kΩ); empty when the kind has none.</summary>
    public static string UnitOf(PartKind kind) => kind switch
    {
        PartKind.Resistor or PartKind.Potentiometer => "Ω",
        PartKind.Capacitor => "F",
        PartKind.Inductor => "H",
        _ => "",
    };

    /// <summary>Kinds whose values follow IEC 60062 codes and IEC 60063 series.</summary>
    public static bool HasSeriesValue(PartKind kind) => kind is PartKind.Resistor or PartKind.Capacitor or PartKind.Inductor or PartKind.Potentiometer;

    /// <summary>A builder's word for the kind.</summary>
    public static string Name(PartKind kind) => kind switch
    {
        PartKind.FerriteBead => "ferrite bead",
        PartKind.IntegratedCircuit => "IC",
        PartKind.Wire => "wire landing",
        _ => kind.ToString().ToLowerInvariant(),
    };
}
