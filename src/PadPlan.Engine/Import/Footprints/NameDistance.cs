namespace PadPlan.Import;

/// <summary>Edit distance between names, to suggest what a builder probably meant.</summary>
public static class NameDistance
{
    /// <summary>Levenshtein distance, ignoring case.</summary>
    public static int Between(string a, string b)
    {
        a = a.ToLowerInvariant();
        b = b.ToLowerInvariant();
        var previous = new int[b.Length + 1];
        var current = new int[b.Length + 1];
        for (var j = 0; j <= b.Length; j++) previous[j] = j;
        for (var i = 1; i <= a.Length; i++)
        {
            current[0] = i;
            for (var j = 1; j <= b.Length; j++)
            {
                var cost = a[i - 1] == b[j - 1] ? 0 : 1;
                current[j] = Math.Min(Math.Min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + cost);
            }
            (previous, current) = (current, previous);
        }
        return previous[b.Length];
    }

    /// <summary>
    /// Up to <paramref name="count"/> candidates closest to the name (names containing it first), nearest first; among equally
    /// near ones, those that begin as the name does first ("cap-elec-6mm" brings cap-elec-6.3mm before cap-elec-10mm), then by name.
    /// </summary>
    public static IReadOnlyList<string> Nearest(string name, IEnumerable<string> candidates, int count) =>
        candidates
            .Select(c => (Name: c, Score: Between(name, c) - (c.Contains(name, StringComparison.OrdinalIgnoreCase) || name.Contains(c, StringComparison.OrdinalIgnoreCase) ? 3 : 0)))
            .Where(x => x.Score <= Math.Max(3, name.Length / 2))
            .OrderBy(x => x.Score).ThenByDescending(x => SharedStart(name, x.Name)).ThenBy(x => x.Name, StringComparer.Ordinal)
            .Take(count).Select(x => x.Name).ToList();

    /// <summary>How many characters two names share from the start, ignoring case.</summary>
    private static int SharedStart(string a, string b)
    {
        var n = 0;
        while (n < a.Length && n < b.Length && char.ToLowerInvariant(a[n]) == char.ToLowerInvariant(b[n])) n++;
        return n;
    }
}
