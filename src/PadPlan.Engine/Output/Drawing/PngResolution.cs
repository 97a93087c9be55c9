using System.Buffers.Binary;

namespace PadPlan.Output.Drawing;

/// <summary>
/// Writes and reads the PNG pHYs chunk, which tells printing programs how large a pixel is, so a preview prints at its
/// true size. PNG specification (ISO/IEC 15948:2004, 11.3.5.3 pHYs): 4-byte pixels per unit X, 4-byte pixels per unit
/// Y, 1-byte unit (1 = metre); the chunk comes before the first IDAT.
/// </summary>
public static class PngResolution
{
    /// <summary>Pixels per metre for a resolution in dots per inch (25.4 mm to the inch), rounded to the nearest whole pixel.</summary>
    public static uint PixelsPerMetre(double dpi) => (uint)Math.Round(dpi / 0.0254);

    /// <summary>The PNG with a pHYs chunk at the given resolution put straight after IHDR (any pHYs already there is dropped).</summary>
    public static byte[] WithDpi(byte[] png, double dpi)
    {
        var ppm = PixelsPerMetre(dpi);
        var data = new byte[9];
        BinaryPrimitives.WriteUInt32BigEndian(data.AsSpan(0), ppm);
        BinaryPrimitives.WriteUInt32BigEndian(data.AsSpan(4), ppm);
        data[8] = 1; // unit: metre
        return PngChunks.AfterHeader(png, "pHYs", data);
    }

    /// <summary>The pixels per metre (x, y) that a PNG's pHYs chunk gives, or null when it has none or its unit is not the metre.</summary>
    public static (uint X, uint Y)? Read(byte[] png)
    {
        foreach (var (type, start, _) in PngChunks.All(png))
        {
            if (type != "pHYs") continue;
            var data = png.AsSpan(start + 8, 9);
            if (data[8] != 1) return null;
            return (BinaryPrimitives.ReadUInt32BigEndian(data), BinaryPrimitives.ReadUInt32BigEndian(data[4..]));
        }
        return null;
    }
}
