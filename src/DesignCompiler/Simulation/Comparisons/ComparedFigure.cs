namespace DesignCompiler.Simulation.Comparisons;

/// <summary>The figures a comparison reports for both designs and their paired difference, in report order.</summary>
public enum ComparedFigure
{
    Regret,
    NonBestPlots,
    PlotsSown,
    RoundsRun,
    CorrectSelection,
    WithinMargin,
    DeclaredWinner,
}
