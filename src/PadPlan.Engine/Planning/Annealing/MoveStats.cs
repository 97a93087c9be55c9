namespace PadPlan.Planning;

/// <summary>Moves tried and kept, by kind, for one annealing run.</summary>
internal sealed class MoveStats
{
    private static readonly int Kinds = Enum.GetValues<MoveKind>().Length;

    public long[] Tried { get; } = new long[Kinds];
    public long[] Kept { get; } = new long[Kinds];

    public long TotalTried => Tried.Sum();
    /// <summary>Temperatures the schedule went through before it stopped.</summary>
    public int Temperatures { get; set; }
    /// <summary>Bytes allocated inside the inner move loop (measured around it); it should stay 0.</summary>
    public long InnerLoopBytes { get; set; }
    /// <summary>Moves made inside the measured inner loop.</summary>
    public long InnerLoopMoves { get; set; }

    public void Count(MoveKind kind, bool kept)
    {
        Tried[(int)kind]++;
        if (kept) Kept[(int)kind]++;
    }

    public override string ToString() => string.Join(", ", Enum.GetValues<MoveKind>().Select(k => $"{k} {Kept[(int)k]}/{Tried[(int)k]}"));
}
