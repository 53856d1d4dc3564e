using System.Text;

namespace DesignCompiler.Rendering.Simulation;

/// <summary>A plain-text table with padded columns: the first column left-aligned, the others right-aligned (numbers).</summary>
public sealed class TextTable
{
    private readonly List<string[]> _rows = [];

    public TextTable Row(params string[] cells)
    {
        _rows.Add(cells);
        return this;
    }

    public void WriteTo(StringBuilder output, string indent)
    {
        if (_rows.Count == 0) return;
        var columns = _rows.Max(r => r.Length);
        var widths = new int[columns];
        foreach (var row in _rows)
            for (var c = 0; c < row.Length; c++) widths[c] = Math.Max(widths[c], row[c].Length);
        foreach (var row in _rows)
        {
            var line = new StringBuilder(indent);
            for (var c = 0; c < row.Length; c++)
            {
                if (c > 0) line.Append("  ");
                line.Append(c == 0 ? row[c].PadRight(widths[c]) : row[c].PadLeft(widths[c]));
            }
            output.Append(line.ToString().TrimEnd()).Append('\n');
        }
    }
}
