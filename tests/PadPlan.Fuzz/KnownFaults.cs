namespace PadPlan.Fuzz;

/// <summary>
/// Internal faults the harness found that belong to work in progress elsewhere: counted and reported on every run,
/// not failed. Remove an entry as soon as its fix is merged, so the harness guards it from then on.
/// </summary>
public static class KnownFaults
{
    private static readonly (string Name, string Signature)[] Entries =
    [
        // none open: the last one (a netlist value with no digits, "R99 n1 n2 n3") is mended and has its regression test
    ];

    /// <summary>The known fault an exit-3 message matches, or null.</summary>
    public static string? Match(string err) =>
        Entries.FirstOrDefault(e => err.Contains(e.Signature, StringComparison.Ordinal)).Name;
}
