namespace WindScript.Text;

/// <summary>A zero-based line and a zero-based column counted in UTF-16 code units (what LSP counts).</summary>
public readonly record struct LinePosition(int Line, int Character)
{
    /// <summary>"line:column", both 1-based.</summary>
    public override string ToString() => $"{Line + 1}:{Character + 1}";
}
