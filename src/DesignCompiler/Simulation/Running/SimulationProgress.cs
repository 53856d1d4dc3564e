namespace DesignCompiler.Simulation.Running;

/// <summary>
/// How many simulated trials have finished, for a progress line. Workers add to it; a display
/// reads it on its own schedule, so the simulation itself never touches a clock or a console.
/// </summary>
public sealed class SimulationProgress
{
    private long _done;

    public SimulationProgress(long total) => Total = total;

    public long Total { get; }

    public long Done => Interlocked.Read(ref _done);

    internal void Add(long count) => Interlocked.Add(ref _done, count);
}
