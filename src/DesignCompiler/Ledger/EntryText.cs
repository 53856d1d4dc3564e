using System.Globalization;
using System.Security.Cryptography;
using System.Text;

namespace DesignCompiler.Ledger;

/// <summary>
/// The canonical text of one ledger entry: the entry's own fields and every row that belongs to
/// it (an issued round's plan and plots; a recording's outcomes; an amendment), one field per
/// line, strings quoted and escaped, numbers in the invariant round-trip form, rows in key order.
/// The entry's hash is SHA-256 of the previous entry's hash, a line feed and this text, so a
/// changed, deleted, inserted or reordered row changes some entry's hash. The format is fixed by
/// <see cref="LedgerSchema.Version"/>: changing it would break every existing chain.
/// </summary>
internal static class EntryText
{
    public static string Canonical(EntryRow entry, LedgerRows rows)
    {
        var text = new StringBuilder();
        text.Append("trialc ledger entry v1\n");
        Field(text, "seq", Number(entry.Seq));
        Field(text, "kind", Quote(entry.Kind));
        Field(text, "round", Number(entry.Round));
        Field(text, "design", Quote(entry.DesignHash));
        Field(text, "user", Quote(entry.User));
        Field(text, "at", Quote(entry.At));
        Field(text, "tool", Quote(entry.ToolVersion));

        foreach (var round in rows.Rounds.Where(r => r.EntrySeq == entry.Seq))
        {
            Field(text, "issued", Number(round.Round), Quote(round.PlanJson), Quote(round.PlanData));
            foreach (var p in rows.Plots.Where(p => p.Round == round.Round))
                Field(text, "plot", Number(p.Ordinal), Quote(p.Block), Number(p.BlockIndex), Number(p.PlotIndex), Quote(p.PlotId),
                    Optional(p.Row), Optional(p.Column), Quote(p.Arm), Number(p.ArmIndex));
        }
        foreach (var record in rows.Records.Where(r => r.EntrySeq == entry.Seq))
            Field(text, "recorded", Number(record.Round), Quote(record.FileName), Quote(record.FileSha256));
        foreach (var o in rows.Outcomes.Where(o => o.EntrySeq == entry.Seq))
            Field(text, "outcome", Number(o.Round), Number(o.Ordinal), Quote(o.PlotId), Quote(o.Arm), Real(o.Value), Quote(o.ValueText),
                Quote(o.MissingReason), Quote(o.Notes), Number(o.Line));
        foreach (var amendment in rows.Amendments.Where(a => a.EntrySeq == entry.Seq))
            Field(text, "amended", Quote(amendment.OldHash), Quote(amendment.NewHash), Quote(amendment.Reason));
        return text.ToString();
    }

    public static string Hash(string previousHash, string canonical) =>
        Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(previousHash + "\n" + canonical)));

    private static void Field(StringBuilder text, string name, params string[] values)
    {
        text.Append(name);
        foreach (var value in values) text.Append(' ').Append(value);
        text.Append('\n');
    }

    private static string Number(long value) => value.ToString(CultureInfo.InvariantCulture);

    private static string Optional(int? value) => value?.ToString(CultureInfo.InvariantCulture) ?? "null";

    private static string Real(double? value) => value?.ToString("R", CultureInfo.InvariantCulture) ?? "null";

    /// <summary>A quoted string with quote, backslash and control characters escaped, so no value can fake a field boundary.</summary>
    internal static string Quote(string? value)
    {
        if (value is null) return "null";
        var text = new StringBuilder(value.Length + 2).Append('"');
        foreach (var c in value)
        {
            if (c == '"' || c == '\\') text.Append('\\').Append(c);
            else if (c < 0x20 || c == 0x7F) text.Append("\\u").Append(((int)c).ToString("x4", CultureInfo.InvariantCulture));
            else text.Append(c);
        }
        return text.Append('"').ToString();
    }
}
