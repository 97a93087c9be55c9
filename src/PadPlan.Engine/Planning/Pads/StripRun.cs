using PadPlan.Model;

namespace PadPlan.Planning;

/// <summary>A pin of a strip-mounted part over its segment; Net is null for a pin with no connection.</summary>
internal sealed record StripPin(int Lead, string Pin, string? Net);

/// <summary>One scored strip under a run of neighbouring pins of a strip-mounted part, in footprint coordinates at rotation 0: one segment of one pitch per pin, from Start along the strip, isolated by scores of width Score.</summary>
internal sealed record StripRun(bool Vertical, Point Start, double Width, double Pitch, double Score, ValueList<StripPin> Pins);
