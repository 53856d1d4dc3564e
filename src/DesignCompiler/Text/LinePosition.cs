namespace DesignCompiler.Text;

/// <summary>A position as people count it: one-based line and column.</summary>
public readonly record struct LinePosition(int Line, int Column) : IComparable<LinePosition>
{
    public int CompareTo(LinePosition other) =>
        Line != other.Line ? Line.CompareTo(other.Line) : Column.CompareTo(other.Column);

    public override string ToString() => $"{Line}:{Column}";
}
