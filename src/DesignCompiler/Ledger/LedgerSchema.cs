namespace DesignCompiler.Ledger;

/// <summary>
/// The ledger's tables. Every fact belongs to one entry; each entry's hash covers the entry and
/// all rows that belong to it, and chains to the entry before, so any edit made outside trialc
/// shows. Designs are stored once per text, keyed by their SHA-256.
/// </summary>
internal static class LedgerSchema
{
    /// <summary>Bumped whenever a table or the canonical entry text changes; older trialc versions then refuse the file.</summary>
    public const int Version = 1;

    /// <summary>SQLite's application id for ledger files ("TRLG"), so a ledger is told from any other SQLite file.</summary>
    public const int ApplicationId = 0x54524C47;

    /// <summary>The 64 zeros the first entry chains to.</summary>
    public const string GenesisHash = "0000000000000000000000000000000000000000000000000000000000000000";

    public const string Create = """
        CREATE TABLE meta (
          key   TEXT PRIMARY KEY NOT NULL,
          value TEXT NOT NULL
        ) WITHOUT ROWID;

        CREATE TABLE designs (
          hash TEXT PRIMARY KEY NOT NULL,   -- SHA-256 of the text, lower-case hex
          text TEXT NOT NULL
        ) WITHOUT ROWID;

        CREATE TABLE entries (
          seq          INTEGER PRIMARY KEY,  -- 1, 2, 3 ... in the order written
          kind         TEXT NOT NULL CHECK (kind IN ('issue', 'record', 'amend')),
          round        INTEGER NOT NULL,     -- the round issued or recorded; for an amendment, the last round issued
          design_hash  TEXT NOT NULL REFERENCES designs(hash),
          user_name    TEXT NOT NULL,
          recorded_at  TEXT NOT NULL,        -- UTC, ISO 8601
          tool_version TEXT NOT NULL,
          prev_hash    TEXT NOT NULL,
          hash         TEXT NOT NULL
        );

        CREATE TABLE rounds (
          round     INTEGER PRIMARY KEY,
          entry_seq INTEGER NOT NULL UNIQUE REFERENCES entries(seq),
          plan_json TEXT NOT NULL,           -- the plan JSON written beside the sheets
          plan_data TEXT NOT NULL            -- the plan's figures, read back to re-issue the same sheets
        );

        CREATE TABLE plots (
          round       INTEGER NOT NULL REFERENCES rounds(round),
          ordinal     INTEGER NOT NULL,      -- place on the sheet, from 0
          block       TEXT NOT NULL,
          block_index INTEGER NOT NULL,
          plot_index  INTEGER NOT NULL,
          plot_id     TEXT NOT NULL,
          row         INTEGER,
          col         INTEGER,
          arm         TEXT NOT NULL,
          arm_index   INTEGER NOT NULL,
          PRIMARY KEY (round, ordinal),
          UNIQUE (round, plot_id)
        ) WITHOUT ROWID;

        CREATE TABLE records (
          entry_seq   INTEGER PRIMARY KEY REFERENCES entries(seq),
          round       INTEGER NOT NULL UNIQUE REFERENCES rounds(round),
          file_name   TEXT NOT NULL,
          file_sha256 TEXT NOT NULL UNIQUE
        );

        CREATE TABLE outcomes (
          round          INTEGER NOT NULL,
          ordinal        INTEGER NOT NULL,   -- the plot's place on the issued sheet
          plot_id        TEXT NOT NULL,
          arm            TEXT NOT NULL,
          value          REAL,               -- NULL when missing
          value_text     TEXT,               -- as written on the sheet
          missing_reason TEXT,               -- NULL when there is a value; '' when missing without a reason
          notes          TEXT NOT NULL,
          line           INTEGER NOT NULL,   -- line of the returned sheet
          entry_seq      INTEGER NOT NULL REFERENCES records(entry_seq),
          PRIMARY KEY (round, ordinal),
          FOREIGN KEY (round, ordinal) REFERENCES plots(round, ordinal),
          CHECK ((value IS NULL) <> (missing_reason IS NULL))
        ) WITHOUT ROWID;

        CREATE TABLE amendments (
          entry_seq INTEGER PRIMARY KEY REFERENCES entries(seq),
          old_hash  TEXT NOT NULL,
          new_hash  TEXT NOT NULL REFERENCES designs(hash),
          reason    TEXT NOT NULL
        );
        """;
}
