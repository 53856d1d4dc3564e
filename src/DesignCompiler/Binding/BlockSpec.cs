using DesignCompiler.Text;

namespace DesignCompiler.Binding;

/// <summary>
/// A block (field) of plots, the same plots every round. With a layout the plots are
/// numbered row by row; <see cref="IsImplicit"/> marks the single block made from
/// <c>plots N per round</c>.
/// </summary>
public sealed record BlockSpec(int Index, string Name, int Plots, int? Rows, int? Columns, bool IsImplicit, TextSpan Span)
{
    public bool HasLayout => Rows is not null && Columns is not null;

    /// <summary>The plot's id, stable across rounds: block-row-column with a layout, else block-number.</summary>
    public string PlotId(int plotIndex) =>
        HasLayout
            ? FormattableString.Invariant($"{Name}-{plotIndex / Columns!.Value + 1}-{plotIndex % Columns.Value + 1}")
            : FormattableString.Invariant($"{Name}-{plotIndex + 1}");

    public int? RowOf(int plotIndex) => HasLayout ? plotIndex / Columns!.Value + 1 : null;

    public int? ColumnOf(int plotIndex) => HasLayout ? plotIndex % Columns!.Value + 1 : null;
}
