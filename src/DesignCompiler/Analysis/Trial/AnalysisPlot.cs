namespace DesignCompiler.Analysis.Trial;

/// <summary>
/// One issued plot as the analysis sees it: round (from 1), block and arm (design-order indices)
/// and the recorded value, or null when the plot was lost or is not recorded yet.
/// </summary>
public readonly record struct AnalysisPlot(int Round, int Block, int Arm, double? Value);
