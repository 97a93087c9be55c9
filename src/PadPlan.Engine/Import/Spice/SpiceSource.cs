using PadPlan.Model;

namespace PadPlan.Import;

/// <summary>The transient function of an independent source (ngspice manual, "Independent Sources for Voltage or Current").</summary>
public enum SourceFunction { None, Sin, Pulse, Pwl, Exp, Sffm, Am, Other }

/// <summary>
/// What a SPICE V or I source line says after its two nodes: the DC value, the AC magnitude and the transient function
/// with its numbers, every sign kept. Expressions are evaluated with the deck's parameters; one that cannot be is kept
/// as text in <see cref="Unevaluated"/>.
/// </summary>
public sealed record SpiceSource(double? Dc, double? Ac, SourceFunction Function, ValueList<double> Args, bool Repeats, string? Unevaluated)
{
    private static readonly Dictionary<string, SourceFunction> Functions = new(StringComparer.OrdinalIgnoreCase)
    {
        ["sin"] = SourceFunction.Sin, ["sine"] = SourceFunction.Sin, ["pulse"] = SourceFunction.Pulse, ["pwl"] = SourceFunction.Pwl,
        ["exp"] = SourceFunction.Exp, ["sffm"] = SourceFunction.Sffm, ["am"] = SourceFunction.Am,
        ["trnoise"] = SourceFunction.Other, ["trrandom"] = SourceFunction.Other,
    };

    /// <summary>The value the source settles at and holds, when it is a supply: a constant, or a ramp (PWL) to a final value. Null for a signal.</summary>
    public double? Settled => Function switch
    {
        SourceFunction.None => Ac is not null && (Dc ?? 0) == 0 ? null : Dc ?? 0,
        SourceFunction.Pwl when !Repeats && Args.Count >= 2 && Args[^1] != 0 => Args[^1],
        SourceFunction.Sin or SourceFunction.Sffm when Arg(1) == 0 => Arg(0),
        SourceFunction.Am when Arg(0) == 0 => 0,
        SourceFunction.Pulse when Arg(0) == Arg(1) => Arg(0),
        _ => null,
    };

    /// <summary>The largest value a signal reaches (its peak, sign dropped): offset plus amplitude of a sine, the larger level of a pulse or exponential, the largest PWL point, the AC magnitude of a small-signal input.</summary>
    public double Peak => Function switch
    {
        SourceFunction.Sin or SourceFunction.Sffm => Math.Abs(Arg(0)) + Math.Abs(Arg(1)),
        // AM(VA VO MF FC TD): VA (VO + sin) sin, so its envelope peaks at VA (|VO| + 1)
        SourceFunction.Am => Math.Abs(Arg(0)) * (Math.Abs(Arg(1)) + 1),
        SourceFunction.Pwl => Args.Where((_, k) => k % 2 == 1).Select(Math.Abs).DefaultIfEmpty(0).Max(),
        SourceFunction.Pulse or SourceFunction.Exp => Math.Max(Math.Abs(Arg(0)), Math.Abs(Arg(1))),
        _ => Math.Abs(Ac ?? Dc ?? 0),
    };

    /// <summary>A 0 V source with no function and no AC: SPICE's ammeter, a plain wire on the board.</summary>
    public bool IsWire => Function == SourceFunction.None && Ac is null && Unevaluated is null && (Dc ?? 0) == 0;

    /// <summary>A 0 V source with only an AC stimulus: between two signal nodes it is a loop-gain probe, a wire on the board.</summary>
    public bool IsLoopProbe => Function == SourceFunction.None && Ac is not null && Unevaluated is null && (Dc ?? 0) == 0;

    private double Arg(int i) => i < Args.Count ? Args[i] : 0;

    /// <summary>Reads the words after the two nodes, in any letter case: [DC] value, AC mag [phase], and SIN/SINE, PULSE, PWL (with r= and td=), EXP, SFFM or AM with their numbers, in parentheses or bare.</summary>
    public static SpiceSource Parse(IReadOnlyList<string> words, IReadOnlyDictionary<string, double> parameters)
    {
        double? dc = null, ac = null;
        var function = SourceFunction.None;
        var args = new List<double>();
        var repeats = false;
        string? unevaluated = null;
        double? Value(string word)
        {
            var v = SpiceValues.Number(word, parameters);
            if (v is null && SpiceExpression.IsExpression(word)) unevaluated ??= word;
            return v;
        }
        bool IsValue(string word) => SpiceValues.LooksLikeNumber(word) || SpiceExpression.IsExpression(word);
        for (var i = 0; i < words.Count; i++)
        {
            var w = words[i];
            var eq = w.IndexOf('=');
            if (eq > 0)
            {
                // PWL options: r=time repeats from that time on; td=delay shifts it; neither changes its levels
                if (string.Equals(w[..eq], "r", StringComparison.OrdinalIgnoreCase)) repeats = true;
                continue;
            }
            if (w.Equals("dc", StringComparison.OrdinalIgnoreCase))
            {
                if (i + 1 < words.Count && IsValue(words[i + 1])) dc = Value(words[++i]) ?? dc;
                continue;
            }
            if (w.Equals("ac", StringComparison.OrdinalIgnoreCase))
            {
                ac = 1; // SPICE: AC with no magnitude is 1
                if (i + 1 < words.Count && IsValue(words[i + 1])) ac = Value(words[++i]) ?? 1;
                if (i + 1 < words.Count && IsValue(words[i + 1])) i++; // the phase
                continue;
            }
            if (Functions.TryGetValue(w, out var f))
            {
                function = f;
                args.Clear();
                while (i + 1 < words.Count && IsValue(words[i + 1])) args.Add(Value(words[++i]) ?? double.NaN);
                continue;
            }
            if (IsValue(w) && dc is null && function == SourceFunction.None) dc = Value(w);
        }
        if (args.Any(double.IsNaN)) args = args.Select(a => double.IsNaN(a) ? 0 : a).ToList();
        return new SpiceSource(dc, ac, function, args.ToValueList(), repeats, unevaluated);
    }
}
