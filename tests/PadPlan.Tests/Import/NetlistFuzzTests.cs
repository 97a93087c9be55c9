using System.Text;
using FsCheck;
using FsCheck.Xunit;
using PadPlan.Import;
using PadPlan.IO;

namespace PadPlan.Tests.Import;

/// <summary>Mutated and random netlists must import or fail as bad input, never with any other exception.</summary>
public class NetlistFuzzTests
{
    private static readonly string[] Seeds =
    [
        .. Directory.GetFiles(ImportFixture.DataDir).Order(StringComparer.Ordinal).Select(File.ReadAllText),
    ];

    private static readonly string[] Snippets = ["+", "*", ";", "=", "{", "}", "(", ")", "\t", "\n", " 0 ", " gnd ", "X", "K1 L1 L2 0.5", ".subckt", ".ends", ".end", "\"", "#", "/", "1=", "net ", "board ", "U9A", "100meg", "\0", "\u00ff"];

    private static bool ImportsOrRefuses(byte[] bytes, string name)
    {
        try
        {
            NetlistImporter.Import(bytes, name, new ImportOptions(ImportFixture.Library));
        }
        catch (InputException)
        {
        }
        return true;
    }

    [Property(MaxTest = 300)]
    public bool Mutated_netlists_never_crash(int seed, int edits)
    {
        var random = new Random(seed);
        var text = new StringBuilder(Seeds[random.Next(Seeds.Length)]);
        for (var i = 0; i < 1 + Math.Abs(edits % 8); i++)
        {
            var at = random.Next(text.Length + 1);
            switch (random.Next(4))
            {
                case 0: text.Insert(at, Snippets[random.Next(Snippets.Length)]); break;
                case 1: if (at < text.Length) text.Remove(at, Math.Min(random.Next(1, 12), text.Length - at)); break;
                case 2: text.Insert(at, (char)random.Next(0, 0x3000)); break;
                default:
                    var lines = text.ToString().Split('\n').ToList();
                    var from = random.Next(lines.Count);
                    lines.Insert(random.Next(lines.Count), lines[from]);
                    text.Clear().Append(string.Join('\n', lines));
                    break;
            }
        }
        var name = random.Next(2) == 0 ? "fuzz.cir" : "fuzz.ppn";
        return ImportsOrRefuses(Encoding.UTF8.GetBytes(text.ToString()), name);
    }

    [Property(MaxTest = 200)]
    public bool Random_text_never_crashes(NonNull<string> text, bool ppn) =>
        ImportsOrRefuses(Encoding.UTF8.GetBytes(text.Get), ppn ? "r.ppn" : "r.cir");

    [Property(MaxTest = 100)]
    public bool Random_bytes_never_crash(byte[] bytes) => bytes is null || ImportsOrRefuses(bytes, "b.sp");
}
