using System.Collections.Immutable;
using DesignCompiler.Simulation.Comparisons;
using DesignCompiler.Simulation.Running;

namespace DesignCompiler.Simulation.Accumulators;

/// <summary>
/// Paired differences B − A of the headline figures, replication by replication. With common
/// random numbers the two designs see the same true values and outcome streams, so the
/// difference varies much less than either figure and its interval is correspondingly narrow
/// (common random numbers, a standard variance-reduction technique; common practice).
/// </summary>
public sealed class PairedAccumulator
{
    private static readonly ImmutableArray<ComparedFigure> Figures = [.. Enum.GetValues<ComparedFigure>()];

    private readonly Moments[] _differences = Figures.Select(_ => new Moments()).ToArray();

    public Moments Difference(ComparedFigure figure) => _differences[(int)figure];

    public void Add(ReplicationFigures a, ReplicationFigures b)
    {
        foreach (var figure in Figures) _differences[(int)figure].Add(b[figure] - a[figure]);
    }

    public void Add(PairedAccumulator other)
    {
        foreach (var figure in Figures) _differences[(int)figure].Add(other._differences[(int)figure]);
    }
}
