namespace PadPlan.IO;

/// <summary>Makes sure a text file is UTF-8: a UTF-8 byte-order mark is dropped, UTF-16 and UTF-32 are refused with what to do.</summary>
public static class TextEncodingCheck
{
    private static readonly byte[] Utf8Bom = [0xEF, 0xBB, 0xBF];
    private static readonly byte[] Utf16Le = [0xFF, 0xFE];
    private static readonly byte[] Utf16Be = [0xFE, 0xFF];

    /// <summary>The bytes without a UTF-8 byte-order mark; throws <see cref="InputException"/> for UTF-16 or UTF-32 text.</summary>
    public static byte[] Utf8(byte[] bytes, string file)
    {
        if (bytes.AsSpan().StartsWith(Utf8Bom)) return bytes[Utf8Bom.Length..];
        if (LooksWide(bytes))
            throw new InputException(file, "the file is UTF-16 or UTF-32 text; save it as UTF-8 (most editors offer the encoding under 'Save as').", 1);
        return bytes;
    }

    // A UTF-16/32 byte-order mark, or a zero byte among the first few: text files PadPlan reads never hold NUL.
    private static bool LooksWide(byte[] bytes) =>
        bytes.AsSpan().StartsWith(Utf16Le) || bytes.AsSpan().StartsWith(Utf16Be)
        || bytes.AsSpan(0, Math.Min(bytes.Length, 4)).Contains((byte)0);
}
