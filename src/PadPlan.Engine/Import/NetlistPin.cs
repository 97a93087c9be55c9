namespace PadPlan.Import;

/// <summary>One pin of a netlist part: its symbol pin name and the net it joins.</summary>
public sealed record NetlistPin(string Name, string Net);
