using DesignCompiler.Diagnostics;

namespace DesignCompiler.Ledger;

/// <summary>
/// The TD4xxx diagnostics: returned result sheets (TD40xx) and the trial ledger (TD41xx).
/// Built like <see cref="DiagnosticCatalog"/>'s; kept here so the ledger owns its ids.
/// Ids never change meaning once released.
/// </summary>
public static class LedgerDiagnostics
{
    private static DiagnosticDescriptor Error(string id, string format) => new(id, Severity.Error, format);
    private static DiagnosticDescriptor Warning(string id, string format) => new(id, Severity.Warning, format);

    // --- TD40xx: result sheets ---------------------------------------------------
    public static readonly DiagnosticDescriptor ResultsUnreadable = Error("TD4001", "cannot read the results: {0}");
    public static readonly DiagnosticDescriptor NotText = Error("TD4002", "the file is not a CSV text sheet: {0}");
    public static readonly DiagnosticDescriptor NotAWorkbook = Error("TD4030", "the file is not a workbook trialc can read: {0}");
    public static readonly DiagnosticDescriptor NoHeaderRow = Error("TD4031", "sheet '{0}' has cells filled in but no header row; its plot table starts with a row '{1}'");
    public static readonly DiagnosticDescriptor DateInOutcome = Error("TD4032", "outcome of plot '{0}' is formatted as a date or time, so the spreadsheet changed what was typed; format the column as General and write {1}");
    public static readonly DiagnosticDescriptor EmptySheet = Error("TD4003", "the file is empty; a results sheet starts with the header '{0}'");
    public static readonly DiagnosticDescriptor HeaderMismatch = Error("TD4004", "{0}");
    public static readonly DiagnosticDescriptor CsvMalformed = Error("TD4005", "{0}");
    public static readonly DiagnosticDescriptor NoRows = Error("TD4007", "the sheet has its header but no plot rows; return the sheet with the outcomes filled in");
    public static readonly DiagnosticDescriptor TooManyRows = Error("TD4009", "the sheet has more than {0} rows; the largest issued round has {1} plots, so this is not a results sheet of this trial (check the file, or remove the rows below the plots)");
    public static readonly DiagnosticDescriptor FieldCount = Error("TD4006", "this row has {0} fields; a sheet row has {1}: {2}");

    public static readonly DiagnosticDescriptor RoundNotWhole = Error("TD4010", "round '{0}' is not a round number");
    public static readonly DiagnosticDescriptor RoundNotIssued = Error("TD4011", "round {0} has not been issued; {1}");
    public static readonly DiagnosticDescriptor RoundAlreadyRecorded = Error("TD4012", "round {0} is already recorded ({1}); a round is recorded once");
    public static readonly DiagnosticDescriptor FileAlreadyRecorded = Error("TD4013", "this file is already recorded as round {0} ({1})");
    public static readonly DiagnosticDescriptor MixedRounds = Error("TD4014", "this row is for round {0} but the sheet's first row is for round {1}; one file holds one round");
    public static readonly DiagnosticDescriptor UnknownPlot = Error("TD4015", "plot '{0}' was not issued in round {1}");
    public static readonly DiagnosticDescriptor WrongArm = Error("TD4016", "plot '{0}' was issued with arm '{1}' in round {2}, not '{3}'");
    public static readonly DiagnosticDescriptor WrongPlace = Error("TD4017", "plot '{0}' has {1} '{2}' on the issued sheet, not '{3}'");
    public static readonly DiagnosticDescriptor DuplicatePlot = Error("TD4018", "plot '{0}' appears twice; its first row is {1}");
    public static readonly DiagnosticDescriptor MissingPlot = Error("TD4019", "plot '{0}' (arm '{1}') of round {2} has no row in the file");
    public static readonly DiagnosticDescriptor BlankOutcome = Error("TD4020", "plot '{0}' has no outcome; write {1}, or 'missing: reason'");
    public static readonly DiagnosticDescriptor NotANumber = Error("TD4021", "outcome '{0}' is not a number; write {1}, or 'missing: reason'");
    public static readonly DiagnosticDescriptor OutsideSupport = Error("TD4022", "outcome {0} is not a value a {1} outcome takes: {2}");
    public static readonly DiagnosticDescriptor AmbiguousComma = Error("TD4023", "outcome '{0}' is ambiguous: {1}");
    public static readonly DiagnosticDescriptor ThousandsSeparator = Error("TD4024", "outcome '{0}' has a thousands separator or more than one decimal mark; write digits with at most one decimal point, like {1}");
    public static readonly DiagnosticDescriptor CommaNotDecimal = Error("TD4025", "outcome '{0}' has a comma; a {1} outcome takes {2}, written with digits only");

    // --- TD41xx: the ledger ------------------------------------------------------
    public static readonly DiagnosticDescriptor LedgerUnreadable = Error("TD4101", "cannot open the ledger: {0}");
    public static readonly DiagnosticDescriptor NotALedger = Error("TD4102", "this is not a trial ledger: {0}");
    public static readonly DiagnosticDescriptor LedgerLocked = Error("TD4103", "the ledger is busy: another trialc, or another program that has the file open, has held its lock for over {0} s; try again when that command has finished, or close the program");
    public static readonly DiagnosticDescriptor LedgerChanged = Error("TD4104", "the ledger was changed outside trialc: {0}");
    public static readonly DiagnosticDescriptor LedgerMissing = Error("TD4105", "there is no ledger here; 'trialc compile DESIGN --ledger {0} --out DIR' starts one with round 1");
    public static readonly DiagnosticDescriptor SchemaTooNew = Error("TD4106", "the ledger has schema version {0}; this trialc reads version {1}: use a newer trialc");
    public static readonly DiagnosticDescriptor LedgerWriteFailed = Error("TD4107", "cannot write to the ledger: {0}");

    public static readonly DiagnosticDescriptor DesignChanged = Error("TD4110", "the design text changed since {0} (design {1}, now {2}); to go on under the new text, compile with --amend \"reason\"");
    public static readonly DiagnosticDescriptor AmendmentDoesNotFit = Error("TD4111", "the amended design does not fit the recorded trial: {0}");
    public static readonly DiagnosticDescriptor NothingToAmend = Warning("TD4112", "--amend is ignored: the design text is unchanged since {0}");
    public static readonly DiagnosticDescriptor RoundAwaitsResults = Error("TD4113", "round {0} still awaits results for {1} plot(s): {2}; record them with 'trialc record' before round {3} is compiled");
    public static readonly DiagnosticDescriptor ReplayDiffers = Error("TD4114", "round {0} as stored differs from what the planner gives from the same design and data: {1}");
    public static readonly DiagnosticDescriptor ReplayDiffersOtherVersion = Warning("TD4115", "round {0} was issued by trialc {1}, whose plan differs from this version's ({2}); the stored round stands");
    public static readonly DiagnosticDescriptor ReplayFiguresDiffer = Warning("TD4118", "round {0} as stored has posterior figures this build computes slightly differently ({1}); the stored round stands");
    public static readonly DiagnosticDescriptor RoundNotNext = Error("TD4116", "round {0} cannot be compiled now: {1}");
    public static readonly DiagnosticDescriptor RecordedArmUnknown = Error("TD4117", "arm '{0}' of round {1} is not in the design; the ledger was written under another design");
}
