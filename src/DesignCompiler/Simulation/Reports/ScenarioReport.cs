using DesignCompiler.Simulation.Accumulators;

namespace DesignCompiler.Simulation.Reports;

/// <summary>
/// The operating characteristics of a design in one scenario, each with its Monte Carlo
/// standard error. Regret and margins are in value units (scale·θ − cost per plot).
/// </summary>
public sealed record ScenarioReport(
    ScenarioInfo Scenario,
    long Replications,
    Estimate Regret,
    Estimate NonBestPlots,
    Estimate PlotsSown,
    Estimate RoundsRun,
    Estimate CorrectSelection,
    Estimate WithinMargin,
    Estimate DeclaredWinner,
    long RanAllRounds,
    long Infeasible,
    string? InfeasibleMessage,
    IReadOnlyList<StopRoundFigure> StopRounds,
    IReadOnlyList<RoundFigure> ByRound,
    IReadOnlyList<ArmFigure> Arms,
    IReadOnlyList<CalibrationFigure>? Calibration);

/// <summary>Trials a stop rule ended after <see cref="Round"/> recorded rounds.</summary>
public sealed record StopRoundFigure(int Round, long Trials, double Share);

/// <summary>Figures as they stand after a round: regret so far, and the selection if the trial ended there.</summary>
public sealed record RoundFigure(int Round, Estimate CumulativeRegret, Estimate CorrectSelection, Estimate WithinMargin);

/// <summary>
/// One arm: its true mean and value (fixed scenarios), plots per round and in total, and the
/// bias of its naive final sample mean over the trials in which it has data.
/// </summary>
public sealed record ArmFigure(
    string Code,
    double? TrueMean,
    double? TrueValue,
    bool? IsBest,
    Estimate Bias,
    double PlotsTotalMean,
    int? PlotsTotal95,
    IReadOnlyList<PlotQuantiles> ByRound);

/// <summary>Plots of an arm in a round over the simulated trials: mean and 5/50/95 % quantiles.</summary>
public sealed record PlotQuantiles(int Round, double Mean, int? P5, int? P50, int? P95);

/// <summary>
/// A calibration bin: (trial, arm) pairs whose final P(best) fell in [From, To), their mean
/// P(best), how often the arm truly was best, and the binomial standard error of that frequency.
/// </summary>
public sealed record CalibrationFigure(double From, double To, long Pairs, double MeanProbability, double Frequency, double StandardError);
