using System.Text.Json;
using DesignCompiler.Simulation.Accumulators;
using DesignCompiler.Simulation.Running;

namespace DesignCompiler.Simulation.Partials;

/// <summary>
/// Reads a partial summary file back into exact summaries. Anything that is not a file
/// <see cref="PartialWriter"/> wrote, or whose numbers do not fit together, is a
/// <see cref="FormatException"/> with the reason in words.
/// </summary>
public static class PartialReader
{
    public static SimulationResult Read(string text)
    {
        try
        {
            using var document = JsonDocument.Parse(text, new JsonDocumentOptions { MaxDepth = 16 });
            var root = document.RootElement;
            if (root.ValueKind != JsonValueKind.Object || Str(root, "format") != PartialWriter.FormatName)
                throw new FormatException($"it does not say \"format\": \"{PartialWriter.FormatName}\"");
            var version = root.GetProperty("version").GetInt32();
            if (version != PartialWriter.FormatVersion)
                throw new FormatException($"it is version {version}; this trialc reads version {PartialWriter.FormatVersion}");
            var shardElement = root.GetProperty("shard");
            var shard = new Shard(shardElement.GetProperty("index").GetInt32(), shardElement.GetProperty("count").GetInt32());
            if (shard.Count < 1 || shard.Index < 1 || shard.Index > shard.Count) throw new FormatException($"shard {shard} is impossible");
            var setup = ReadSetup(root.GetProperty("setup"));
            var summaries = root.GetProperty("scenarios").EnumerateArray().Select(s => ReadSummary(s, setup)).ToList();
            if (summaries.Count != setup.Scenarios.Count) throw new FormatException("it has summaries for a different number of scenarios than it lists");
            return new SimulationResult(setup, shard, summaries, root.GetProperty("cutShort").GetBoolean())
            {
                Twin = root.GetProperty("equalTwin") is { ValueKind: JsonValueKind.Object } twin ? ReadTwin(twin) : null,
            };
        }
        catch (Exception e) when (e is JsonException or KeyNotFoundException or InvalidOperationException or ArgumentException or OverflowException)
        {
            throw new FormatException(e.Message, e);
        }
    }

    private static TwinResult ReadTwin(JsonElement e)
    {
        var setup = ReadSetup(e.GetProperty("setup"));
        var summaries = e.GetProperty("scenarios").EnumerateArray().Select(s => ReadSummary(s, setup)).ToList();
        var figures = Enum.GetValues<Comparisons.ComparedFigure>();
        var differences = e.GetProperty("differences").EnumerateArray().Select(d =>
        {
            var items = d.EnumerateArray().ToList();
            if (items.Count != figures.Length) throw new FormatException("the equal-allocation twin's differences have the wrong length");
            var paired = new PairedAccumulator();
            for (var f = 0; f < figures.Length; f++) ReadMoments(items[f], paired.Difference(figures[f]));
            return paired;
        }).ToList();
        if (summaries.Count != setup.Scenarios.Count || differences.Count != summaries.Count)
            throw new FormatException("the equal-allocation twin has summaries for a different number of scenarios than it lists");
        return new TwinResult(setup, summaries, differences);
    }

    private static SimulationSetup ReadSetup(JsonElement e)
    {
        var arms = e.GetProperty("arms").EnumerateArray()
            .Select(a => new ArmInfo(Req(a, "code"), Req(a, "label"), a.GetProperty("control").GetBoolean())).ToList();
        var scenarios = e.GetProperty("scenarios").EnumerateArray().Select(s => new ScenarioInfo(
            Req(s, "name"), Req(s, "keyName"), s.GetProperty("fromPrior").GetBoolean(),
            Numbers(s, "trueMeans"), Numbers(s, "values"), Numbers(s, "noiseSd"))).ToList();
        var setup = new SimulationSetup(
            Req(e, "trial"), Req(e, "designHash"), e.GetProperty("seed").GetUInt64(), Req(e, "policy"),
            Req(e, "outcomeName"), Str(e, "outcomeUnit"), Req(e, "outcomeFamily"), Str(e, "valueUnit"),
            e.GetProperty("rounds").GetInt32(), e.GetProperty("plotsPerRound").GetInt32(), e.GetProperty("replications").GetInt64(),
            e.GetProperty("margin").GetDouble(), Req(e, "marginRule"), arms, scenarios);
        if (setup.Rounds < 1 || setup.PlotsPerRound < 0 || setup.Replications < 0 || arms.Count == 0)
            throw new FormatException("its setup has impossible sizes");
        return setup;
    }

