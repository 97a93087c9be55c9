
namespace PadPlan.Model;

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
        ["R"] = PartKind.Resistor, ["RV"] = PartKind.Trimmer, ["VR"] = PartKind.Trimmer, ["POT"] = PartKind.Trimmer,
        ["C"] = PartKind.Capacitor, ["VC"] = PartKind.Capacitor,
        ["L"] = PartKind.Inductor, ["FB"] = PartKind.FerriteBead,
        ["T"] = PartKind.Transformer,
        ["D"] = PartKind.Diode, ["CR"] = PartKind.Diode, ["LED"] = PartKind.Led, ["ZD"] = PartKind.Diode,
        ["Q"] = PartKind.Bjt, ["M"] = PartKind.Mosfet,
        ["U"] = PartKind.Subcircuit, ["IC"] = PartKind.Subcircuit,
        ["Y"] = PartKind.Crystal, ["XTAL"] = PartKind.Crystal,
        ["F"] = PartKind.Fuse,
        ["J"] = PartKind.Landing, ["P"] = PartKind.Landing, ["W"] = PartKind.Landing, ["CN"] = PartKind.Landing, ["X"] = PartKind.Landing,
    };

    private static readonly (string Word, PartKind Kind)[] Families =
    [
        ("landing", PartKind.Landing), ("resistor", PartKind.Resistor), ("capacitor", PartKind.Capacitor), ("inductor", PartKind.Inductor),
        ("choke", PartKind.Inductor), ("transformer", PartKind.Transformer), ("diode", PartKind.Diode), ("transistor", PartKind.Bjt),
        ("ic", PartKind.Subcircuit), ("crystal", PartKind.Crystal), ("fuse", PartKind.Fuse), ("trimmer", PartKind.Trimmer),
        ("generic", PartKind.Subcircuit), ("led", PartKind.Led),
    ];

    public static PartKind Of(Part part, Footprint? footprint) => Refined(part, Broad(part, footprint));

    // Letters and footprints say "transistor" or "diode"; the pins and the value say which: B/C/E is a BJT, D/G/S a
    // field-effect transistor (a MOSFET when it has a bulk pin or says MOS, else a JFET); a diode that says LED is one.
    private static PartKind Refined(Part part, PartKind kind)
    {
        bool Has(string pin) => part.Pins.Any(p => p.Pin.Equals(pin, StringComparison.OrdinalIgnoreCase));
        bool Says(string word) => part.Value.Contains(word, StringComparison.OrdinalIgnoreCase);
        return kind switch
        {
            PartKind.Bjt or PartKind.Jfet or PartKind.Mosfet when Has("G") && Has("D") =>
                Has("B") || Says("MOS") || kind == PartKind.Mosfet ? PartKind.Mosfet : PartKind.Jfet,
            PartKind.Mosfet when Has("B") && Has("C") => PartKind.Bjt,
            PartKind.Diode when Says("LED") => PartKind.Led,
            _ => kind,
        };
    }

    private static PartKind Broad(Part part, Footprint? footprint)
    {
        if (footprint?.Mount == MountStyle.Landing) return PartKind.Landing;
        var letters = new string(part.Ref.TakeWhile(char.IsAsciiLetter).ToArray());
        var byLetters = Prefixes.TryGetValue(letters, out var kind) ? kind : PartKind.Other;
        var byFamily = footprint is null ? PartKind.Other : FromFamily(footprint, byLetters);
        // the footprint is the physical part: it wins where it is specific, and where the letters only name a connector or a call
        if (byFamily is PartKind.Crystal or PartKind.Trimmer or PartKind.TrimmerCap) return byFamily;
        if (byLetters is PartKind.Landing or PartKind.Other) return byFamily == PartKind.Landing || footprint is null && byLetters == PartKind.Landing ? PartKind.Other : byFamily;
        return byLetters;
    }

    private static PartKind FromFamily(Footprint footprint, PartKind byLetters)
    {
        foreach (var (word, k) in Families)
        {
            if (!footprint.Family.StartsWith(word, StringComparison.OrdinalIgnoreCase)) continue;
            // a trimmer footprint holds a trimmer capacitor when the footprint or the letter says capacitor
            if (k == PartKind.Trimmer && (byLetters == PartKind.Capacitor || footprint.Name.Contains("cap", StringComparison.OrdinalIgnoreCase))) return PartKind.TrimmerCap;
            return k;
        }
        return PartKind.Other;
    }

    /// <summary>The unit a bare value of this kind is in ("47k" on a resistor is 47 kΩ); empty when the kind has none.</summary>
    public static string UnitOf(PartKind kind) => kind switch
    {
        PartKind.Resistor or PartKind.Trimmer => "Ω",
        PartKind.Capacitor or PartKind.TrimmerCap => "F",
        PartKind.Inductor => "H",
        _ => "",
    };

    /// <summary>Kinds whose values follow IEC 60062 codes and IEC 60063 series.</summary>
    public static bool HasSeriesValue(PartKind kind) => kind is PartKind.Resistor or PartKind.Capacitor or PartKind.Inductor or PartKind.Trimmer or PartKind.TrimmerCap;

    /// <summary>A builder's word for the kind.</summary>
    public static string Name(PartKind kind) => kind switch
    {
        PartKind.FerriteBead => "ferrite bead",
        PartKind.Subcircuit => "IC",
        PartKind.Landing => "wire landing",
        PartKind.Trimmer => "potentiometer",
        PartKind.TrimmerCap => "trimmer capacitor",
        PartKind.Led => "LED",
        PartKind.Bjt or PartKind.Jfet or PartKind.Mosfet => "transistor",
        _ => kind.ToString().ToLowerInvariant(),
    };
}
