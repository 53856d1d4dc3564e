namespace DesignCompiler.Simulation.Running;

/// <summary>
/// Runs numbered units of work on a fixed number of threads, each thread with its own state,
/// taking units in increasing order from a shared counter. On cancellation no new unit is
/// taken and units already taken are finished, so the finished units are always exactly
/// 0..n−1: a run cut short equals a shorter run.
/// </summary>
internal static class ChunkedParallel
{
    /// <returns>How many units finished (all of them unless cancelled).</returns>
    public static long Run<TLocal>(long units, int threads, Func<TLocal> create, Action<TLocal, long> work, Action<TLocal> merge, CancellationToken cancel)
    {
        long next = 0;
        var gate = new object();
        var options = new ParallelOptions { MaxDegreeOfParallelism = Math.Max(1, threads) };
        Parallel.For(0, Math.Max(1, threads), options, _ =>
        {
            var local = create();
            while (!cancel.IsCancellationRequested)
            {
                var unit = Interlocked.Increment(ref next) - 1;
                if (unit >= units) break;
                work(local, unit);
            }
            // Summaries merge exactly, so the order in which threads arrive here does not matter.
            lock (gate) merge(local);
        });
        return Math.Min(Interlocked.Read(ref next), units);
    }
}
