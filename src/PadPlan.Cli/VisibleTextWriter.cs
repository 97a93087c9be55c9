using System.Text;
using PadPlan.Output;

namespace PadPlan.Cli;

/// <summary>The terminal's one gate for user text: everything a command prints passes <see cref="VisibleText"/>, so an ESC or a bidi override in a file name, value or message can neither drive the terminal nor reorder what is shown.</summary>
public sealed class VisibleTextWriter(TextWriter inner) : TextWriter
{
    public override Encoding Encoding => inner.Encoding;
    [System.Diagnostics.CodeAnalysis.AllowNull]
    public override string NewLine { get => inner.NewLine; set => inner.NewLine = value; }

    public override void Write(char value) => inner.Write(VisibleText.Of(value.ToString(), keepLineBreaks: true));
    public override void Write(string? value) => inner.Write(value is null ? null : VisibleText.Of(value, keepLineBreaks: true));
    public override void Write(char[] buffer, int index, int count) => Write(new string(buffer, index, count));
    public override void WriteLine(string? value) => inner.WriteLine(value is null ? null : VisibleText.Of(value, keepLineBreaks: true));
    public override void Flush() => inner.Flush();

    public override string ToString() => inner.ToString() ?? "";
}
