using PadPlan.Model;
using PadPlan.Simulation;

namespace PadPlan.Rules.Checks;

/// <summary>
/// Polarity and ratings at the DC operating point that ngspice finds: polarised capacitors the right way round and
/// inside their voltage, resistor, diode and transistor dissipation inside the rating, diode and LED forward current.
/// Ratings are the part's own (a parts map) or else its footprint's typical figure. These rules are about the circuit,
/// not the layout: they read the simulation's result and never the reverse.
/// </summary>
internal static class OperatingCheck
{
    /// <summary>
    /// The rating a capacitor of no stated rating may have: small disc ceramic and film capacitors are commonly sold at 50 V
    /// and up (common practice, no source; from memory), so above 80 % of that a stated rating is asked for.
    /// </summary>
    public const double UnratedVolts = 50;

    /// <summary>Derating for capacitor voltage: at most 80 % of the rating. Common practice, no source.</summary>
    public const double CapDerating = 0.8;

    /// <summary>Derating for dissipation: at most half the rated power. Common practice, no source.</summary>
    public const double PowerDerating = 0.5;

    /// <summary>Derating for forward current: at most 80 % of the rating. Common practice, no source.</summary>
    public const double CurrentDerating = 0.8;

    public static IEnumerable<Finding> Run(Project project, SimulationResult? simulation)
    {
        if (simulation is null) yield break;
        if (simulation.Point is not { } op)
        {
            yield return Findings.Info(RuleIds.OperatingPoint,
                $"{simulation.Label}: printed voltages are upper bounds, and the polarity and rating checks did not run.",
                simulation.Remedy, null, project.Name);
            yield break;
        }
        yield return Findings.Info(RuleIds.OperatingPoint,
            $"operating point by ngspice: {SupplyText(op)}.",
            "Set the bench supply's current limit a little above this before the first power-up (see the test plan).", null, project.Name);

        foreach (var part in project.Parts.OrderBy(p => p.Ref, NaturalOrder.Comparer))
        {
            var footprint = project.FindFootprint(part.Footprint);
            if (footprint is null) continue;
            var kind = PartKinds.Of(part, footprint);
            var rating = Rating.For(part, footprint);

            foreach (var finding in CapacitorVoltage(part, footprint, kind, rating, op)) yield return finding;

            if (op.Of(part.Ref) is not { } figures) continue;
            var watts = Math.Max(0, figures.Power);
            if (rating.Watts is { } ratedWatts)
            {
                var rule = kind is PartKind.Resistor or PartKind.Trimmer ? RuleIds.ResistorPower : RuleIds.DevicePower;
                if (watts > ratedWatts)
                    yield return Findings.Error(rule,
                        $"{part.Ref} ({part.Value}) dissipates {W(watts)}; {Whose(part, footprint, r => r.Watts)} is {W(ratedWatts)}.",
                        $"Use a part rated at least {W(watts / PowerDerating)} (a larger footprint), or change the circuit so it dissipates less.", null, part.Ref);
                else if (watts > PowerDerating * ratedWatts)
                    yield return Findings.Warning(rule,
                        $"{part.Ref} ({part.Value}) dissipates {W(watts)}, over half of {Whose(part, footprint, r => r.Watts)}, {W(ratedWatts)} (derating, common practice).",
                        $"Use a part rated at least {W(watts / PowerDerating)}, or state the part's own rating in the parts map.", null, part.Ref);
            }
            if (kind is PartKind.Diode or PartKind.Led && rating.Amps is { } ratedAmps && ForwardAmps(part, footprint, figures) is { } amps)
            {
                if (amps > ratedAmps)
                    yield return Findings.Error(RuleIds.ForwardCurrent,
                        $"{part.Ref} ({part.Value}) carries {A(amps)} forward; {Whose(part, footprint, r => r.Amps)} is {A(ratedAmps)}.",
                        $"Raise the series resistance so {part.Ref} carries at most {A(CurrentDerating * ratedAmps)}, or use a part rated for the current.", null, part.Ref);
                else if (amps > CurrentDerating * ratedAmps)
                    yield return Findings.Warning(RuleIds.ForwardCurrent,
                        $"{part.Ref} ({part.Value}) carries {A(amps)} forward, over {CurrentDerating:P0} of {Whose(part, footprint, r => r.Amps)}, {A(ratedAmps)} (derating, common practice).",
                        $"Raise the series resistance a little, or state the part's own rating in the parts map.", null, part.Ref);
            }
        }
    }

