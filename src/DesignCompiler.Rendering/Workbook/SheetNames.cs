namespace DesignCompiler.Rendering.Workbook;

/// <summary>
/// Worksheet names for blocks. Spreadsheets allow at most 31 characters, none of <c>: \ / ? * [ ]</c>,
/// no apostrophe at either end, and no two names that differ only in letter case; block names
/// that break a rule are mended, and a clash gets a number. The block column of every row, not
/// the sheet name, says which block a plot is in, so a mended name changes nothing that is read back.
/// </summary>
internal static class SheetNames
{
    private const int MaxLength = 31;

    public static IReadOnlyList<string> For(IEnumerable<string> blocks)
    {
        var used = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        var names = new List<string>();
        foreach (var block in blocks)
        {
            var name = Mend(block);
            var candidate = name;
            for (var k = 2; !used.Add(candidate); k++)
            {
                var suffix = " (" + k.ToString(System.Globalization.CultureInfo.InvariantCulture) + ")";
                candidate = name[..Math.Min(name.Length, MaxLength - suffix.Length)] + suffix;
            }
            names.Add(candidate);
        }
        return names;
    }

    private static string Mend(string block)
    {
        var chars = block.Select(c => c is ':' or '\\' or '/' or '?' or '*' or '[' or ']' || char.IsControl(c) ? '_' : c).ToArray();
        var name = new string(chars).Trim('\'');
        if (name.Length == 0 || name.Equals("History", StringComparison.OrdinalIgnoreCase)) name = "block " + name;
        return name.Length > MaxLength ? name[..MaxLength] : name;
    }
}
