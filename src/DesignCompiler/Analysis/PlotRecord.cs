namespace DesignCompiler.Analysis;

/// <summary>
/// One recorded plot: which arm it carried, in which block and round, and the outcome measured on it.
/// Arm is the arm's zero-based index in design order; Block and Round are labels (any integers, such as the
/// block's design index and the round number) that only need to be equal for plots of the same block or round.
/// </summary>
public readonly record struct PlotRecord(int Arm, int Block, int Round, double Value);
