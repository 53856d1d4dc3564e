using DesignCompiler.Diagnostics;
using DesignCompiler.Simulation.Accumulators;
using DesignCompiler.Simulation.Running;

namespace DesignCompiler.Simulation.Partials;

/// <summary>A partial summary read from a file, with the path it came from for messages.</summary>
public sealed record PartialFile(string Path, SimulationResult Result);

/// <summary>
/// Combines the parts of a sharded simulation into the result one run would have given. The
/// parts must come from the same simulation (same setup, same shard count) and cover every
/// shard exactly once; because the summaries are exact, the order of the parts does not matter.
/// </summary>
public static class PartialMerge
{
    public static (SimulationResult? Merged, IReadOnlyList<Diagnostic> Problems) Merge(IReadOnlyList<PartialFile> parts)
    {
        var problems = new List<Diagnostic>();
        if (parts.Count == 0) return (null, problems);
        var first = parts[0];
        var setupText = PartialWriter.SetupText(first.Result.Setup);
        var count = first.Result.Shard.Count;
        var seen = new Dictionary<int, string>();
        foreach (var part in parts)
        {
            var shard = part.Result.Shard;
            if (PartialWriter.SetupText(part.Result.Setup) != setupText || (part.Result.Twin is null) != (first.Result.Twin is null))
                problems.Add(Problem(SimulationDiagnostics.PartialsDisagree, part.Path, first.Path, Difference(first.Result.Setup, part.Result.Setup)));
            else if (shard.Count != count)
                problems.Add(Problem(SimulationDiagnostics.PartialsDisagree, part.Path, first.Path,
                    FormattableString.Invariant($"it is shard {shard} of a run split {shard.Count} ways, not {count}")));
            else if (seen.TryGetValue(shard.Index, out var other))
                problems.Add(Problem(SimulationDiagnostics.ShardsIncomplete, part.Path,
                    FormattableString.Invariant($"shard {shard} is given twice (also {other})")));
            else seen[shard.Index] = part.Path;
        }
        if (problems.Count > 0) return (null, problems);

        var missing = Enumerable.Range(1, count).Where(k => !seen.ContainsKey(k)).ToList();
        if (missing.Count > 0)
            return (null, [Problem(SimulationDiagnostics.ShardsIncomplete, first.Path,
                FormattableString.Invariant($"shard{(missing.Count == 1 ? "" : "s")} {string.Join(", ", missing.Select(k => $"{k}/{count}"))} {(missing.Count == 1 ? "is" : "are")} missing; merge needs all {count}"))]);

        var setup = first.Result.Setup;
        var totals = setup.Scenarios.Select(_ => new ScenarioAccumulator(setup.Arms.Count, setup.Rounds, setup.PlotsPerRound, setup.Margin)).ToArray();
        foreach (var part in parts)
            for (var s = 0; s < totals.Length; s++) totals[s].Add(part.Result.Scenarios[s]);
        var merged = new SimulationResult(setup, Shard.Whole, totals, parts.Any(p => p.Result.CutShort));
        if (first.Result.Twin is not { } firstTwin) return (merged, []);
        var twinSetup = firstTwin.Setup;
        var twinTotals = twinSetup.Scenarios.Select(_ => new ScenarioAccumulator(twinSetup.Arms.Count, twinSetup.Rounds, twinSetup.PlotsPerRound, twinSetup.Margin)).ToArray();
        var paired = twinSetup.Scenarios.Select(_ => new PairedAccumulator()).ToArray();
        foreach (var part in parts)
            for (var s = 0; s < twinTotals.Length; s++)
            {
                twinTotals[s].Add(part.Result.Twin!.Scenarios[s]);
                paired[s].Add(part.Result.Twin.Differences[s]);
            }
        return (merged with { Twin = new TwinResult(twinSetup, twinTotals, paired) }, []);
    }

    private static string Difference(SimulationSetup a, SimulationSetup b)
    {
        if (a.DesignHash != b.DesignHash) return "it was made from a different design file";
        if (a.Seed != b.Seed) return FormattableString.Invariant($"it used seed {b.Seed}, not {a.Seed}");
        if (a.Replications != b.Replications) return FormattableString.Invariant($"it was part of {b.Replications} replications, not {a.Replications}");
        if (a.Margin != b.Margin) return "it used another margin";
        if (a.Policy != b.Policy) return "it simulated another policy";
        return "its scenarios or settings differ";
    }

    private static Diagnostic Problem(DiagnosticDescriptor descriptor, string path, params object[] arguments) =>
        new(descriptor, SourceLocation.File(path), arguments);
}
