namespace PadPlan.Materials;

/// <summary>A pair of nets that a continuity tester may find joined through parts, and why; a junction path says which net is the anode and what a meter's diode mode reads.</summary>
public sealed record DcPath(string NetA, string NetB, DcReading Reading, double? Ohms, string Through, string Note, DcJunction? Junction = null);

/// <summary>
/// A semiconductor junction between two nets as a meter's diode mode sees it (about 1 mA): the net on the anode side
/// (red probe, + for a forward reading), the cathode side, and the forward drop's usual range in volts.
/// </summary>
/// <remarks>BothWays: another junction the opposite way round joins the same pair, so it reads as a diode either way.</remarks>
public sealed record DcJunction(string Anode, string Cathode, JunctionKind Kind, bool BothWays = false)
{
    public (double Low, double High) Range => JunctionKinds.Range(Kind);
}

/// <summary>What a junction is made of, which sets its diode-mode reading.</summary>
public enum JunctionKind { Silicon, Germanium, Schottky, RedLed, BlueLed }

/// <summary>
/// Diode-mode readings at about 1 mA, facts of the trade (common practice, no single source; values from memory):
/// silicon 0.5-0.7 V, germanium 0.2-0.35 V, Schottky 0.15-0.45 V, red LED 1.6-2.0 V, blue or white LED 2.7-3.3 V
/// (often above the meter's range, so it may read open).
/// </summary>
public static class JunctionKinds
{
    public static (double Low, double High) Range(JunctionKind kind) => kind switch
    {
        JunctionKind.Germanium => (0.2, 0.35),
        JunctionKind.Schottky => (0.15, 0.45),
        JunctionKind.RedLed => (1.6, 2.0),
        JunctionKind.BlueLed => (2.7, 3.3),
        _ => (0.5, 0.7),
    };

    public static string Name(JunctionKind kind) => kind switch
    {
        JunctionKind.Germanium => "germanium",
        JunctionKind.Schottky => "Schottky",
        JunctionKind.RedLed => "LED",
        JunctionKind.BlueLed => "blue or white LED",
        _ => "silicon",
    };
}
