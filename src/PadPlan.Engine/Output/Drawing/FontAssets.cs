using SkiaSharp;

namespace PadPlan.Output.Drawing;

/// <summary>The shipped font (DejaVu Sans, open licence, in assets/fonts): never a system font, so every machine draws and measures the same.</summary>
public static class FontAssets
{
    public const string RegularFile = "DejaVuSans.ttf";
    public const string BoldFile = "DejaVuSans-Bold.ttf";
    /// <summary>The family name written into SVG files, with a generic fallback for viewers without it.</summary>
    public const string SvgFamily = "'DejaVu Sans', sans-serif";

    private static readonly Lazy<string> Folder = new(FindFolder);
    private static readonly Lazy<SKTypeface> RegularFace = new(() => Load(RegularFile));
    private static readonly Lazy<SKTypeface> BoldFace = new(() => Load(BoldFile));

    public static SKTypeface Typeface(FontWeight weight) => weight == FontWeight.Bold ? BoldFace.Value : RegularFace.Value;

    /// <summary>A font of the given em size (in the canvas's units), set up so that measuring does not depend on the output resolution.</summary>
    public static SKFont Font(FontWeight weight, double size) => new(Typeface(weight), (float)size)
    {
        Hinting = SKFontHinting.None,
        Subpixel = true,
        LinearMetrics = true,
        Edging = SKFontEdging.Antialias,
    };

    /// <summary>assets/fonts beside the program (the command line copies assets/ next to the binary), else the repository's assets/fonts above it (tests, development runs).</summary>
    private static string FindFolder()
    {
        var start = new DirectoryInfo(AppContext.BaseDirectory);
        for (var dir = start; dir is not null; dir = dir.Parent)
        {
            var candidate = Path.Combine(dir.FullName, "assets", "fonts");
            if (File.Exists(Path.Combine(candidate, RegularFile))) return candidate;
        }
        throw new FileNotFoundException($"cannot find assets/fonts/{RegularFile} beside {AppContext.BaseDirectory} or in any folder above it; reinstall PadPlan so that its assets folder sits next to the program.");
    }

    private static SKTypeface Load(string file)
    {
        var path = Path.Combine(Folder.Value, file);
        return SKTypeface.FromFile(path) ?? throw new FileNotFoundException($"cannot load the font {path}; the file may be damaged.", path);
    }
}
