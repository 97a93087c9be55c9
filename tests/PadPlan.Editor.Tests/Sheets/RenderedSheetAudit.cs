using System.Text.Json;
using Microsoft.Playwright;

namespace PadPlan.Editor.Tests.Sheets;

/// <summary>
/// Loads SVG pages into Chromium and measures what the browser really lays out: the box of every text element
/// (getBBox() taken through getScreenCTM(), so turned text counts as drawn) and the shape of every element the SVG
/// tags as a pad, strip or part body (data-kind). The fonts are the shipped DejaVu Sans files, loaded with @font-face,
/// so the browser lays text out with the same font the sheets were measured with.
/// </summary>
public sealed class RenderedSheetAudit : IAsyncDisposable
{
    /// <summary>Overlap tolerated between two boxes, in mm: below what a printer resolves (0.05 mm is 1/500 in); common practice, no source.</summary>
    public const double Tolerance = 0.05;

    private readonly IPage _page;

    private RenderedSheetAudit(IPage page) => _page = page;

    public static async Task<RenderedSheetAudit> OpenAsync(IBrowser browser)
    {
        var page = await browser.NewPageAsync();
        var fonts = FontFolder();
        string Face(string file, string weight) =>
            $"@font-face {{ font-family: 'DejaVu Sans'; font-weight: {weight}; src: url(data:font/ttf;base64,{Convert.ToBase64String(File.ReadAllBytes(Path.Combine(fonts, file)))}); }}";
        await page.SetContentAsync($"<!DOCTYPE html><html><head><style>{Face("DejaVuSans.ttf", "normal")} {Face("DejaVuSans-Bold.ttf", "bold")} body {{ margin: 0; }}</style></head><body><span style=\"font-family:'DejaVu Sans'\">x</span><b style=\"font-family:'DejaVu Sans'\">x</b></body></html>");
        await page.EvaluateAsync("() => document.fonts.ready");
        return new RenderedSheetAudit(page);
    }

    /// <summary>The problems Chromium's layout shows on one SVG page; empty when the page is clean.</summary>
    public async Task<IReadOnlyList<string>> ProblemsAsync(string svg)
    {
        var body = svg[svg.IndexOf("<svg", StringComparison.Ordinal)..];
        var result = await _page.EvaluateAsync<JsonElement>(Script, new object[] { body, Tolerance });
        return result.EnumerateArray().Select(e => e.GetString()!).ToList();
    }

