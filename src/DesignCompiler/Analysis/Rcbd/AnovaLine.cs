namespace DesignCompiler.Analysis.Rcbd;

/// <summary>One line of an analysis of variance. F and its P-value are given only for the line that is tested.</summary>
public sealed record AnovaLine(int Df, double SumOfSquares, double? MeanSquare, double? F, double? P);
