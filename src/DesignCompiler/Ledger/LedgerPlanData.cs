using System.Globalization;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using DesignCompiler.Planning;

namespace DesignCompiler.Ledger;

/// <summary>
/// A round plan's figures as stored in <c>rounds.plan_data</c> (its plots are the <c>plots</c>
/// rows), so a round can be re-issued from the ledger with the very numbers it was issued with:
/// no second draw, no second planning. Doubles are written as round-trip text, so reading back
/// gives the same bits, and non-finite values survive.
/// </summary>
public static class LedgerPlanData
{
    private const int FormatVersion = 1;

    public static string Write(RoundPlan plan)
    {
        var buffer = new MemoryStream();
        using (var json = new Utf8JsonWriter(buffer, new JsonWriterOptions { Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
        {
            json.WriteStartObject();
            json.WriteNumber("format", FormatVersion);
            json.WriteString("trial", plan.Trial);
            json.WriteNumber("round", plan.Round);
            json.WriteNumber("rounds", plan.Rounds);
            json.WriteString("designHash", plan.DesignHash);
            json.WriteString("seed", plan.Seed.ToString(CultureInfo.InvariantCulture));
            json.WriteString("policy", plan.Policy);
            json.WriteString("outcomeName", plan.OutcomeName);
            json.WriteString("outcomeUnit", plan.OutcomeUnit);
            json.WriteString("outcomeFamily", plan.OutcomeFamily);
            json.WriteString("valueUnit", plan.ValueUnit);
            json.WriteString("errorBound", Real(plan.ProbabilityBestErrorBound));
            json.WriteNumber("plotsRecorded", plan.PlotsRecorded);
            json.WriteStartArray("arms");
            foreach (var arm in plan.Arms)
            {
                json.WriteStartObject();
                json.WriteNumber("index", arm.Index);
                json.WriteString("code", arm.Code);
                json.WriteString("label", arm.Label);
                json.WriteBoolean("control", arm.IsControl);
                json.WriteString("status", arm.Status.ToString());
                json.WriteNumber("plots", arm.Plots);
                json.WriteString("targetShare", Real(arm.TargetShare));
                json.WriteString("probabilityBest", Real(arm.ProbabilityBest));
                json.WriteString("posteriorMean", Real(arm.PosteriorMean));
                json.WriteString("credibleLower", Real(arm.CredibleLower));
                json.WriteString("credibleUpper", Real(arm.CredibleUpper));
                json.WriteString("expectedLoss", Real(arm.ExpectedLoss));
                json.WriteNumber("plotsRecorded", arm.PlotsRecorded);
                json.WriteEndObject();
            }
            json.WriteEndArray();
            json.WriteStartArray("blocks");
            foreach (var block in plan.Blocks)
            {
                json.WriteStartObject();
                json.WriteString("name", block.Name);
                json.WriteNumber("plots", block.Plots);
                if (block.Rows is { } rows) json.WriteNumber("rows", rows); else json.WriteNull("rows");
                if (block.Columns is { } columns) json.WriteNumber("columns", columns); else json.WriteNull("columns");
                json.WriteStartArray("counts");
                foreach (var count in block.Counts) json.WriteNumberValue(count);
                json.WriteEndArray();
                json.WriteEndObject();
            }
            json.WriteEndArray();
            json.WriteEndObject();
        }
        return Encoding.UTF8.GetString(buffer.ToArray());
    }

    /// <summary>The plan back from its stored figures and plots. The text was checked by the hash chain, so it is as written.</summary>
    public static RoundPlan Read(string data, IReadOnlyList<PlotAssignment> plots)
    {
        using var document = JsonDocument.Parse(data);
        var root = document.RootElement;
        var arms = root.GetProperty("arms").EnumerateArray().Select(a => new ArmPlan(
            a.GetProperty("index").GetInt32(), a.GetProperty("code").GetString()!, a.GetProperty("label").GetString()!,
            a.GetProperty("control").GetBoolean(), Enum.Parse<ArmStatus>(a.GetProperty("status").GetString()!),
            a.GetProperty("plots").GetInt32(), Real(a, "targetShare"), Real(a, "probabilityBest"), Real(a, "posteriorMean"),
            Real(a, "credibleLower"), Real(a, "credibleUpper"), Real(a, "expectedLoss"), a.GetProperty("plotsRecorded").GetInt32())).ToList();
        var blocks = root.GetProperty("blocks").EnumerateArray().Select(b => new BlockPlan(
            b.GetProperty("name").GetString()!, b.GetProperty("plots").GetInt32(), OptionalInt(b, "rows"), OptionalInt(b, "columns"),
            b.GetProperty("counts").EnumerateArray().Select(c => c.GetInt32()).ToList())).ToList();
        return new RoundPlan(
            root.GetProperty("trial").GetString()!, root.GetProperty("round").GetInt32(), root.GetProperty("rounds").GetInt32(),
            root.GetProperty("designHash").GetString()!, ulong.Parse(root.GetProperty("seed").GetString()!, CultureInfo.InvariantCulture),
            root.GetProperty("policy").GetString()!, root.GetProperty("outcomeName").GetString()!, root.GetProperty("outcomeUnit").GetString(),
            root.GetProperty("outcomeFamily").GetString()!, root.GetProperty("valueUnit").GetString(),
            arms, blocks, plots, Real(root, "errorBound"), root.GetProperty("plotsRecorded").GetInt32());
    }

    private static string Real(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    private static double Real(JsonElement element, string name) =>
        double.Parse(element.GetProperty(name).GetString()!, NumberStyles.Float, CultureInfo.InvariantCulture);

    private static int? OptionalInt(JsonElement element, string name) =>
        element.GetProperty(name).ValueKind == JsonValueKind.Null ? null : element.GetProperty(name).GetInt32();
}
