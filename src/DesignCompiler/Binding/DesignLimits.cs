namespace DesignCompiler.Binding;

/// <summary>
/// Sizes the tool accepts. They are far above any field trial's, and low enough that no
/// design can make the planner or the simulator run out of memory or time.
/// </summary>
public static class DesignLimits
{
    public const int MaxArms = 1000;
    public const int MaxRounds = 100;
    public const int MaxBlocks = 1000;
    public const int MaxPlotsPerBlock = 100_000;
    public const int MaxPlotsPerRound = 100_000;
    public const int MaxBinomialTrials = 1_000_000;

    /// <summary>
    /// Beta and gamma prior parameters. beta(0.01, 0.01) and beta(1e6, 1e6) are real choices (a
    /// near-ignorance prior, a near-certain one); outside [1e-6, 1e12] no prior means anything, and
    /// gamma posteriors from counts past 1e100 broke the probability-of-best quadrature.
    /// </summary>
    public const double MinPriorParameter = 1e-6;
    public const double MaxPriorParameter = 1e12;

    /// <summary>
    /// The largest magnitude of a normal outcome, a normal prior's mean and sd, a noise sd and a
    /// scenario value, in the outcome's unit: yields in kg/ha are below 1e5. At 1e155 the squared
    /// deviations overflow a double and the posterior's scale became infinite; at 1e9 every sum of
    /// squares over the maximum plots stays below 1e30.
    /// </summary>
    public const double MaxMagnitude = 1e9;

    /// <summary>The smallest sd or noise sd; a prior sd of 1e-300 underflowed the posterior's scale to 0.</summary>
    public const double MinScale = 1e-6;

    /// <summary>
    /// A noise guess's worth in plots. Below a tenth of a plot the posterior is a Student t with under
    /// 0.1 degrees of freedom, whose tails no double can hold.
    /// </summary>
    public const double MinWorth = 0.1;
    public const double MaxWorth = 1e6;

    /// <summary>Price per outcome unit and an arm's cost: value = price × outcome − cost stays far below overflow.</summary>
    public const double MaxPrice = 1e6;
    public const double MaxCost = 1e12;

    /// <summary>The largest count on a returned sheet or in a scenario.</summary>
    public const double MaxCount = 1e9;

    /// <summary>A limit written for people: 1e9, 1e-6, 0.1.</summary>
    public static string Text(double value) =>
        value < 0 ? "-" + Text(-value)
        : value is >= 1e5 or (> 0 and < 1e-3)
            ? value.ToString("0.######e+0", System.Globalization.CultureInfo.InvariantCulture).Replace("e+", "e", StringComparison.Ordinal)
            : value.ToString("R", System.Globalization.CultureInfo.InvariantCulture);

    /// <summary>
    /// The largest design file read. A design at every limit above (1000 arms with labels, priors and
    /// costs, 1000 blocks with layouts, a limit line per arm, a dozen scenarios naming every arm) is
    /// under 400 KB; the checker reads a few hundred kilobytes a second on a busy two-core machine, so
    /// a file at this limit is checked in seconds, while a larger one is almost surely the wrong file.
    /// </summary>
    public const long MaxDesignFileBytes = 1024 * 1024;
}
