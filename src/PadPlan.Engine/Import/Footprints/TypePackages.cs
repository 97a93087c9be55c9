using System.Globalization;
using System.Text.RegularExpressions;

namespace PadPlan.Import;

/// <summary>
/// The library package a semiconductor is made in, read from the type number in its SPICE model name (D1N4001, Q2N4401,
/// MIRF510, BD139), so that it fits the board and its current and power are judged against the right rating. The packages
/// are the makers' data sheets' for these JEDEC and European types, from memory; a type not listed gives null, and the
/// importer then assumes the small package and says so.
/// </summary>
public static partial class TypePackages
{
    private const string Do35 = "diode-glass-do35", Do41 = "diode-plastic-do41", Do201 = "diode-plastic-do201";

    /// <summary>
    /// 1N4001-1N4007 and 1N5817-1N5819 on DO-41 (1 A), 1N5400-1N5408 and 1N5820-1N5822 on DO-201AD (3 A), the 1 W zeners
    /// 1N4728-1N4764 and the BZX85 on DO-41; the small-signal 1N914, 1N916, 1N4148, 1N4150 and 1N4448, the 0.5 W zeners
    /// 1N5221-1N5281 and the BZX55 and BZX79 on DO-35.
    /// </summary>
    public static string? Diode(string model)
    {
        var name = model.ToUpperInvariant();
        if (Bzx().Match(name) is { Success: true } bzx) return bzx.Groups[1].Value == "85" ? Do41 : Do35;
        if (Jedec().Match(name) is not { Success: true } jedec) return null;
        return int.Parse(jedec.Groups[1].Value, CultureInfo.InvariantCulture) switch
        {
            >= 4001 and <= 4007 or >= 5817 and <= 5819 or >= 4728 and <= 4764 => Do41,
            >= 5400 and <= 5408 or >= 5820 and <= 5822 => Do201,
            914 or 916 or 4148 or 4150 or 4448 or >= 5221 and <= 5281 => Do35,
            _ => null,
        };
    }

    /// <summary>
    /// TO-220: the TIP29-TIP42 and TIP120-TIP127 families, BD241-BD244, MJE3055T and MJE2955T, and the MOSFETs IRF510-IRF540,
    /// IRF9540, IRF610-IRF640, IRF740, IRF840, IRFZ24-IRFZ44 and IRL520, IRL540. TO-126: BD135-BD140, MJE340, MJE350. TO-92:
    /// 2N4401, 2N4403, 2N5401, 2N5551, PN2222A, PN2907A, BC546-BC560, MPSA13, MPSA14, MPSA42, MPSA92, the
    /// MOSFETs 2N7000 and BS170, and the JFETs J309, J310, MPF102 and 2N5457-2N5459, 2N5484-2N5486.
    /// </summary>
    public static string? Transistor(string model)
    {
        var name = model.ToUpperInvariant();
        if (To220().IsMatch(name)) return "to220";
        if (To126().IsMatch(name)) return "to126";
        if (To92().IsMatch(name)) return "to92";
        return null;
    }

    [GeneratedRegex(@"BZX(55|79|85)")]
    private static partial Regex Bzx();

    [GeneratedRegex(@"1N(\d{3,4})(?!\d)")]
    private static partial Regex Jedec();

    [GeneratedRegex(@"TIP(29|30|31|32|41|42|120|121|122|125|126|127)[A-F]?(?![0-9])|BD24[1-4][A-C]?(?![0-9])|MJE(3055|2955)T|IRF(5[1-4]0|9540|6[1-4]0|740|840|Z[2-4]4N?)(?![0-9])|IRL5[24]0(?![0-9])")]
    private static partial Regex To220();

    [GeneratedRegex(@"BD1(3[5-9]|40)(?![0-9])|MJE3[45]0(?![0-9])")]
    private static partial Regex To126();

    [GeneratedRegex(@"2N(4401|4403|5401|5551|7000|545[7-9]|548[4-6])(?![0-9])|PN(2222|2907)A?(?![0-9])|BC5(4[6-9]|5[0-9]|60)(?![0-9])|MPSA(13|14|42|92)(?![0-9])|BS170(?![0-9])|J3(09|10)(?![0-9])|MPF102(?![0-9])")]
    private static partial Regex To92();
}
