namespace DesignCompiler.Tests.Ledger;

/// <summary>Edits to the lines of a CSV sheet, and where a field starts, for building spoilt sheets and the positions expected in their errors.</summary>
public static class SheetLines
{
    /// <summary>The fields of a line, split on commas outside quotes, quotes kept as written.</summary>
    public static List<string> Fields(string line)
    {
        var fields = new List<string>();
        var start = 0;
        var quoted = false;
        for (var i = 0; i < line.Length; i++)
        {
            if (line[i] == '"') quoted = !quoted;
            else if (line[i] == ',' && !quoted)
            {
                fields.Add(line[start..i]);
                start = i + 1;
            }
        }
        fields.Add(line[start..]);
        return fields;
    }

    /// <summary>The line with one field replaced by text written as is (add quotes yourself).</summary>
    public static string WithField(string line, int field, string text)
    {
        var fields = Fields(line);
        fields[field] = text;
        return string.Join(",", fields);
    }

    /// <summary>The one-based column where a field starts: the character after the comma before it.</summary>
    public static int Column(string line, int field)
    {
        var fields = Fields(line);
        return fields.Take(field).Sum(f => f.Length + 1) + 1;
    }

    public static List<string> Replace(IReadOnlyList<string> lines, int index, Func<string, string> change)
    {
        var copy = lines.ToList();
        copy[index] = change(copy[index]);
        return copy;
    }
}
