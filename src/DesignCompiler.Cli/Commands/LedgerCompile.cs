using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;
using DesignCompiler.Ledger;
using DesignCompiler.Planning;
using DesignCompiler.Rendering;
using DesignCompiler.Rendering.Output;

namespace DesignCompiler.Cli.Commands;

/// <summary>
/// <c>trialc compile DESIGN --ledger L</c>: issues the trial's next round from what the ledger
/// holds, or re-issues the round that awaits results exactly as it was issued. Everything is
/// decided inside one ledger transaction; the sheets are written after it commits, so a failed
/// write leaves a round that the next compile re-issues, never a round without an entry.
/// </summary>
internal static class LedgerCompile
{
    private enum Kind
    {
        Issued,
        Reissued,
        Stopped,
        Complete,
    }

    private sealed record Outcome(
        Kind Kind, RoundPlan? Plan, IReadOnlyList<(string Name, byte[] Content)> Files, string PlanJson, IReadOnlyList<string> Messages);

    public static int Run(CliConsole console, string designPath, CheckedDesign design, RoundPlanner planner,
        string ledgerPath, string? outDirectory, string format, string? amend, int? round, IReadOnlyList<UserTemplate> templates)
    {
        var isNew = !File.Exists(ledgerPath);
        using var ledger = LedgerCommandSupport.Open(console, ledgerPath, create: true);
        if (ledger is null) return ExitCodes.InputErrors;

        var stem = Path.GetFileNameWithoutExtension(designPath);
        var result = ledger.Update(LedgerCommandSupport.Actor(),
            (history, appender) => Decide(design, planner, history, appender, stem, amend, round, templates));
        console.Report(result.Diagnostics);
        if (result.HasErrors || result.Value is not { } outcome)
        {
            // A ledger this command created holds nothing after a failed first round: take it away again, so nothing is left behind.
            if (isNew)
            {
                ledger.Dispose();
                DiscardEmptyLedger(ledgerPath);
            }
            return ExitCodes.InputErrors;
        }

        // With --format json standard output carries the plan alone, so the messages go beside it.
        var messages = format == "json" && outcome.Plan is not null ? console.Error : console.Out;
        foreach (var message in outcome.Messages) messages.WriteLine(message);
        if (outcome.Plan is not { } plan) return ExitCodes.Ok;

        if (format == "json")
        {
            console.Out.Write(outcome.PlanJson);
            return ExitCodes.Ok;
        }
        var failure = AtomicOutput.WriteAll(outDirectory!, outcome.Files);
        if (failure is not null)
        {
            console.Report([new Diagnostic(DiagnosticCatalog.OutputUnwritable, SourceLocation.File(outDirectory!), [failure],
                FormattableString.Invariant($"round {plan.Round} is in the ledger; compile again to re-issue its sheets"))]);
            return ExitCodes.InputErrors;
        }
        PlanSummary.Write(console.Out, plan);
        foreach (var (name, _) in outcome.Files) console.Out.WriteLine("  wrote " + Path.Combine(outDirectory!, name));
        return ExitCodes.Ok;
    }

