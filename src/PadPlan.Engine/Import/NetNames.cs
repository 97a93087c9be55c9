namespace PadPlan.Import;

/// <summary>Net-name conventions shared by both netlist formats.</summary>
public static class NetNames
{
    /// <summary>The name the ground net takes in a project imported from SPICE.</summary>
    public const string Ground = "GND";

    /// <summary>SPICE node 0, and "gnd" in any case, are the ground (the board's plane).</summary>
    public static bool IsGround(string name) => name == "0" || string.Equals(name, "gnd", StringComparison.OrdinalIgnoreCase);

    /// <summary>Names that say a net is the circuit's output: out, vout, output, or ending in _out (common practice, no source).</summary>
    public static bool LooksLikeOutput(string name)
    {
        var n = name.ToLowerInvariant();
        return n is "out" or "vout" or "output" or "v_out" || n.EndsWith("_out", StringComparison.Ordinal);
    }
}
