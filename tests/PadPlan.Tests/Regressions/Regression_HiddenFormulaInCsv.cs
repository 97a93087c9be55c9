using PadPlan.Output.Tables;

namespace PadPlan.Tests.Regressions;

/// <summary>
/// Regression (issue 25): CSV neutralising looked only at the first character, so a cell starting with a zero-width
/// space or a full-width "＝" went out as a formula. The first visible character now decides, full-width forms included.
/// Source: OWASP, "CSV Injection" (cells starting with = + - @ TAB CR are prefixed with a single quote).
/// </summary>
public sealed class Regression_HiddenFormulaInCsv
{
    [Theory]
    [InlineData("\u200B=SUM(A1:A9)")]   // zero-width space
    [InlineData("\uFEFF@cmd")]           // byte-order mark
    [InlineData("\u2060+1+1")]           // word joiner
    [InlineData("\u00AD-2+3")]           // soft hyphen
    [InlineData("  =1+1")]               // plain spaces
    [InlineData("\uFF1DSUM(A1)")]        // full-width equals sign
    [InlineData("\uFF0B1")]              // full-width plus
    [InlineData("\uFF0D1")]              // full-width hyphen-minus
    [InlineData("\uFF20cmd")]            // full-width commercial at
    public void A_formula_behind_invisible_or_full_width_characters_is_quoted(string cell) =>
        Assert.Equal("'" + cell, TableText.Neutralise(cell));

    [Theory]
    [InlineData("-12")]
    [InlineData("+3.3")]
    [InlineData("R1")]
    [InlineData("\u200BR1")]
    [InlineData("")]
    public void Plain_cells_stay_as_they_are(string cell) => Assert.Equal(cell, TableText.Neutralise(cell));
}
