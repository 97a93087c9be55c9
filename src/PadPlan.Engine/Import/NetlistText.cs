using System.Text;
using PadPlan.IO;

namespace PadPlan.Import;

/// <summary>Turns netlist bytes into lines, refusing binary data with the line where it starts.</summary>
public static class NetlistText
{
    public static string[] Lines(byte[] bytes, string file)
    {
        string text;
        try
        {
            text = new UTF8Encoding(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true).GetString(bytes);
        }
        catch (DecoderFallbackException e)
        {
            throw NotText(bytes, file, e.Index);
        }
        if (text.Length > 0 && text[0] == '\uFEFF') text = text[1..];
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (char.IsControl(c) && c is not ('\n' or '\r' or '\t' or '\f'))
                throw NotText(Encoding.UTF8.GetBytes(text), file, Encoding.UTF8.GetByteCount(text.AsSpan(0, i)));
        }
        return text.ReplaceLineEndings("\n").Split('\n');
    }

    /// <summary>A word from the user's file as messages echo it: cut to 80 characters, so a runaway token cannot flood the terminal.</summary>
    public static string Echo(string word) => word.Length <= EchoLimit ? word : word[..(EchoLimit - 3)] + "...";

    /// <summary>The longest word a message repeats whole.</summary>
    public const int EchoLimit = 80;

    private static InputException NotText(byte[] bytes, string file, int byteIndex)
    {
        var line = 1;
        for (var i = 0; i < byteIndex && i < bytes.Length; i++)
            if (bytes[i] == (byte)'\n') line++;
        return new InputException(file, $"this is not a text netlist: binary data at byte {byteIndex}. Give a PadPlan netlist (.ppn) or a SPICE netlist (.cir, .sp, .net, .spice) saved as text.", line);
    }
}
