namespace PadPlan.Editor.Edits;

/// <summary>One small edit as the page sends it (JSON). Which fields matter depends on <see cref="Kind"/>; docs/editor.md lists them.</summary>
public sealed class EditRequest
{
    /// <summary>move-part, turn-part, move-pad, hold, add-pad, remove-pad, land-lead, add-link, remove-link.</summary>
    public string? Kind { get; set; }
    /// <summary>A part reference (move-part, turn-part, land-lead, hold).</summary>
    public string? Ref { get; set; }
    /// <summary>A pad or strip id (move-pad, remove-pad, hold).</summary>
    public string? Pad { get; set; }
    /// <summary>A lead's pin (land-lead).</summary>
    public string? Pin { get; set; }
    /// <summary>Board millimetres: the new position of a part, a pad's centre or a strip's start, or a landing point.</summary>
    public double? X { get; set; }
    public double? Y { get; set; }
    /// <summary>hold: true to hold the item in place for "place the rest", false to let it go.</summary>
    public bool? Held { get; set; }
    /// <summary>add-pad: the net of the new pad; land-lead: "plane" lands the lead on the ground plane.</summary>
    public string? Net { get; set; }
    /// <summary>add-pad: punch diameter (mm); the toolkit's smallest punch when left out.</summary>
    public double? Size { get; set; }
    /// <summary>add-link: the two pads or strip segments the jumper joins.</summary>
    public string? From { get; set; }
    public string? To { get; set; }
    /// <summary>remove-link: the link's id.</summary>
    public string? Link { get; set; }
}
