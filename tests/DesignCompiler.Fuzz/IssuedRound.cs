using System.Reflection;
using DesignCompiler.Binding;
using DesignCompiler.Planning;
using DesignCompiler.Planning.Families;
using DesignCompiler.Rendering;
using DesignCompiler.Results;
using DesignCompiler.Text;

namespace DesignCompiler.Fuzz;

/// <summary>
/// Round 1 of the cover-crop example, planned once: what a returned sheet is checked against,
/// exactly as <c>trialc record</c> would check it after <c>compile --ledger</c> issued the round.
/// </summary>
internal sealed class IssuedRound
{
    private IssuedRound(CheckedDesign design, RoundPlan plan, byte[] sheet, byte[] workbook)
    {
        Design = design;
        Model = OutcomeModels.For(design.Outcome);
        Sheets = [new IssuedSheet(plan.Round,
            plan.Assignments.Select((p, k) => new IssuedPlot(k, p.Block, p.PlotId, p.Row, p.Column, p.ArmCode)).ToList(), null)];
        Plan = plan;
        BlankSheet = sheet;
        BlankWorkbook = workbook;
    }

    public static IssuedRound CoverCrops { get; } = Make("cover-crops.trial");

    /// <summary>The bytes of the embedded cover-crop example design.</summary>
    public static byte[] ExampleDesign => Resource("cover-crops.trial");

    public CheckedDesign Design { get; }
    public IOutcomeModel Model { get; }
    public IReadOnlyList<IssuedSheet> Sheets { get; }
    public RoundPlan Plan { get; }

    /// <summary>The crew sheet as compile writes it, outcomes still blank.</summary>
    public byte[] BlankSheet { get; }

    /// <summary>The crew workbook (.xlsx) as compile writes it, outcomes still blank.</summary>
    public byte[] BlankWorkbook { get; }

    private static IssuedRound Make(string resource)
    {
        var bound = DesignBinder.Check(new SourceText(resource, System.Text.Encoding.UTF8.GetString(Resource(resource))));
        var design = bound.Design ?? throw new InvalidOperationException(resource + " does not check clean");
        var plan = RoundPlanner.For(design).Planner!.Plan(new TrialState(design.Arms.Count), 1).Plan
            ?? throw new InvalidOperationException(resource + " plans no round 1");
        var (files, _) = RoundOutputs.Render(plan, design, Path.GetFileNameWithoutExtension(resource));
        return new IssuedRound(design, plan, files.Single(f => f.Name.EndsWith(".csv", StringComparison.Ordinal)).Content,
            files.Single(f => f.Name.EndsWith(".xlsx", StringComparison.Ordinal)).Content);
    }

    private static byte[] Resource(string name)
    {
        using var stream = Assembly.GetExecutingAssembly().GetManifestResourceStream(name)
            ?? throw new InvalidOperationException("the harness was built without the embedded " + name);
        using var bytes = new MemoryStream();
        stream.CopyTo(bytes);
        return bytes.ToArray();
    }
}
