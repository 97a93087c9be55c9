using System.Buffers.Binary;

namespace PadPlan.Output.Drawing;

/// <summary>
/// Writes and reads the PNG pHYs chunk, which tells printing programs how large a pixel is, so a preview prints at its
/// true size. PNG specification (ISO/IEC 15948:2004, 11.3.5.3 pHYs): 4-byte pixels per unit X, 4-byte pixels per unit
/// Y, 1-byte unit (1 = metre); the chunk comes before the first IDAT. Chunk layout and CRC-32: same standard, 5.3 and
/// Annex D.
/// </summary>
public static class PngResolution
{
    private const int SignatureLength = 8;
    private static readonly uint[] CrcTable = BuildCrcTable();

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
        var chunk = Chunk("pHYs", data);

        using var output = new MemoryStream(png.Length + chunk.Length);
        output.Write(png, 0, SignatureLength);
        foreach (var (type, start, length) in Chunks(png))
        {
            if (type == "pHYs") continue;
            output.Write(png, start, length);
            if (type == "IHDR") output.Write(chunk);
        }
        return output.ToArray();
    }

    /// <summary>The pixels per metre (x, y) that a PNG's pHYs chunk gives, or null when it has none or its unit is not the metre.</summary>
    public static (uint X, uint Y)? Read(byte[] png)
    {
        foreach (var (type, start, _) in Chunks(png))
        {
            if (type != "pHYs") continue;
            var data = png.AsSpan(start + 8, 9);
            if (data[8] != 1) return null;
            return (BinaryPrimitives.ReadUInt32BigEndian(data), BinaryPrimitives.ReadUInt32BigEndian(data[4..]));
        }
        return null;
    }

    /// <summary>Each chunk's type, offset and whole length (length field, type, data and CRC).</summary>
    private static IEnumerable<(string Type, int Start, int Length)> Chunks(byte[] png)
    {
        if (png.Length < SignatureLength || png[1] != (byte)'P' || png[2] != (byte)'N' || png[3] != (byte)'G')
            throw new ArgumentException("not a PNG file.", nameof(png));
        var at = SignatureLength;
        while (at + 12 <= png.Length)
        {
            var length = (int)BinaryPrimitives.ReadUInt32BigEndian(png.AsSpan(at));
            var type = System.Text.Encoding.ASCII.GetString(png, at + 4, 4);
            yield return (type, at, length + 12);
            at += length + 12;
        }
    }

    private static byte[] Chunk(string type, byte[] data)
    {
        var chunk = new byte[data.Length + 12];
        BinaryPrimitives.WriteUInt32BigEndian(chunk, (uint)data.Length);
        System.Text.Encoding.ASCII.GetBytes(type, chunk.AsSpan(4));
        data.CopyTo(chunk, 8);
        BinaryPrimitives.WriteUInt32BigEndian(chunk.AsSpan(8 + data.Length), Crc(chunk.AsSpan(4, 4 + data.Length)));
        return chunk;
    }

    /// <summary>CRC-32 over chunk type and data (ISO/IEC 15948 Annex D).</summary>
    internal static uint Crc(ReadOnlySpan<byte> bytes)
    {
        var c = 0xFFFFFFFFu;
        foreach (var b in bytes) c = CrcTable[(c ^ b) & 0xFF] ^ (c >> 8);
        return c ^ 0xFFFFFFFFu;
    }

    private static uint[] BuildCrcTable()
    {
        var table = new uint[256];
        for (uint n = 0; n < 256; n++)
        {
            var c = n;
            for (var k = 0; k < 8; k++) c = (c & 1) != 0 ? 0xEDB88320u ^ (c >> 1) : c >> 1;
            table[n] = c;
        }
        return table;
    }
}
