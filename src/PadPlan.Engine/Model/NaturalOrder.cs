namespace PadPlan.Model;

/// <summary>The order a builder reads names in: references, pad ids and footprint names with numbers sort by value.</summary>
public static class NaturalOrder
{
    /// <summary>Compares so that runs of digits count as numbers: R2 before R10, U1.2 before U1.10, cap-elec-6.3mm before cap-elec-10mm.</summary>
    public static int Compare(string? a, string? b)
    {
        if (a is null || b is null) return string.CompareOrdinal(a, b);
        int i = 0, j = 0;
        while (i < a.Length && j < b.Length)
        {
            if (char.IsAsciiDigit(a[i]) && char.IsAsciiDigit(b[j]))
            {
                var (si, sj) = (i, j);
                while (i < a.Length && char.IsAsciiDigit(a[i])) i++;
                while (j < b.Length && char.IsAsciiDigit(b[j])) j++;
                var (x, y) = (a[si..i].TrimStart('0'), b[sj..j].TrimStart('0'));
                var c = x.Length != y.Length ? x.Length.CompareTo(y.Length) : string.CompareOrdinal(x, y);
                if (c != 0) return c;
            }
            else
            {
                if (a[i] != b[j]) return a[i].CompareTo(b[j]);
                i++;
                j++;
            }
        }
        var rest = (a.Length - i).CompareTo(b.Length - j);
        return rest != 0 ? rest : string.CompareOrdinal(a, b);
    }

    public static IComparer<string> Comparer { get; } = Comparer<string>.Create(Compare);
}