    private static LedgerResult<Outcome> Decide(CheckedDesign design, RoundPlanner planner, LedgerHistory history, LedgerAppender appender,
        string stem, string? amend, int? round, IReadOnlyList<UserTemplate> templates)
    {
        var warnings = new List<Diagnostic>();
        var messages = new List<string>();
        var location = SourceLocation.File(design.Source.Path);

        if (history.CurrentDesignHash is { } current && current != design.Hash)
        {
            if (amend is null)
                return Fail(new Diagnostic(LedgerDiagnostics.DesignChanged, location, [Since(history), current[..12], design.ShortHash]));
            var previous = StoredDesign.Bind(history, current, design.Source.Path);
            var misfits = AmendmentCheck.Problems(design, previous, history);
            if (misfits.Count > 0) return Fail(misfits);
            var entry = appender.Amend(current, design, amend, history.LastRound?.Round ?? 0);
            messages.Add(FormattableString.Invariant(
                $"amended the design ({current[..12]} -> {design.ShortHash}) as entry {entry.Seq}: {amend}"));
        }
        else if (amend is not null)
            warnings.Add(new Diagnostic(LedgerDiagnostics.NothingToAmend, location,
                [history.LastRound is { } issued ? FormattableString.Invariant($"round {issued.Round} was issued") : "the ledger was started"]));

        if (history.LastRound is { IsRecorded: false } open)
        {
            var awaiting = LedgerCommandSupport.PlotList(open.Plots.Select(p => p.PlotId));
            if (round == open.Round + 1)
                return Fail(new Diagnostic(LedgerDiagnostics.RoundAwaitsResults, location, [open.Round, open.Plots.Count, awaiting, round]));
            if (round is not null && round != open.Round)
                return Fail(new Diagnostic(LedgerDiagnostics.RoundNotNext, location,
                    [round, FormattableString.Invariant($"round {open.Round} is issued and awaits its results")]));
            return Reissue(history, open, design, stem, messages, warnings, templates);
        }

        var next = (history.LastRound?.Round ?? 0) + 1;
        if (round is not null && round != next)
            return Fail(new Diagnostic(LedgerDiagnostics.RoundNotNext, location, [round, round < next
                ? FormattableString.Invariant($"it is already issued and recorded; the next round is {next}")
                : FormattableString.Invariant($"the next round is {next}")]));
        if (next > design.Rounds)
        {
            messages.Add(FormattableString.Invariant($"{design.Name}: all {design.Rounds} rounds are issued and recorded; there is no round to compile"));
            return LedgerResult<Outcome>.Ok(new Outcome(Kind.Complete, null, [], "", messages), warnings);
        }

        var replay = ReplayCheck.Check(planner, history, appender.Actor.ToolVersion);
        if (replay.Any(d => d.Severity == Severity.Error)) return Fail(replay);
        warnings.AddRange(replay);

        var state = TrialReplay.Before(design, history, next);
        if (state.Value is null) return Fail(state.Diagnostics);
        var planned = planner.Plan(state.Value, next);
        if (planned.HasErrors) return Fail(planned.Diagnostics);
        if (planned.Plan is not { } plan)
        {
            messages.Add(planned.StopReason ?? "the planner gives no round");
            messages.Add(FormattableString.Invariant($"round {next} is not issued"));
            return LedgerResult<Outcome>.Ok(new Outcome(Kind.Stopped, null, [], "", messages), warnings);
        }

        var json = RoundOutputs.Json(plan, design);
        var figures = RoundFigures.FromLedger(design, history, next);
        if (figures.Value is null) return Fail(figures.Diagnostics);
        var (files, problems) = RoundOutputs.Render(plan, design, stem, appender.Actor.AtText[..10], figures.Value, templates);
        if (problems.Any(d => d.Severity == Severity.Error)) return Fail(problems);
        var issuedEntry = appender.Issue(design, plan, json);
        messages.Add(FormattableString.Invariant($"issued round {next} into the ledger as entry {issuedEntry.Seq} ({issuedEntry.At} by {issuedEntry.User})"));
        return LedgerResult<Outcome>.Ok(new Outcome(Kind.Issued, plan, files, json, messages), warnings);
    }

    /// <summary>The round awaiting results, rendered again from its stored plan and design text, with its JSON exactly as stored.</summary>
    private static LedgerResult<Outcome> Reissue(LedgerHistory history, IssuedRound open, CheckedDesign design, string stem,
        List<string> messages, List<Diagnostic> warnings, IReadOnlyList<UserTemplate> templates)
    {
        var issuedUnder = StoredDesign.Bind(history, open.Entry.DesignHash, design.Source.Path) ?? design;
        var plan = open.ReadPlan();
        var figures = RoundFigures.FromLedger(issuedUnder, history, open.Round);
        if (figures.Value is null) return Fail(figures.Diagnostics);
        var (files, problems) = RoundOutputs.Render(plan, issuedUnder, stem, open.Entry.Date, figures.Value, templates);
        if (problems.Any(d => d.Severity == Severity.Error)) return Fail(problems);
        var jsonName = FormattableString.Invariant($"{stem}-round{open.Round}.json");
        var stored = files.Select(f => f.Name == jsonName ? (f.Name, new System.Text.UTF8Encoding(false).GetBytes(open.PlanJson)) : f).ToList();
        messages.Add(FormattableString.Invariant(
            $"round {open.Round} was issued on {open.Entry.Date} by {open.Entry.User} and awaits results for {open.Plots.Count} plots; its sheets are issued again unchanged"));
        return LedgerResult<Outcome>.Ok(new Outcome(Kind.Reissued, plan, stored, open.PlanJson, messages), warnings);
    }

    private static void DiscardEmptyLedger(string path)
    {
        try
        {
            File.Delete(path);
        }
        catch (IOException)
        {
            // An empty ledger left behind is harmless: the next compile starts round 1 in it.
        }
        catch (UnauthorizedAccessException)
        {
        }
    }

    private static string Since(LedgerHistory history)
    {
        var setter = history.CurrentDesignEntry;
        return setter is { Kind: EntryKinds.Amend }
            ? FormattableString.Invariant($"it was amended on {setter.Date} (entry {setter.Seq})")
            : history.LastRound is { } last
                ? FormattableString.Invariant($"round {last.Round} was issued on {last.Entry.Date}")
                : "the ledger was started";
    }

    private static LedgerResult<Outcome> Fail(params IReadOnlyList<Diagnostic> diagnostics) => LedgerResult<Outcome>.Fail(diagnostics);
}
