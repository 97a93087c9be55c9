using System.Globalization;
using System.Text;
using PadPlan.Model;

namespace PadPlan.Import;

/// <summary>Plain-text views of the footprint library for the command line: one footprint a line, or one footprint in full.</summary>
public static class FootprintText
{
    public static string List(IReadOnlyList<Footprint> footprints)
    {
        var nameWidth = Math.Max(4, footprints.Max(f => f.Name.Length));
        var familyWidth = Math.Max(6, footprints.Max(f => f.Family.Length));
        var sb = new StringBuilder();
        sb.Append(Row(nameWidth, familyWidth, "name", "family", "mount", "leads", "description"));
        foreach (var f in footprints)
            sb.Append(Row(nameWidth, familyWidth, f.Name, f.Family, f.Mount.ToString().ToLowerInvariant(), f.Leads.Count.ToString(CultureInfo.InvariantCulture), f.Description));
        return sb.ToString();
    }

    private static string Row(int nameWidth, int familyWidth, string name, string family, string mount, string leads, string description) =>
        $"{name.PadRight(nameWidth)}  {family.PadRight(familyWidth)}  {mount,-8}  {leads,5}  {description}".TrimEnd() + "\n";

    public static string Details(Footprint f)
    {
        var (w, h) = (f.Body.Max(p => p.X) - f.Body.Min(p => p.X), f.Body.Max(p => p.Y) - f.Body.Min(p => p.Y));
        var sb = new StringBuilder();
        sb.Append(CultureInfo.InvariantCulture, $"{f.Name}: {f.Description}\n");
        sb.Append(CultureInfo.InvariantCulture, $"  family   {f.Family}\n");
        sb.Append(CultureInfo.InvariantCulture, $"  mount    {f.Mount.ToString().ToLowerInvariant()}\n");
        sb.Append(CultureInfo.InvariantCulture, $"  body     {Mm(w)} x {Mm(h)} mm in plan ({f.Body.Count}-point outline), {Mm(f.Height)} mm high{(f.IsNominal ? $" ({Footprint.NominalWarning})" : "")}\n");
        sb.Append(CultureInfo.InvariantCulture, $"  shape    {f.Shape.ToString().ToLowerInvariant()}; leads leave the body {Mm(f.LeadBend)} mm up, its underside {Mm(f.BodyBottom)} mm up{(f.OutsideLead is { } o ? $"; lead {o} runs down the outside" : "")}\n");
        sb.Append(CultureInfo.InvariantCulture, $"  source   {f.Source}\n");
        sb.Append("  leads    name  exit x, y (mm)    diameter  reach min-max (mm)\n");
        foreach (var l in f.Leads)
            sb.Append(CultureInfo.InvariantCulture, $"           {l.Name,-4}  {Mm(l.Exit.X),7}, {Mm(l.Exit.Y),-7}  {Mm(l.Diameter),8}  {Mm(l.MinReach)}-{Mm(l.MaxReach)}\n");
        if (f.Variants.Count > 0)
        {
            sb.Append("  pin orders (pin on lead 1, 2, 3...)\n");
            foreach (var v in f.Variants) sb.Append(CultureInfo.InvariantCulture, $"           {v.Name,-6} {string.Join(" ", v.Pins)}\n");
        }
        if (f.Marks.Count > 0)
            sb.Append(CultureInfo.InvariantCulture, $"  marks    {string.Join(", ", f.Marks.Select(m => $"{m.Kind.ToString().ToLowerInvariant()} at lead {m.Lead}"))}\n");
        return sb.ToString();
    }

    private static string Mm(double x) => x.ToString("0.###", CultureInfo.InvariantCulture);
}
