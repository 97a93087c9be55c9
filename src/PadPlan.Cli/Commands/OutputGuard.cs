namespace PadPlan.Cli.Commands;

/// <summary>
/// Output files never cost the builder a file of their own: one that exists is replaced only when PadPlan wrote it
/// (recognised by its first bytes, as its format marks it), or when the builder gives --force.
/// </summary>
internal static class OutputGuard
{
    /// <summary>Bytes read from the start of an existing file to recognise it, unless the caller asks for more.</summary>
    public const int HeadBytes = 4096;

    /// <summary>
    /// Throws (exit 2, nothing written) when <paramref name="target"/> exists, holds something, and <paramref name="isOwn"/>
    /// does not recognise its first <paramref name="headBytes"/> bytes. The message says the file "is not
    /// <paramref name="kind"/>" (e.g. "a check report that padplan wrote") and suggests <paramref name="instead"/> or --force.
    /// </summary>
    public static void EnsureReplaceable(FileInfo target, bool force, string kind, Func<byte[], bool> isOwn, string instead = "another file name", int headBytes = HeadBytes)
    {
        target.Refresh();
        if (force || !target.Exists || target.Length == 0) return;
        var head = new byte[(int)Math.Min(headBytes, target.Length)];
        using (var stream = target.OpenRead()) stream.ReadExactly(head);
        if (isOwn(head)) return;
        throw new UsageException($"{target.FullName} already exists and is not {kind}, so it is left alone. Give {instead}, or --force to replace it.");
    }
}
