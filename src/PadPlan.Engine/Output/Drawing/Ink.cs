using System.Globalization;

namespace PadPlan.Output.Drawing;

/// <summary>An opaque RGB colour.</summary>
public readonly record struct Ink(byte R, byte G, byte B)
{
    public static Ink Black { get; } = new(0, 0, 0);
    public static Ink White { get; } = new(255, 255, 255);

    /// <summary>Parses "#rrggbb".</summary>
    public static Ink Hex(string hex)
    {
        if (hex.Length != 7 || hex[0] != '#') throw new ArgumentException($"colour '{hex}' is not of the form #rrggbb.", nameof(hex));
        var v = int.Parse(hex.AsSpan(1), NumberStyles.HexNumber, CultureInfo.InvariantCulture);
        return new((byte)(v >> 16), (byte)(v >> 8), (byte)v);
    }

    /// <summary>A grey of the given lightness (0 black, 1 white).</summary>
    public static Ink Grey(double lightness)
    {
        var v = (byte)Math.Round(Math.Clamp(lightness, 0, 1) * 255);
        return new(v, v, v);
    }

    /// <summary>This colour mixed toward white: 0 keeps it, 1 gives white. Used for pale fills under dark outlines.</summary>
    public Ink Tint(double toWhite) => new(Mix(R, toWhite), Mix(G, toWhite), Mix(B, toWhite));

    /// <summary>Relative lightness as a printer's greyscale would see it (Rec. 709 luma weights), 0 to 1.</summary>
    public double Luma => (0.2126 * R + 0.7152 * G + 0.0722 * B) / 255.0;

    public string ToHex() => FormattableString.Invariant($"#{R:x2}{G:x2}{B:x2}");

    private static byte Mix(byte c, double t) => (byte)Math.Round(c + (255 - c) * Math.Clamp(t, 0, 1));
}
