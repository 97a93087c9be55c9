using System.Buffers.Binary;

namespace PadPlan.Output.Drawing;

/// <summary>
/// Reads and builds the chunks of a PNG file (ISO/IEC 15948:2004, 5.2 signature, 5.3 chunk layout: 4-byte length,
/// 4-byte type, data, CRC-32 over type and data as in Annex D), and puts an ancillary chunk straight after IHDR.
/// </summary>
internal static class PngChunks
{
    public const int SignatureLength = 8;
    private static readonly uint[] CrcTable = BuildCrcTable();

    /// <summary>The PNG with <paramref name="chunk"/> put straight after IHDR; chunks of the same type already there are dropped.</summary>
    public static byte[] AfterHeader(byte[] png, string type, byte[] data)
    {
        var chunk = Build(type, data);
        using var output = new MemoryStream(png.Length + chunk.Length);
        output.Write(png, 0, SignatureLength);
        foreach (var (current, start, length) in All(png))
        {
            if (current == type) continue;
            output.Write(png, start, length);
            if (current == "IHDR") output.Write(chunk);
        }
        return output.ToArray();
    }

    /// <summary>Each whole chunk's type, offset and length (length field, type, data and CRC); stops at the end of the bytes given, so a file's first bytes are enough for the chunks they hold.</summary>
    public static IEnumerable<(string Type, int Start, int Length)> All(byte[] png)
    {
        if (!IsPng(png)) throw new ArgumentException("not a PNG file.", nameof(png));
        var at = SignatureLength;
        while (at + 12 <= png.Length)
        {
            var length = (int)Math.Min(BinaryPrimitives.ReadUInt32BigEndian(png.AsSpan(at)), int.MaxValue - 12);
            if (at + 12L + length > png.Length) yield break;
            yield return (System.Text.Encoding.ASCII.GetString(png, at + 4, 4), at, length + 12);
            at += length + 12;
        }
    }

    /// <summary>True when the bytes start with the PNG signature (ISO/IEC 15948:2004, 5.2: 137 80 78 71 13 10 26 10).</summary>
    public static bool IsPng(ReadOnlySpan<byte> bytes) => bytes.StartsWith((ReadOnlySpan<byte>)[137, 80, 78, 71, 13, 10, 26, 10]);

    private static byte[] Build(string type, byte[] data)
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
