using System.Diagnostics;
using System.Globalization;
using DesignCompiler.Numerics;

namespace DesignCompiler.Benchmarks;

/// <summary>
/// P(best) of the reference's ten beta arms in a timed loop, as the C reference's <c>pbest --reps N</c> does:
/// with the planner's settings (20-point panels of 6 sd, derivative check to 1e-12, the reference's own) and
/// with the tighter ones it used before (panels of 4 sd, check to 1e-13), each with its largest error against
/// mpmath.
/// </summary>
public static class ReferenceTiming
{
    // RESULTS.md, "P(best) accuracy": the 30-digit mpmath column for the default set.
    private static readonly double[] Mpmath =
    [
        0.013881947198597881671, 0.091814067489965550610, 0.046783686685499684523, 0, 0.000086544263242342052,
        0.016709902674666277084, 0.24350467893461731408, 0.42966738084058511546, 0.072449432491219286660, 0.085102359421606547857,
    ];

    public static void Run(int vectors)
    {
        var arms = PosteriorSets.For("beta-10-reference");
        var planner = QuadratureSettings.Default;
        var tight = new QuadratureSettings(1.0, 1e-13);
        // Tiered compilation replaces the first, unoptimised code only after a few hundred milliseconds of
        // calls; timing before that would charge the compiler to whichever setting runs first.
        WarmUp(arms, planner);
        WarmUp(arms, tight);
        Time("planner", arms, vectors, planner);
        Time("tight", arms, vectors, tight);
    }

    private static void WarmUp(IMarginal[] arms, QuadratureSettings settings)
    {
        var p = new double[arms.Length];
        var loss = new double[arms.Length];
        var start = Stopwatch.GetTimestamp();
        while (Stopwatch.GetElapsedTime(start).TotalSeconds < 1.0) ProbabilityOfBest.Compute(arms, p, loss, out _, settings);
    }

    private static void Time(string name, IMarginal[] arms, int vectors, QuadratureSettings settings)
    {
        var p = new double[arms.Length];
        var loss = new double[arms.Length];
        ProbabilityOfBest.Compute(arms, p, loss, out _, settings);
        var error = p.Select((v, i) => Math.Abs(v - Mpmath[i])).Max();
        var start = Stopwatch.GetTimestamp();
        for (var i = 0; i < vectors; i++) ProbabilityOfBest.Compute(arms, p, loss, out _, settings);
        var us = Stopwatch.GetElapsedTime(start).TotalMicroseconds / vectors;
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"pbest {name}: {us:F1} us per vector, max error vs mpmath {error:E1}"));
    }
}
