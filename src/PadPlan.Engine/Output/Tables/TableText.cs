using System.Text;

namespace PadPlan.Output.Tables;

/// <summary>Renders report tables as aligned plain text or as RFC 4180 CSV.</summary>
public static class TableText
{
    public static string ToText(ReportTable table)
    {
        var widths = table.Columns.Select(c => c.Length).ToArray();
        foreach (var row in table.Rows)
            for (var i = 0; i < row.Count; i++) widths[i] = Math.Max(widths[i], row[i].Length);
        var sb = new StringBuilder();
        sb.Append(table.Title).Append('\n');
        AppendRow(sb, table.Columns, widths);
        sb.Append(string.Join("  ", widths.Select(w => new string('-', w)))).Append('\n');
        foreach (var row in table.Rows) AppendRow(sb, row, widths);
        foreach (var note in table.Notes) sb.Append(note).Append('\n');
        return sb.ToString();
    }

    private static void AppendRow(StringBuilder sb, IReadOnlyList<string> cells, int[] widths)
    {
        var line = string.Join("  ", cells.Select((c, i) => c.PadRight(widths[i])));
        sb.Append(line.TrimEnd()).Append('\n');
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
