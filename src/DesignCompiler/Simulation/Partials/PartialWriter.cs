using System.Text;
using System.Text.Json;
using DesignCompiler.Simulation.Accumulators;
using DesignCompiler.Simulation.Running;

namespace DesignCompiler.Simulation.Partials;

/// <summary>
/// Writes a shard's exact summaries as a partial summary file (JSON). Every count is an
/// integer and every sum an <see cref="ExactText"/> string, so merging the parts loses
/// nothing; doubles of the setup are written in their shortest round-trip form. Keys are in
/// a fixed order and nothing depends on the clock or the culture.
/// </summary>
public static class PartialWriter
{
    public const string FormatName = "trialc-simulation-partial";
    public const int FormatVersion = 2;

    public static string Write(SimulationResult result)
    {
        using var buffer = new MemoryStream();
        using (var json = new Utf8JsonWriter(buffer, new JsonWriterOptions { Indented = false, Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
        {
            json.WriteStartObject();
            json.WriteString("format", FormatName);
            json.WriteNumber("version", FormatVersion);
            json.WriteStartObject("shard");
            json.WriteNumber("index", result.Shard.Index);
            json.WriteNumber("count", result.Shard.Count);
            json.WriteEndObject();
            json.WriteBoolean("cutShort", result.CutShort);
            json.WritePropertyName("setup");
            WriteSetup(json, result.Setup);
            json.WriteStartArray("scenarios");
            foreach (var summary in result.Scenarios) WriteSummary(json, summary);
            json.WriteEndArray();
            if (result.Twin is { } twin) WriteTwin(json, twin);
            else json.WriteNull("equalTwin");
            json.WriteEndObject();
        }
        return Encoding.UTF8.GetString(buffer.ToArray()) + "\n";
    }

    private static void WriteTwin(Utf8JsonWriter json, TwinResult twin)
    {
        json.WriteStartObject("equalTwin");
        json.WritePropertyName("setup");
        WriteSetup(json, twin.Setup);
        json.WriteStartArray("scenarios");
        foreach (var summary in twin.Scenarios) WriteSummary(json, summary);
        json.WriteEndArray();
        json.WriteStartArray("differences");
        foreach (var paired in twin.Differences)
        {
            json.WriteStartArray();
            foreach (var figure in Enum.GetValues<Comparisons.ComparedFigure>()) WriteMoments(json, null, paired.Difference(figure));
            json.WriteEndArray();
        }
        json.WriteEndArray();
        json.WriteEndObject();
    }

    /// <summary>The setup alone, in the file's form; two parts belong together when theirs are equal.</summary>
    public static string SetupText(SimulationSetup setup)
    {
        using var buffer = new MemoryStream();
        using (var json = new Utf8JsonWriter(buffer)) WriteSetup(json, setup);
        return Encoding.UTF8.GetString(buffer.ToArray());
    }

    private static void WriteSetup(Utf8JsonWriter json, SimulationSetup setup)
    {
        json.WriteStartObject();
        json.WriteString("trial", setup.Trial);
        json.WriteString("designHash", setup.DesignHash);
        json.WriteNumber("seed", setup.Seed);
        json.WriteString("policy", setup.Policy);
        json.WriteString("outcomeName", setup.OutcomeName);
        WriteNullable(json, "outcomeUnit", setup.OutcomeUnit);
        json.WriteString("outcomeFamily", setup.OutcomeFamily);
        WriteNullable(json, "valueUnit", setup.ValueUnit);
        json.WriteNumber("rounds", setup.Rounds);
        json.WriteNumber("plotsPerRound", setup.PlotsPerRound);
        json.WriteNumber("replications", setup.Replications);
        json.WriteNumber("margin", setup.Margin);
        json.WriteString("marginRule", setup.MarginRule);
        json.WriteStartArray("arms");
        foreach (var arm in setup.Arms)
        {
            json.WriteStartObject();
            json.WriteString("code", arm.Code);
            json.WriteString("label", arm.Label);
            json.WriteBoolean("control", arm.IsControl);
            json.WriteEndObject();
        }
        json.WriteEndArray();
        json.WriteStartArray("scenarios");
        foreach (var scenario in setup.Scenarios)
        {
            json.WriteStartObject();
            json.WriteString("name", scenario.Name);
            json.WriteString("keyName", scenario.KeyName);
            json.WriteBoolean("fromPrior", scenario.FromPrior);
            WriteNumbers(json, "trueMeans", scenario.TrueMeans);
            WriteNumbers(json, "values", scenario.Values);
            WriteNumbers(json, "noiseSd", scenario.NoiseSd);
            json.WriteEndObject();
        }
        json.WriteEndArray();
        json.WriteEndObject();
    }

    private static void WriteSummary(Utf8JsonWriter json, ScenarioAccumulator summary)
    {
        json.WriteStartObject();
        json.WriteNumber("replications", summary.Replications);
        json.WriteStartArray("cumulativeRegret");
        foreach (var m in summary.CumulativeRegret) WriteMoments(json, null, m);
        json.WriteEndArray();
        WriteMoments(json, "nonBestPlots", summary.NonBestPlots);
        WriteMoments(json, "plotsSown", summary.PlotsSown);
        WriteMoments(json, "roundsRun", summary.RoundsRun);
        WriteCounts(json, "correctAfterRound", summary.CorrectAfterRound);
        WriteCounts(json, "withinMarginAfterRound", summary.WithinMarginAfterRound);
        WriteCounts(json, "stoppedAfterRound", summary.StoppedAfterRound.Counts);
        WriteCounts(json, "infeasibleAtRound", summary.InfeasibleAtRound.Counts);
        if (summary.FirstInfeasible is { } first)
        {
            json.WriteStartObject("firstInfeasible");
            json.WriteNumber("replication", first.Replication);
            json.WriteString("message", first.Message);
            json.WriteEndObject();
        }
        else json.WriteNull("firstInfeasible");
        json.WriteStartArray("plotsByRound");
        foreach (var h in summary.PlotsByRound) WriteCounts(json, null, h.Counts);
        json.WriteEndArray();
        json.WriteStartArray("plotsTotal");
        foreach (var h in summary.PlotsTotal) WriteCounts(json, null, h.Counts);
        json.WriteEndArray();
        json.WriteStartArray("bias");
        foreach (var m in summary.Bias) WriteMoments(json, null, m);
        json.WriteEndArray();
        json.WriteStartArray("calibration");
        for (var b = 0; b < CalibrationBins.BinCount; b++)
        {
            json.WriteStartObject();
            json.WriteNumber("pairs", summary.Calibration.Pairs(b));
            json.WriteNumber("trulyBest", summary.Calibration.TrulyBest(b));
            json.WriteString("probabilitySum", ExactText.Format(summary.Calibration.ProbabilitySum(b)));
            json.WriteEndObject();
        }
        json.WriteEndArray();
        json.WriteEndObject();
    }

    private static void WriteMoments(Utf8JsonWriter json, string? name, Moments moments)
    {
        if (name is null) json.WriteStartObject(); else json.WriteStartObject(name);
        json.WriteNumber("count", moments.Count);
        json.WriteString("sum", ExactText.Format(moments.Sum));
        json.WriteString("squares", ExactText.Format(moments.Squares));
        json.WriteEndObject();
    }

    private static void WriteCounts(Utf8JsonWriter json, string? name, ReadOnlySpan<long> counts)
    {
        if (name is null) json.WriteStartArray(); else json.WriteStartArray(name);
        foreach (var c in counts) json.WriteNumberValue(c);
        json.WriteEndArray();
    }

    private static void WriteNumbers(Utf8JsonWriter json, string name, IReadOnlyList<double>? values)
    {
        if (values is null)
        {
            json.WriteNull(name);
            return;
        }
        json.WriteStartArray(name);
        foreach (var v in values) json.WriteNumberValue(v);
        json.WriteEndArray();
    }

    private static void WriteNullable(Utf8JsonWriter json, string name, string? value)
    {
        if (value is null) json.WriteNull(name); else json.WriteString(name, value);
    }
}
