using PadPlan.Output.Tables;

namespace PadPlan.Tests.Output.Tables;

/// <summary>CSV follows RFC 4180 and neutralises formula-looking cells as the OWASP CSV-injection guidance advises.</summary>
public sealed class CsvTests
{
    private static string Csv(params string[] cells) => TableText.ToCsv(ReportTable.Create("t", cells.Select((_, i) => $"c{i}"), [cells]));

    private static string Row(params string[] cells) => Csv(cells).Split("\r\n")[1];

    // RFC 4180 section 2, rules 1, 6 and 7: CRLF line ends; fields holding commas, quotes or line breaks in double quotes; a quote doubled.
    [Theory]
    [InlineData("plain", "plain")]
    [InlineData("a,b", "\"a,b\"")]
    [InlineData("say \"hi\"", "\"say \"\"hi\"\"\"")]
    public void Fields_are_quoted_as_rfc_4180_says(string cell, string expected) => Assert.Equal(expected, Row(cell));

    [Fact]
    public void Records_end_in_crlf() => Assert.Equal("c0,c1\r\n1,2\r\n", Csv("1", "2")); // RFC 4180 section 2, rule 1

    // OWASP, "CSV Injection": cells beginning with = + - @ TAB or CR are prefixed with a single quote.
    [Theory]
    [InlineData("=SUM(A1:A9)", "'=SUM(A1:A9)")]
    [InlineData("+cmd|' /C calc'!A0", "'+cmd|' /C calc'!A0")]
    [InlineData("-2+3", "'-2+3")]
    [InlineData("@SUM(1)", "'@SUM(1)")]
    [InlineData("=HYPERLINK(\"x\",\"y\")", "\"'=HYPERLINK(\"\"x\"\",\"\"y\"\")\"")]
    public void Formula_cells_are_neutralised(string cell, string expected) => Assert.Equal(expected, Row(cell));

    // OWASP lists TAB and CR as formula starters too; here they reach the CSV already made visible (␉, ␍), so no spreadsheet reads them.
    [Theory]
    [InlineData("\t=1+1")]
    [InlineData("\r=1+1")]
    public void Tab_and_cr_at_the_start_cannot_start_a_formula(string cell)
    {
        var written = Row(cell);
        Assert.DoesNotContain('\t', written);
        Assert.DoesNotContain('\r', written);
        Assert.Equal("'\t=1", TableText.Neutralise("\t=1")); // the rule itself, on a raw cell
        Assert.Equal("'\r=1", TableText.Neutralise("\r=1"));
    }

    [Theory]
    [InlineData("-12")]
    [InlineData("+3.3")]
    [InlineData("-1.5e-3")]
    public void Plain_numbers_are_left_as_they_are(string cell) => Assert.Equal(cell, Row(cell));

    [Fact]
    public void Control_and_bidi_characters_do_not_reach_the_csv()
    {
        var written = Row("R1\u001b[31m\u0000\u202Eevil");
        Assert.Equal("R1\u241b[31m\u2400evil", written);
    }
}
