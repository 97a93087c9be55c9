using System.Text;

namespace PadPlan.Output.Tables;

/// <summary>Renders report tables as aligned plain text or as RFC 4180 CSV.</summary>
public static class TableText
{
    /// <summary>
    /// The table as aligned text. With a width (a terminal's columns), the columns share that width: a column whose
    /// longest cell fits its fair share keeps it, the rest split what is left, and long cells wrap within their column;
    /// title and notes wrap too, so no line is longer than the width. Without one, each row is one line however long.
    /// </summary>
    public static string ToText(ReportTable table, int? width = null)
    {
        var widths = table.Columns.Select(c => c.Length).ToArray();
        foreach (var row in table.Rows)
            for (var i = 0; i < row.Count; i++) widths[i] = Math.Max(widths[i], row[i].Length);
        if (width is { } total)
        {
            int[] Longest(Func<string, int> measure)
            {
                var longest = table.Columns.Select(measure).ToArray();
                foreach (var row in table.Rows)
                    for (var i = 0; i < row.Count; i++) longest[i] = Math.Max(longest[i], measure(row[i]));
                return longest;
            }
            var room = total - Gap * (widths.Length - 1);
            if (widths.Sum() > room) widths = Share(widths, Longest(LongestWord), room) ?? Share(widths, Longest(LongestPiece), room) ?? Share(widths, room);
        }
        var sb = new StringBuilder();
        AppendLines(sb, table.Title, width);
        AppendRow(sb, table.Columns, widths);
        sb.Append(string.Join("  ", widths.Select(w => new string('-', w)))).Append('\n');
        foreach (var row in table.Rows) AppendRow(sb, row, widths);
        foreach (var note in table.Notes) AppendLines(sb, note, width);
        return sb.ToString();
    }

    /// <summary>Gap between columns (characters).</summary>
    private const int Gap = 2;
    /// <summary>Narrowest a column is made when the table must shrink (characters); common practice, no source.</summary>
    private const int Narrowest = 4;

    private static int LongestWord(string text) => text.Split(' ').Max(w => w.Length);

    /// <summary>The longest piece of a word between spaces and after hyphens (res-axial-250mw: "axial-", 6).</summary>
    private static int LongestPiece(string text) =>
        text.Split(' ').SelectMany(w => System.Text.RegularExpressions.Regex.Split(w, "(?<=-)")).Max(p => p.Length);

    /// <summary>
    /// Column widths that fill at most `room` characters of cells when every column can be as wide as its longest
    /// unbreakable piece (a word, or a piece of a hyphenated name): each gets that, and the rest of the room goes to the
    /// narrowest columns that want more first (water filling), so cells wrap between words (or after hyphens) and nothing
    /// is cut. Null when even that does not fit.
    /// </summary>
    private static int[]? Share(int[] natural, int[] longestPiece, int room)
    {
        var floor = natural.Select((n, i) => Math.Min(n, Math.Max(Narrowest, longestPiece[i]))).ToArray();
        if (floor.Sum() > room) return null;
        var spare = room - floor.Sum();
        while (spare > 0)
        {
            var wanting = Enumerable.Range(0, floor.Length).Where(i => floor[i] < natural[i]).ToList();
            if (wanting.Count == 0) break;
            floor[wanting.MinBy(i => floor[i])]++;
            spare--;
        }
        return floor;
    }

    /// <summary>Column widths that fill at most `room` characters of cells: the narrow columns keep their width, the wide ones share the rest equally (water filling).</summary>
    private static int[] Share(int[] natural, int room)
    {
        var result = new int[natural.Length];
        var open = Enumerable.Range(0, natural.Length).OrderBy(i => natural[i]).ToList();
        while (open.Count > 0)
        {
            var share = Math.Max(Narrowest, room / open.Count);
            var i = open[0];
            open.RemoveAt(0);
            result[i] = natural[i] <= share ? natural[i] : share;
            if (natural[i] > share)
            {
                // every column left is wider than the share: give them all the share, the remainder to the widest
                foreach (var j in open) result[j] = share;
                var spare = room - share * (open.Count + 1);
                if (spare > 0) result[open.Count > 0 ? open[^1] : i] += spare;
                break;
            }
            room -= result[i];
        }
        return result;
    }

