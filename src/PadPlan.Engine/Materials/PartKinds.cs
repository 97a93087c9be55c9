using PadPlan.Model;

namespace PadPlan.Materials;

/// <summary>
/// Tells a part's kind from its reference letters (IEEE 315 / ASME Y14.44 class letters: R, C, L, T, D or CR, Q, U,
/// Y, F, J/P; from memory) and its footprint together: a landing footprint is wire landings and nothing else is; a
/// crystal or trimmer footprint names the part whatever its letter; letters that only say "connector" or "SPICE
/// subcircuit" (X, J, P, W) give way to the footprint's family.
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
        ("ic", PartKind.IntegratedCircuit), ("crystal", PartKind.Crystal), ("fuse", PartKind.Fuse), ("trimmer", PartKind.Potentiometer),
        ("generic", PartKind.IntegratedCircuit), ("led", PartKind.Diode),
    ];

    public static PartKind Of(Part part, Footprint? footprint)
    {
        if (footprint?.Mount == MountStyle.Landing) return PartKind.Wire;
        var letters = new string(part.Ref.TakeWhile(char.IsAsciiLetter).ToArray());
        var byLetters = Prefixes.TryGetValue(letters, out var kind) ? kind : PartKind.Other;
        var byFamily = footprint is null ? PartKind.Other : FromFamily(footprint, byLetters);
        // the footprint is the physical part: it wins where it is specific, and where the letters only name a connector or a call
        if (byFamily is PartKind.Crystal or PartKind.Potentiometer or PartKind.TrimmerCapacitor) return byFamily;
        if (byLetters is PartKind.Wire or PartKind.Other) return byFamily == PartKind.Wire || footprint is null && byLetters == PartKind.Wire ? PartKind.Other : byFamily;
        return byLetters;
    }

    private static PartKind FromFamily(Footprint footprint, PartKind byLetters)
    {
        foreach (var (word, k) in Families)
        {
            if (!footprint.Family.StartsWith(word, StringComparison.OrdinalIgnoreCase)) continue;
            // a trimmer footprint holds a trimmer capacitor when the footprint or the letter says capacitor
            if (k == PartKind.Potentiometer && (byLetters == PartKind.Capacitor || footprint.Name.Contains("cap", StringComparison.OrdinalIgnoreCase))) return PartKind.TrimmerCapacitor;
            return k;
        }
        return PartKind.Other;
    }

    /// <summary>The unit a bare value of this kind is in ("47k" on a resistor is 47 kΩ); empty when the kind has none.</summary>
    public static string UnitOf(PartKind kind) => kind switch
    {
        PartKind.Resistor or PartKind.Potentiometer => "Ω",
        PartKind.Capacitor or PartKind.TrimmerCapacitor => "F",
        PartKind.Inductor => "H",
        _ => "",
    };

    /// <summary>Kinds whose values follow IEC 60062 codes and IEC 60063 series.</summary>
    public static bool HasSeriesValue(PartKind kind) => kind is PartKind.Resistor or PartKind.Capacitor or PartKind.Inductor or PartKind.Potentiometer or PartKind.TrimmerCapacitor;

    /// <summary>A builder's word for the kind.</summary>
    public static string Name(PartKind kind) => kind switch
    {
        PartKind.FerriteBead => "ferrite bead",
        PartKind.TrimmerCapacitor => "trimmer capacitor",
        PartKind.IntegratedCircuit => "IC",
        PartKind.Wire => "wire landing",
        _ => kind.ToString().ToLowerInvariant(),
    };
}
