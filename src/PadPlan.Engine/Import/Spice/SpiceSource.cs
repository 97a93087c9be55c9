using PadPlan.Model.Values;

namespace PadPlan.Import;

/// <summary>What a SPICE V or I source says: a DC value, a transient waveform's peak, or a small-signal AC stimulus.</summary>
public sealed record SpiceSource(double? Dc, double? Peak, bool Ac, bool Expression)
{
    private static readonly string[] Waveforms = ["sin", "pulse", "exp", "pwl", "sffm", "am", "trrandom", "trnoise"];

    /// <summary>True for a signal generator (a waveform or an AC stimulus without a DC supply value).</summary>
    public bool IsSignal => Peak is not null || (Ac && !(Dc is { } d && d != 0));

    /// <summary>A 0 V source with no waveform: SPICE's ammeter, a plain wire on the board.</summary>
    public bool IsWire => !Ac && Peak is null && !Expression && (Dc ?? 0) == 0;

    /// <summary>The largest voltage (or current) the source gives: the DC value or the waveform's peak.</summary>
    public double? Largest => Peak is null ? Dc is null ? null : Math.Abs(Dc.Value) : Math.Max(Peak.Value, Math.Abs(Dc ?? 0));

    /// <summary>Reads the words after the two nodes: [DC] value, AC mag [phase], SIN(...), PULSE(...), PWL(...), EXP(...), SFFM(...).</summary>
    public static SpiceSource Parse(IReadOnlyList<string> words)
    {
        double? dc = null, peak = null;
        bool ac = false, expression = false;
        string? wave = null;
        var args = new List<double>();
        void EndWave()
        {
            if (wave is null) return;
            peak = Math.Max(peak ?? 0, PeakOf(wave, args));
            wave = null;
            args.Clear();
        }
        for (var i = 0; i < words.Count; i++)
        {
            var w = words[i];
            var lower = w.ToLowerInvariant();
            if (w.Contains('{')) { expression = true; continue; }
            var isNumber = ComponentValue.TryParse(w, ValueSyntax.Spice, out var v, out _);
            if (wave is not null && isNumber) { args.Add(v.Number); continue; }
            EndWave();
            if (lower == "dc" && i + 1 < words.Count && Number(words[i + 1]) is { } d) { dc = d; i++; }
            else if (lower == "ac") { ac = true; while (i + 1 < words.Count && Number(words[i + 1]) is not null) i++; }
            else if (Waveforms.Contains(lower)) wave = lower;
            else if (isNumber && dc is null) dc = v.Number;
        }
        EndWave();
        return new SpiceSource(dc, peak, ac, expression);
    }

    private static double? Number(string word) => ComponentValue.TryParse(word, ValueSyntax.Spice, out var v, out _) ? v.Number : null;

    // SIN(VO VA ...): offset plus amplitude; PULSE(V1 V2 ...) and EXP(V1 V2 ...): the larger level; PWL(t1 v1 t2 v2 ...): the largest level.
    private static double PeakOf(string wave, List<double> a) => wave switch
    {
        "sin" or "sffm" or "am" => a.Count >= 2 ? Math.Abs(a[0]) + Math.Abs(a[1]) : a.Count == 1 ? Math.Abs(a[0]) : 0,
        "pwl" => a.Where((_, k) => k % 2 == 1).Select(Math.Abs).DefaultIfEmpty(0).Max(),
        _ => a.Take(2).Select(Math.Abs).DefaultIfEmpty(0).Max(),
    };
}
