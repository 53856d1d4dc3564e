namespace DesignCompiler.Rendering.Analysis;

/// <summary>What the analysis templates see: exact numbers for JSON ("null" when undefined) and rounded text for people. Templates never compute.</summary>
public sealed record AnalysisModel(
    string Trial,
    string DesignHash,
    string DesignHashShort,
    string Seed,
    string ToolVersion,
    string OutcomeName,
    string OutcomeUnit,
    string OutcomeFamily,
    int RoundsWithData,
    int PlotsRecorded,
    int PlotsMissing,
    string ModelText,
    IReadOnlyList<ArmRowModel> Arms,
    bool HasRcbd,
    string RcbdReason,
    RcbdModel? Rcbd,
    IReadOnlyList<SimulatedScenarioModel> Simulated);

/// <summary>An estimate: exact mean and interval for JSON, and "5.312 (5.01 to 5.61)" for people.</summary>
public sealed record EstimateTextModel(string Status, string Plots, string Mean, string Lower, string Upper, string Text);

public sealed record ArmRowModel(string Code, string Label, EstimateTextModel Naive, EstimateTextModel RoundStratified, EstimateTextModel Model);

public sealed record AnovaLineModel(string Source, int Df, string SumOfSquares, string MeanSquare, string F, string P,
    string SumOfSquaresText, string MeanSquareText, string FText, string PText);

public sealed record RcbdModel(
    int Treatments,
    int Replicates,
    IReadOnlyList<string> ReplicateNames,
    IReadOnlyList<AnovaLineModel> Lines,
    string GrandMean,
    string GrandMeanText,
    string Cv,
    string CvText,
    string RelativeEfficiency,
    string RelativeEfficiencyText,
    IReadOnlyList<TreatmentMeanModel> Means,
    IReadOnlyList<EstimatedPlotModel> EstimatedPlots);

public sealed record TreatmentMeanModel(string Code, string Mean, string MeanText);

public sealed record EstimatedPlotModel(string Code, string Replicate, string Value, string ValueText);

public sealed record SimulatedScenarioModel(string Name, string Replications, IReadOnlyList<SimulatedArmModel> Arms);

public sealed record SimulatedArmModel(string Code, SimulatedFigureModel Naive, SimulatedFigureModel RoundStratified, SimulatedFigureModel Model);

public sealed record SimulatedFigureModel(string Trials, string Bias, string BiasSe, string Coverage, string CoverageSe, string BiasText, string CoverageText);
