namespace DesignCompiler.Numerics;

/// <summary>
/// Compiles the P(best) quadrature on a spare core while a command is still reading its design.
/// </summary>
/// <remarks>
/// The quadrature's kernels are compiled fully optimised on first use (they skip tiered compilation, and a
/// ReadyToRun publish cannot precompile them), some tens of milliseconds in all. A simulation needs them in
/// its first trial, where both of its threads would wait for one compilation, while reading and checking
/// the design before it keeps only one core busy. One small computation per beta kernel form, started
/// first, moves that compilation off the critical path. It touches no shared state, so nothing a command
/// computes or prints can depend on it.
/// </remarks>
public static class QuadratureWarmUp
{
    /// <summary>Starts the warm-up on a background thread; does nothing on a single core, where it would only compete.</summary>
    public static void Start()
    {
        if (Environment.ProcessorCount < 2) return;
        new Thread(Run) { IsBackground = true, Name = "P(best) warm-up" }.Start();
    }

    private static void Run()
    {
        try
        {
            // Shapes below 10 (plain form), sums up to 400 (from the mean) and beyond (centred series), with a
            // group of two identical arms and one support reaching towards 1 (the downward sweep).
            ProbabilityOfBest.Compute([
                new BetaMarginal(2, 5), new BetaMarginal(2, 5), new BetaMarginal(30, 40),
                new BetaMarginal(300, 320), new BetaMarginal(2000, 2100), new BetaMarginal(9, 2),
            ]);
        }
        catch (Exception)
        {
            // Only ever an optimisation: whatever went wrong here, the command's own computation meets and reports.
        }
    }
}
