namespace DesignCompiler.Analysis.Adjusted;

/// <summary>A prior guess of one arm's mean outcome at an average block and round, and how uncertain it is, in outcome units.</summary>
public readonly record struct ArmPrior(double Mean, double Sd);
