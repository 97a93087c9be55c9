using PadPlan.Model;

namespace PadPlan.Import;

/// <summary>A circuit as read from a netlist file, in either format, before footprints are chosen.</summary>
public sealed record Netlist(
    string File,
    string Title,
    ValueList<NetlistPart> Parts,
    ValueList<NetFacts> Nets,
    ValueList<WindingCoupling> Couplings,
    ValueList<ImportNote> Notes,
    (double Width, double Height)? BoardSize = null,
    ValueList<string>? FootprintDirs = null);
