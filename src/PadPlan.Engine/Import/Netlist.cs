using PadPlan.Model;

namespace PadPlan.Import;

/// <summary>A circuit as read from a netlist file, in either format, before footprints are chosen.</summary>
/// <param name="Elements">SPICE only: every element line, its nodes by the symbol pin of its netlist part (a landing for a source).</param>
/// <param name="DeckLines">SPICE only: the lines a simulation needs (.model, .subckt blocks, .param, .include...), carried to an exported deck.</param>
/// <param name="Summary">What the reader decided about sources and left-off elements, for the import summary.</param>
public sealed record Netlist(
    string File,
    string Title,
    ValueList<NetlistPart> Parts,
    ValueList<NetFacts> Nets,
    ValueList<WindingCoupling> Couplings,
    ValueList<ImportNote> Notes,
    (double Width, double Height)? BoardSize = null,
    ValueList<string>? FootprintDirs = null,
    ValueList<SpiceElement>? Elements = null,
    ValueList<PadPlan.Model.Spice.CarriedLine>? DeckLines = null,
    ValueList<ImportSummaryLine>? Summary = null);
