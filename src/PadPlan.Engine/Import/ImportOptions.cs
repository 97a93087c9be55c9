namespace PadPlan.Import;

/// <summary>What an import is given besides the netlist: the footprint library, an optional parts map, a board size that overrides the netlist's, and folders of the builder's own footprints to record in the project.</summary>
public sealed record ImportOptions(FootprintLibrary Library, PartsMap? PartsMap = null, (double Width, double Height)? BoardSize = null, IReadOnlyList<string>? FootprintDirs = null);
