using DesignCompiler.Analysis.Estimates;
using DesignCompiler.Analysis.Rcbd;

namespace DesignCompiler.Analysis.Trial;

/// <summary>
/// The end-of-trial analysis: every arm estimated three ways, how the adjusted (or conjugate)
/// model was set up, the classical RCBD table where the allocation was balanced, and the
/// simulated bias and interval coverage of each estimator under the design's scenarios.
/// </summary>
public sealed record AnalysisReport(
    string Trial,
    string DesignHash,
    ulong Seed,
    string OutcomeName,
    string? OutcomeUnit,
    string OutcomeFamily,
    int RoundsWithData,
    int PlotsRecorded,
    int PlotsMissing,
    string ModelText,
    IReadOnlyList<ArmAnalysis> Arms,
    RcbdSection Rcbd,
    IReadOnlyList<EstimatorScenario> Simulated);

/// <summary>One arm: its code and the three estimates (naive, round-stratified, model posterior).</summary>
public sealed record ArmAnalysis(string Code, string Label, ArmEstimate Naive, ArmEstimate RoundStratified, ArmEstimate Model);

/// <summary>
/// The classical randomized complete block analysis, or why there is none (<see cref="Reason"/>):
/// it needs equal allocation in complete blocks, one plot of every arm per block and round; each
/// (round, block) pair is then a replicate.
/// </summary>
public sealed record RcbdSection(RcbdAnova? Anova, string? Reason, IReadOnlyList<string> Replicates);

/// <summary>Simulated bias and coverage of the 95 % intervals of each estimator, per arm, in one scenario.</summary>
public sealed record EstimatorScenario(string Name, long Replications, IReadOnlyList<EstimatorArm> Arms);

/// <summary>One arm's simulated figures: bias and coverage for naive, stratified and model estimates.</summary>
public sealed record EstimatorArm(string Code, EstimatorFigure Naive, EstimatorFigure RoundStratified, EstimatorFigure Model);

/// <summary>Mean of (estimate − truth) with its standard error over the trials that had an estimate, and the share of intervals that held the truth.</summary>
public sealed record EstimatorFigure(long Trials, double Bias, double BiasSe, long IntervalTrials, double Coverage, double CoverageSe);
