namespace DesignCompiler.Simulation.Running;

/// <summary>The headline figures of one simulated trial, the ones two designs are compared on.</summary>
public readonly record struct ReplicationFigures(
    double Regret,
    int NonBestPlots,
    int PlotsSown,
    int RoundsRun,
    bool CorrectSelection,
    bool WithinMargin,
    bool DeclaredWinner)
{
    public static ReplicationFigures Of(ReplicationRecord record, double margin) => new(
        record.TotalRegret, record.NonBestPlots, record.PlotsSown, record.RoundsRun,
        record.IsBest(record.FinalLeader), record.IsWithin(record.FinalLeader, margin),
        record.Ending == TrialEnding.Stopped);

    /// <summary>The figure as a number, in the order of <see cref="Comparisons.ComparedFigure"/>.</summary>
    public double this[Comparisons.ComparedFigure figure] => figure switch
    {
        Comparisons.ComparedFigure.Regret => Regret,
        Comparisons.ComparedFigure.NonBestPlots => NonBestPlots,
        Comparisons.ComparedFigure.PlotsSown => PlotsSown,
        Comparisons.ComparedFigure.RoundsRun => RoundsRun,
        Comparisons.ComparedFigure.CorrectSelection => CorrectSelection ? 1 : 0,
        Comparisons.ComparedFigure.WithinMargin => WithinMargin ? 1 : 0,
        _ => DeclaredWinner ? 1 : 0,
    };
}