    /// <summary>
    /// Texts: none overlaps another; none covers a pad, strip or body unless it names it (data-names); none reaches past
    /// the page edge or out of the clipped group it is drawn in; and the fonts in use are the shipped ones.
    /// </summary>
    private const string Script = """
        async ([svgText, tol]) => {
          document.body.innerHTML = svgText;
          await document.fonts.ready;
          const svg = document.querySelector('svg');
          // laid out ten times larger than print: Chromium rounds a font's ascent and descent to whole pixels at the
          // screen size, which at 1:1 would make small text's box up to half a pixel (0.13 mm) taller than the font says
          svg.style.width = (10 * svg.viewBox.baseVal.width) + 'mm';
          svg.style.height = (10 * svg.viewBox.baseVal.height) + 'mm';
          const problems = [];
          if (!document.fonts.check("2px 'DejaVu Sans'") || !document.fonts.check("bold 2px 'DejaVu Sans'")) problems.push('DejaVu Sans is not loaded');
          const vb = svg.viewBox.baseVal;
          const rootInv = svg.getScreenCTM().inverse();
          const toMm = el => rootInv.multiply(el.getScreenCTM());
          const apply = (m, x, y) => ({ x: m.a * x + m.c * y + m.e, y: m.b * x + m.d * y + m.f });
          const boxOf = pts => ({ l: Math.min(...pts.map(p => p.x)), t: Math.min(...pts.map(p => p.y)), r: Math.max(...pts.map(p => p.x)), b: Math.max(...pts.map(p => p.y)) });
          const shrink = (b, d) => ({ l: b.l + d, t: b.t + d, r: b.r - d, b: b.b - d });
          const overlap = (a, b) => a.l < b.r && b.l < a.r && a.t < b.b && b.t < a.b;
          const clipOf = el => {
            const g = el.closest('g[clip-path]');
            if (!g) return null;
            const id = g.getAttribute('clip-path').match(/#([^)]+)/)[1];
            const r = svg.querySelector('#' + id + ' rect');
            const x = +r.getAttribute('x'), y = +r.getAttribute('y');
            return { l: x, t: y, r: x + +r.getAttribute('width'), b: y + +r.getAttribute('height') };
          };
          const texts = [...svg.querySelectorAll('text')].filter(el => el.textContent.trim().length > 0).map(el => {
            const bb = el.getBBox();
            const m = toMm(el);
            const box = boxOf([apply(m, bb.x, bb.y), apply(m, bb.x + bb.width, bb.y), apply(m, bb.x, bb.y + bb.height), apply(m, bb.x + bb.width, bb.y + bb.height)]);
            return { text: el.textContent, names: (el.dataset.names || '').split(' ').filter(n => n), box, clip: clipOf(el) };
          });
          const shapes = [...svg.querySelectorAll('[data-kind=pad],[data-kind=body]')].map(el => {
            const m = toMm(el);
            const kind = el.dataset.kind, id = el.dataset.id;
            if (el.tagName === 'circle') {
              const c = apply(m, +el.getAttribute('cx'), +el.getAttribute('cy'));
              const r = +el.getAttribute('r') * Math.hypot(m.a, m.b);
              return { kind, id, circle: { c, r }, box: { l: c.x - r, t: c.y - r, r: c.x + r, b: c.y + r } };
            }
            if (el.tagName === 'rect') {
              const x = +el.getAttribute('x'), y = +el.getAttribute('y'), w = +el.getAttribute('width'), h = +el.getAttribute('height');
              return { kind, id, box: boxOf([apply(m, x, y), apply(m, x + w, y + h)]) };
            }
            const pts = [...el.points].map(p => apply(m, p.x, p.y));
            return { kind, id, poly: pts, box: boxOf(pts) };
          });
          const inside = (p, poly) => {
            let c = false;
            for (let i = 0, j = poly.length - 1; i < poly.length; j = i++)
              if ((poly[i].y > p.y) !== (poly[j].y > p.y) && p.x < (poly[j].x - poly[i].x) * (p.y - poly[i].y) / (poly[j].y - poly[i].y) + poly[i].x) c = !c;
            return c;
          };
          const segHitsBox = (a, b, r) => {
            // Liang-Barsky clipping of segment ab against the open box r
            let t0 = 0, t1 = 1; const dx = b.x - a.x, dy = b.y - a.y;
            for (const [p, q] of [[-dx, a.x - r.l], [dx, r.r - a.x], [-dy, a.y - r.t], [dy, r.b - a.y]]) {
              if (p === 0) { if (q <= 0) return false; continue; }
              const t = q / p;
              if (p < 0) { if (t > t1) return false; if (t > t0) t0 = t; } else { if (t < t0) return false; if (t < t1) t1 = t; }
            }
            return t1 - t0 > 1e-9;
          };
          const covers = (box, s) => {
            if (!overlap(box, s.box)) return false;
            if (s.circle) {
              const dx = Math.max(box.l - s.circle.c.x, 0, s.circle.c.x - box.r), dy = Math.max(box.t - s.circle.c.y, 0, s.circle.c.y - box.b);
              return Math.hypot(dx, dy) < s.circle.r;
            }
            if (s.poly) {
              if (inside({ x: (box.l + box.r) / 2, y: (box.t + box.b) / 2 }, s.poly)) return true;
              return s.poly.some((p, i) => segHitsBox(p, s.poly[(i + 1) % s.poly.length], box));
            }
            return true;
          };
          const name = t => `'${t.text}' at ${t.box.l.toFixed(1)},${t.box.t.toFixed(1)}`;
          const sorted = [...texts].sort((a, b) => a.box.l - b.box.l);
          for (let i = 0; i < sorted.length; i++) {
            const a = shrink(sorted[i].box, tol);
            for (let j = i + 1; j < sorted.length && sorted[j].box.l + tol < a.r; j++)
              if (overlap(a, shrink(sorted[j].box, tol))) problems.push(`text ${name(sorted[i])} overlaps text ${name(sorted[j])}`);
          }
          for (const t of texts) {
            const box = shrink(t.box, tol);
            for (const s of shapes)
              if (!t.names.includes(s.id) && covers(box, s)) problems.push(`text ${name(t)} lies over ${s.kind} ${s.id}`);
            if (box.l < vb.x || box.t < vb.y || box.r > vb.x + vb.width || box.b > vb.y + vb.height) problems.push(`text ${name(t)} is cut by the page edge`);
            if (t.clip && (box.l < t.clip.l || box.t < t.clip.t || box.r > t.clip.r || box.b > t.clip.b)) problems.push(`text ${name(t)} is cut by the edge of its drawing`);
          }
          return problems;
        }
        """;

    private static string FontFolder()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            var candidate = Path.Combine(dir.FullName, "assets", "fonts");
            if (File.Exists(Path.Combine(candidate, "DejaVuSans.ttf"))) return candidate;
        }
        throw new FileNotFoundException("assets/fonts/DejaVuSans.ttf not found above " + AppContext.BaseDirectory);
    }

    public async ValueTask DisposeAsync() => await _page.CloseAsync();
}
