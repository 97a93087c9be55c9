using System.Buffers.Binary;
using System.IO.Compression;
using PadPlan.Output.Drawing;
using PadPlan.Output.Sheets;
using SkiaSharp;
using Xunit;

namespace PadPlan.Tests.Output;

/// <summary>
/// The PNG previews carry their resolution in a pHYs chunk, so an image program prints them at 1:1, and name PadPlan in
/// a tEXt chunk, so a later run knows the file as its own. The file is read
/// here by our own walk over the chunks (not by PngResolution), and each chunk's CRC is checked against the CRC-32 that
/// .NET's GZipStream writes (RFC 1952 uses the same CRC-32 as PNG, ISO/IEC 15948 Annex D).
/// </summary>
public class PngResolutionTests
{
    [Theory]
    // ISO/IEC 15948:2004 11.3.5.3: pHYs unit 1 = pixels per metre; 1 in = 0.0254 m, so 300 dpi = 11811.02 -> 11811
    [InlineData(300, 11811u)]
    // 150 dpi = 5905.51 -> 5906; 72 dpi = 2834.65 -> 2835 (the figure image programs show for 72 dpi)
    [InlineData(150, 5906u)]
    [InlineData(72, 2835u)]
    public void Preview_png_carries_a_phys_chunk_at_the_dpi_asked(double dpi, uint pixelsPerMetre)
    {
        var book = SheetBook.Build(SheetFixtures.TinyBuffer(), SheetFixtures.Options(), null, []);
        var png = PngWriter.Write(book.Sheets[0].Page, dpi);

        var chunks = Chunks(png);
        Assert.Equal("IHDR", chunks[0].Type);
        var phys = Assert.Single(chunks, c => c.Type == "pHYs");
        Assert.True(chunks.IndexOf(phys) < chunks.FindIndex(c => c.Type == "IDAT"), "pHYs must come before the first IDAT (ISO/IEC 15948 5.6)");
        Assert.Equal(9, phys.Data.Length);
        Assert.Equal(pixelsPerMetre, BinaryPrimitives.ReadUInt32BigEndian(phys.Data));
        Assert.Equal(pixelsPerMetre, BinaryPrimitives.ReadUInt32BigEndian(phys.Data.AsSpan(4)));
        Assert.Equal(1, phys.Data[8]);
        foreach (var chunk in chunks) Assert.Equal(GzipCrc([.. System.Text.Encoding.ASCII.GetBytes(chunk.Type), .. chunk.Data]), chunk.Crc);

        // still a PNG that a decoder reads, at the size the dpi gives (A4 portrait at 72 dpi: 595 x 842 px)
        using var bitmap = SKBitmap.Decode(png);
        Assert.Equal((int)Math.Round(210 / 25.4 * dpi), bitmap.Width);
        Assert.Equal((uint)Math.Round(dpi / 0.0254), PngResolution.Read(png)!.Value.X);
    }

    [Fact]
    public void Preview_png_names_padplan_in_a_software_text_chunk_within_its_first_bytes()
    {
        var book = SheetBook.Build(SheetFixtures.TinyBuffer(), SheetFixtures.Options(), null, []);
        var png = PngWriter.Write(book.Sheets[0].Page, 150);

        var chunks = Chunks(png);
        var text = Assert.Single(chunks, c => c.Type == "tEXt");
        // ISO/IEC 15948:2004 11.3.4.3: tEXt is keyword, a zero byte, text (Latin-1); 11.3.4.2 predefines the keyword "Software"
        Assert.Equal("Software\0PadPlan"u8.ToArray(), text.Data);
        Assert.Equal(GzipCrc([.. "tEXt"u8.ToArray(), .. text.Data]), text.Crc);
        Assert.True(chunks.IndexOf(text) < chunks.FindIndex(c => c.Type == "IDAT"), "text before the image data, so the first bytes show it");
        Assert.True(PngSoftware.IsOwn(png[..4096]));
        Assert.Equal(png, PngWriter.Write(book.Sheets[0].Page, 150)); // the mark keeps the file the same from run to run

        // the same picture from another program (Skia's own encoder, no mark), and a file that merely names PadPlan, are not ours
        using var bitmap = SKBitmap.Decode(png);
        using var plain = bitmap.Encode(SKEncodedImageFormat.Png, 100);
        Assert.False(PngSoftware.IsOwn(plain.ToArray()[..4096]));
        Assert.False(PngSoftware.IsOwn("Software\0PadPlan, a note"u8.ToArray()));
    }

    private sealed record Chunk(string Type, byte[] Data, uint Crc);

    private static List<Chunk> Chunks(byte[] png)
    {
        Assert.Equal(new byte[] { 137, 80, 78, 71, 13, 10, 26, 10 }, png[..8]); // PNG signature, ISO/IEC 15948 5.2
        var list = new List<Chunk>();
        for (var at = 8; at < png.Length;)
        {
            var length = (int)BinaryPrimitives.ReadUInt32BigEndian(png.AsSpan(at));
            var type = System.Text.Encoding.ASCII.GetString(png, at + 4, 4);
            list.Add(new Chunk(type, png[(at + 8)..(at + 8 + length)], BinaryPrimitives.ReadUInt32BigEndian(png.AsSpan(at + 8 + length))));
            at += length + 12;
        }
        Assert.Equal("IEND", list[^1].Type);
        return list;
    }

    /// <summary>CRC-32 from the gzip trailer (RFC 1952 2.3.1: CRC32 then ISIZE, little-endian).</summary>
    private static uint GzipCrc(byte[] bytes)
    {
        using var stream = new MemoryStream();
        using (var gzip = new GZipStream(stream, CompressionLevel.Fastest, leaveOpen: true)) gzip.Write(bytes);
        var all = stream.ToArray();
        return BinaryPrimitives.ReadUInt32LittleEndian(all.AsSpan(all.Length - 8));
    }
}
