using System.Security.Cryptography;
using System.Text;
using DesignCompiler.Ledger;

namespace DesignCompiler.Tests.Ledger;

/// <summary>The hash chain as documented: each entry's hash is SHA-256 (FIPS 180-4) of the previous hash, a line feed and the entry's canonical text.</summary>
public sealed class LedgerChainTests
{
    [Fact]
    public void Sha256_is_the_standard_one()
    {
        // FIPS 180-2, appendix B.1: SHA-256("abc").
        Assert.Equal("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
            Convert.ToHexStringLower(SHA256.HashData("abc"u8)));
    }

    [Fact]
    public void Every_entry_hashes_its_predecessor_and_its_canonical_text()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        trial.Issue(1);
        Assert.Equal(0, trial.Record(trial.FillBernoulli(1, 51, new Dictionary<string, double> { ["OV"] = 0.5, ["RC"] = 0.5, ["MP"] = 0.5, ["BP"] = 0.5 })).ExitCode);

        using var connection = LedgerDump.Open(trial.Ledger);
        using var transaction = connection.BeginTransaction();
        var rows = LedgerQueries.ReadAll(connection, transaction);
        Assert.Equal(["issue", "record"], rows.Entries.Select(e => e.Kind));
        var previous = new string('0', 64);
        foreach (var entry in rows.Entries)
        {
            Assert.Equal(previous, entry.PrevHash);
            var canonical = EntryText.Canonical(entry, rows);
            Assert.StartsWith("trialc ledger entry v1\nseq " + entry.Seq + "\n", canonical);
            var expected = Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(previous + "\n" + canonical)));
            Assert.Equal(expected, entry.Hash);
            previous = entry.Hash;
        }
        Assert.Equal(previous, rows.Meta["head_hash"]);
        Assert.Equal("2", rows.Meta["entry_count"]);
        Assert.Equal("1", rows.Meta["schema_version"]);
        Assert.Contains("\noutcome 1 0 \"north-1-1\" ", EntryText.Canonical(rows.Entries[1], rows));
    }

    [Fact]
    public void Quoting_keeps_every_value_inside_its_field()
    {
        Assert.Equal("\"a \\\"b\\\" \\\\ \\u000a\"", EntryText.Quote("a \"b\" \\ \n"));
        Assert.Equal("null", EntryText.Quote(null));
    }
}