    private static ScenarioAccumulator ReadSummary(JsonElement e, SimulationSetup setup)
    {
        var (arms, rounds) = (setup.Arms.Count, setup.Rounds);
        var summary = new ScenarioAccumulator(arms, rounds, setup.PlotsPerRound, setup.Margin);
        summary.SetReplications(e.GetProperty("replications").GetInt64());
        ReadMomentsList(e, "cumulativeRegret", summary.CumulativeRegret);
        ReadMoments(e.GetProperty("nonBestPlots"), summary.NonBestPlots);
        ReadMoments(e.GetProperty("plotsSown"), summary.PlotsSown);
        ReadMoments(e.GetProperty("roundsRun"), summary.RoundsRun);
        Fill(Counts(e.GetProperty("correctAfterRound")), summary.CorrectAfterRound);
        Fill(Counts(e.GetProperty("withinMarginAfterRound")), summary.WithinMarginAfterRound);
        summary.StoppedAfterRound.Set(Counts(e.GetProperty("stoppedAfterRound")));
        summary.InfeasibleAtRound.Set(Counts(e.GetProperty("infeasibleAtRound")));
        if (e.GetProperty("firstInfeasible") is { ValueKind: JsonValueKind.Object } first)
            summary.NoteInfeasible(first.GetProperty("replication").GetInt64(), Req(first, "message"));
        ReadHistograms(e, "plotsByRound", summary.PlotsByRound);
        ReadHistograms(e, "plotsTotal", summary.PlotsTotal);
        ReadMomentsList(e, "bias", summary.Bias);
        var bins = e.GetProperty("calibration").EnumerateArray().ToList();
        if (bins.Count != CalibrationBins.BinCount) throw new FormatException("it has the wrong number of calibration bins");
        for (var b = 0; b < bins.Count; b++)
            summary.Calibration.Set(b, bins[b].GetProperty("pairs").GetInt64(), bins[b].GetProperty("trulyBest").GetInt64(),
                ExactText.Parse(Req(bins[b], "probabilitySum")));
        if (summary.PlotsTotal.Any(h => h.Total != summary.Replications) || summary.CumulativeRegret.Any(m => m.Count != summary.Replications))
            throw new FormatException("its counts do not add up to its replications");
        return summary;
    }

    private static void ReadMomentsList(JsonElement e, string name, Moments[] into)
    {
        var items = e.GetProperty(name).EnumerateArray().ToList();
        if (items.Count != into.Length) throw new FormatException($"'{name}' has {items.Count} entries, not {into.Length}");
        for (var i = 0; i < items.Count; i++) ReadMoments(items[i], into[i]);
    }

    private static void ReadMoments(JsonElement e, Moments into) =>
        into.Set(e.GetProperty("count").GetInt64(), ExactText.Parse(Req(e, "sum")), ExactText.Parse(Req(e, "squares")));

    private static void ReadHistograms(JsonElement e, string name, Histogram[] into)
    {
        var items = e.GetProperty(name).EnumerateArray().ToList();
        if (items.Count != into.Length) throw new FormatException($"'{name}' has {items.Count} histograms, not {into.Length}");
        for (var i = 0; i < items.Count; i++) into[i].Set(Counts(items[i]));
    }

    private static void Fill(IReadOnlyList<long> source, long[] into)
    {
        if (source.Count != into.Length) throw new FormatException("a list of counts has the wrong length");
        for (var i = 0; i < into.Length; i++) into[i] = source[i];
    }

    private static List<long> Counts(JsonElement e) => e.EnumerateArray().Select(x => x.GetInt64()).ToList();

    private static IReadOnlyList<double>? Numbers(JsonElement e, string name) =>
        e.GetProperty(name) is { ValueKind: JsonValueKind.Array } array ? array.EnumerateArray().Select(x => x.GetDouble()).ToList() : null;

    private static string Req(JsonElement e, string name) =>
        Str(e, name) ?? throw new FormatException($"'{name}' is missing or not text");

    private static string? Str(JsonElement e, string name) =>
        e.GetProperty(name) is { ValueKind: JsonValueKind.String } s ? s.GetString() : null;
}
