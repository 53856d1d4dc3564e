namespace DesignCompiler.Text;

/// <summary>A range of characters in a source text: zero-based start offset and length.</summary>
public readonly record struct TextSpan(int Start, int Length)
{
    public int End => Start + Length;

    public static TextSpan FromBounds(int start, int end) => new(start, Math.Max(0, end - start));

    /// <summary>The smallest span covering both.</summary>
    public TextSpan Cover(TextSpan other) => FromBounds(Math.Min(Start, other.Start), Math.Max(End, other.End));

    public override string ToString() => $"[{Start}..{End})";
}