    private static void AppendRow(StringBuilder sb, IReadOnlyList<string> cells, int[] widths)
    {
        var wrapped = cells.Select((c, i) => Wrap(c, widths[i])).ToList();
        var lines = wrapped.Max(w => w.Count);
        for (var k = 0; k < lines; k++)
        {
            var line = string.Join("  ", wrapped.Select((w, i) => (k < w.Count ? w[k] : "").PadRight(widths[i])));
            sb.Append(line.TrimEnd()).Append('\n');
        }
    }

    private static void AppendLines(StringBuilder sb, string text, int? width)
    {
        foreach (var line in text.Split('\n'))
            foreach (var part in width is { } w ? Wrap(line, w) : [line]) sb.Append(part).Append('\n');
    }

    /// <summary>
    /// Breaks text into lines of at most `width` characters at spaces; a word longer than the width breaks after its last
    /// hyphen that fits (res-axial- / 250mw), else it is cut.
    /// </summary>
    public static IReadOnlyList<string> Wrap(string text, int width)
    {
        if (text.Length <= width || width <= 0) return [text];
        var lines = new List<string>();
        var line = new StringBuilder();
        foreach (var word in text.Split(' '))
        {
            var rest = word;
            if (line.Length > 0 && line.Length + 1 + rest.Length <= width)
            {
                line.Append(' ').Append(rest);
                continue;
            }
            if (line.Length > 0) { lines.Add(line.ToString()); line.Clear(); }
            while (rest.Length > width)
            {
                var hyphen = rest.LastIndexOf('-', width - 1, width);
                var take = hyphen > 0 ? hyphen + 1 : width;
                lines.Add(rest[..take]);
                rest = rest[take..];
            }
            line.Append(rest);
        }
        if (line.Length > 0 || lines.Count == 0) lines.Add(line.ToString());
        return lines;
    }

    /// <summary>
    /// CSV per RFC 4180: comma separated, CRLF line ends, fields with commas, quotes or line breaks quoted. A cell that a
    /// spreadsheet would read as a formula (starting with =, +, -, @, TAB or CR) gets a leading single quote, as the OWASP
    /// CSV-injection guidance advises; plain numbers ("-12", "+3.3") stay as they are.
    /// </summary>
    public static string ToCsv(ReportTable table)
    {
        var sb = new StringBuilder();
        sb.Append(string.Join(",", table.Columns.Select(Quote))).Append("\r\n");
        foreach (var row in table.Rows) sb.Append(string.Join(",", row.Select(Quote))).Append("\r\n");
        return sb.ToString();
    }

    private static string Quote(string cell)
    {
        var safe = Neutralise(cell);
        return safe.IndexOfAny([',', '"', '\r', '\n']) >= 0 ? "\"" + safe.Replace("\"", "\"\"") + "\"" : safe;
    }

    /// <summary>
    /// The cell with a leading single quote if a spreadsheet could take it for a formula (OWASP, CSV Injection): judged
    /// by its first visible character, after any leading spaces and invisible format characters (zero-width space,
    /// joiners, byte-order mark, soft hyphen), and counting the full-width forms of = + - @ that some spreadsheets fold
    /// to the plain ones.
    /// </summary>
    public static string Neutralise(string cell)
    {
        var first = 0;
        while (first < cell.Length && IsInvisible(cell[first])) first++;
        if (first == cell.Length) return cell;
        var formula = cell[first] is '=' or '+' or '-' or '@' or '\t' or '\r' or '\uFF1D' or '\uFF0B' or '\uFF0D' or '\uFF20';
        return formula && (first > 0 || !IsPlainNumber(cell)) ? "'" + cell : cell;
    }

    private static bool IsInvisible(char c) =>
        c is not ('\t' or '\r') && (char.IsWhiteSpace(c) || char.GetUnicodeCategory(c) == System.Globalization.UnicodeCategory.Format);

    private static bool IsPlainNumber(string cell) =>
        double.TryParse(cell, System.Globalization.NumberStyles.AllowLeadingSign | System.Globalization.NumberStyles.AllowDecimalPoint | System.Globalization.NumberStyles.AllowExponent,
            System.Globalization.CultureInfo.InvariantCulture, out _);
}
