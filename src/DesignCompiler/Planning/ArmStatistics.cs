namespace DesignCompiler.Planning;

/// <summary>
/// The sufficient statistics of one arm's recorded plots: how many, their sum, and the sum
/// of squared deviations from their mean (Welford's update, so large yields lose no precision).
/// For bernoulli, binomial and count outcomes the sum is a whole number and exact.
/// </summary>
public readonly record struct ArmStatistics(int Count, double Sum, double SumOfSquares)
{
    public double Mean => Count == 0 ? 0 : Sum / Count;

    public ArmStatistics Add(double value)
    {
        var count = Count + 1;
        var oldMean = Mean;
        var sum = Sum + value;
        var newMean = sum / count;
        return new ArmStatistics(count, sum, SumOfSquares + (value - oldMean) * (value - newMean));
    }
}
