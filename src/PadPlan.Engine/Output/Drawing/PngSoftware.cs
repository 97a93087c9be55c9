namespace PadPlan.Output.Drawing;

/// <summary>
/// The tEXt chunk that names PadPlan as the program that made a PNG, so a later run knows it may replace the file.
/// PNG specification (ISO/IEC 15948:2004, 11.3.4.3 tEXt: keyword, a zero byte, text, both Latin-1; 11.3.4.2 lists
/// "Software" among the predefined keywords). The chunk goes straight after IHDR, inside the first bytes of the file.
/// </summary>
public static class PngSoftware
{
    public const string Keyword = "Software";
    public const string Name = "PadPlan";

    private static readonly byte[] Data = System.Text.Encoding.Latin1.GetBytes($"{Keyword}\0{Name}");

    /// <summary>The PNG with PadPlan's tEXt chunk after IHDR (any other tEXt chunk is dropped; PadPlan writes none).</summary>
    public static byte[] Marked(byte[] png) => PngChunks.AfterHeader(png, "tEXt", Data);

    /// <summary>True when the first bytes of a file are a PNG whose chunks before the image data hold PadPlan's tEXt chunk.</summary>
    public static bool IsOwn(byte[] head)
    {
        if (!PngChunks.IsPng(head)) return false;
        foreach (var (type, start, length) in PngChunks.All(head))
        {
            if (type == "IDAT") return false;
            if (type == "tEXt" && head.AsSpan(start + 8, length - 12).SequenceEqual(Data)) return true;
        }
        return false;
    }
}
