namespace PadPlan.ProjectFiles.Limits;

/// <summary>
/// The limits of one kind of input file, by JSON path pattern: "[*]" stands for any list index, ".*" for any name in an
/// object used as a map (pins, parts-map entries). Numbers not listed must still be finite and within
/// <see cref="InputLimits.Coordinate"/>; lists and maps not listed hold at most <see cref="DefaultMaxItems"/> entries;
/// text not listed, and every map key, at most <see cref="DefaultMaxLength"/> characters.
/// </summary>
public sealed class LimitTable
{
    public const int DefaultMaxItems = 1000;
    public const int DefaultMaxLength = 200;

    public LimitTable(string kind, IReadOnlyDictionary<string, NumberRange> numbers, IReadOnlyDictionary<string, int> maxItems, IReadOnlyDictionary<string, int> maxLength, IReadOnlySet<string> maps)
    {
        Kind = kind;
        Numbers = numbers;
        MaxItems = maxItems;
        MaxLength = maxLength;
        Maps = maps;
    }

    /// <summary>What the file is, for messages ("project").</summary>
    public string Kind { get; }
    public IReadOnlyDictionary<string, NumberRange> Numbers { get; }
    public IReadOnlyDictionary<string, int> MaxItems { get; }
    public IReadOnlyDictionary<string, int> MaxLength { get; }
    /// <summary>Objects whose property names are data (pin names, net names), checked as lists of entries.</summary>
    public IReadOnlySet<string> Maps { get; }

    public NumberRange RangeOf(string pattern) => Numbers.GetValueOrDefault(pattern) ?? InputLimits.Coordinate;
    public int MaxItemsOf(string pattern) => MaxItems.GetValueOrDefault(pattern, DefaultMaxItems);
    public int MaxLengthOf(string pattern) => MaxLength.GetValueOrDefault(pattern, DefaultMaxLength);
}