    // The current from anode to cathode: into the anode lead (the lead the footprint does not band), else the larger lead current.
    private static double? ForwardAmps(Part part, Footprint footprint, PartFigures figures)
    {
        var anode = part.Pins.Select(p => p.Pin).FirstOrDefault(p => p.Equals("A", StringComparison.OrdinalIgnoreCase) || p.Equals("anode", StringComparison.OrdinalIgnoreCase));
        return anode is not null && figures.CurrentInto(anode) is { } a ? a : figures.LargestCurrent;
    }

    private static string SupplyText(OperatingPoint op) => op.Supplies.Count == 0 ? "no supply found on a wire landing"
        : string.Join("; ", op.Supplies.Select(s => $"supply {s.Source} on {s.Net} at {V(s.Volts)} delivers {A(s.Amps)}"));

    /// <summary>
    /// A capacitor's DC voltage against its rating: reversed (polarised parts), over the rating, over the derated rating, or
    /// over what an unrated small capacitor may take.
    /// </summary>
    private static IEnumerable<Finding> CapacitorVoltage(Part part, Footprint footprint, PartKind kind, Rating rating, OperatingPoint op)
    {
        if (kind is not (PartKind.Capacitor or PartKind.TrimmerCap) || part.Pins.Count != 2) yield break;
        // a polarised part measured + against -; any other capacitor first lead against second (only the size counts)
        var polarised = footprint.PolarisedLeads(part);
        var (plus, minus) = polarised ?? (part.Pins[0].Pin, part.Pins[1].Pin);
        if (op.LeadVolts(part, plus) is not { } vp || op.LeadVolts(part, minus) is not { } vm) yield break;
        var across = vp - vm;
        if (polarised is not null && across < -ElectrolyticOrientation.ReverseVolts)
            yield return Findings.Error(RuleIds.CapReversed,
                $"{part.Ref} ({part.Value}) is reversed: its + lead (net {part.NetOf(plus)}) sits at {V(vp)} and its - lead (net {part.NetOf(minus)}) at {V(vm)}, {V(-across)} the wrong way. A reversed electrolytic can heat, vent or burst at power-up.",
                $"Turn {part.Ref} round in the netlist (+ to net {part.NetOf(minus)}), or use a non-polarised capacitor.", null, part.Ref);
        else if (rating.Volts is { } rated && Math.Abs(across) > rated)
            yield return Findings.Error(RuleIds.CapVoltage,
                $"{part.Ref} ({part.Value}) has {V(Math.Abs(across))} across it; {Whose(part, footprint, r => r.Volts)} is {V(rated)}.",
                $"Use a capacitor rated at least {V(Math.Abs(across) / CapDerating)} and give it in the parts map (\"ratedVoltage\").", null, part.Ref);
        else if (rating.Volts is { } r2 && Math.Abs(across) > CapDerating * r2)
            yield return Findings.Warning(RuleIds.CapVoltage,
                $"{part.Ref} ({part.Value}) has {V(Math.Abs(across))} across it, over {CapDerating:P0} of {Whose(part, footprint, r => r.Volts)}, {V(r2)} (derating, common practice).",
                $"Use a capacitor rated at least {V(Math.Abs(across) / CapDerating)}, or state the part's own rating in the parts map.", null, part.Ref);
        else if (rating.Volts is null && Math.Abs(across) > CapDerating * UnratedVolts)
            yield return Findings.Warning(RuleIds.CapVoltage,
                $"{part.Ref} ({part.Value}) has {V(Math.Abs(across))} across it, and neither the part nor its {footprint.Name} footprint states a rating: small ceramic and film capacitors are often rated only {V(UnratedVolts)}.",
                $"Use a capacitor rated at least {V(Math.Abs(across) / CapDerating)} and give it in the parts map (\"ratedVoltage\").", null, part.Ref);
    }

    /// <summary>Whose rating a figure is: the part's own (a parts map) or its footprint's typical one.</summary>
    private static string Whose(Part part, Footprint footprint, Func<Rating, double?> figure) =>
        part.Rating is { } own && figure(own) is not null ? "its own rating" : $"the {footprint.Name} footprint's rating ({Rating.TypicalWarning})";

    public static string V(double volts) => Text.Num(volts, "0.00") + " V";
    public static string W(double watts) => Text.Num(watts, "0.###") + " W";
    public static string A(double amps) => Math.Abs(amps) < 1 ? Text.Num(amps * 1000, "0.##") + " mA" : Text.Num(amps, "0.###") + " A";
}
