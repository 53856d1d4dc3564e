using DesignCompiler.Analysis;
using DesignCompiler.Analysis.Adjusted;
using DesignCompiler.Randomness;
using DesignCompiler.Tests.Numerics;
using MathNet.Numerics.LinearAlgebra;

namespace DesignCompiler.Tests.Analysis;

/// <summary>
/// The flat-prior model on unbalanced, adaptive-looking records against MathNet.Numerics least squares in a different
/// parametrisation (intercept plus treatment-coded arms, blocks and rounds), and identification against the textbook
/// estimability rule (c'β is estimable exactly when c lies in the row space of X; Searle, <i>Linear Models</i>, from memory).
/// </summary>
public sealed class AdjustedModelLeastSquaresTests
{
    // An uneven spread of 4 arms over 3 blocks and 3 rounds, as an adaptive trial leaves it; values are random draws.
    private static List<PlotRecord> Uneven(ulong seed)
    {
        var rng = new Xoshiro256StarStar(seed);
        int[][] plotsPerRound = [[2, 2, 2, 2], [4, 1, 2, 1], [6, 0, 1, 1]];
        var records = new List<PlotRecord>();
        for (int round = 0; round < 3; round++)
            for (int arm = 0; arm < 4; arm++)
                for (int k = 0; k < plotsPerRound[round][arm]; k++)
                    records.Add(new PlotRecord(arm, rng.NextInt(3), round + 1, 50 + 3 * arm + Samplers.StandardNormal(ref rng) * 4));
        return records;
    }

    [Theory]
    [InlineData(11UL)]
    [InlineData(12UL)]
    [InlineData(13UL)]
    public void Arm_means_and_their_covariance_match_least_squares(ulong seed)
    {
        var records = Uneven(seed);
        var fit = AdjustedModel.Fit(records, 4, ModelAdjustment.BlockAndRound, AdjustedModelPrior.Flat);
        var blocks = records.Select(r => r.Block).Distinct().Order().ToArray();
        var rounds = records.Select(r => r.Round).Distinct().Order().ToArray();

        // Reference: y = c + τ_arm + β_block + γ_round with the first level of each factor at zero; the arm's mean at the
        // average block and round is c + τ_arm + mean(β) + mean(γ), a linear combination L·θ.
        int p = 1 + 3 + (blocks.Length - 1) + (rounds.Length - 1);
        double[] Row(int arm, Func<int, double> block, Func<int, double> round)
        {
            var x = new double[p];
            x[0] = 1;
            if (arm > 0) x[arm] = 1;
            for (int j = 1; j < blocks.Length; j++) x[3 + j] = block(j);
            for (int k = 1; k < rounds.Length; k++) x[3 + blocks.Length - 1 + k] = round(k);
            return x;
        }
        var x = Matrix<double>.Build.DenseOfRowArrays(records.Select(r =>
            Row(r.Arm, j => blocks[j] == r.Block ? 1 : 0, k => rounds[k] == r.Round ? 1 : 0)));
        var y = Vector<double>.Build.DenseOfEnumerable(records.Select(r => r.Value));
        var theta = x.QR().Solve(y);
        var residual = y - x * theta;
        double mse = residual * residual / (records.Count - p);
        var unscaled = (x.TransposeThisAndMultiply(x)).Inverse();
        var l = Matrix<double>.Build.DenseOfRowArrays(Enumerable.Range(0, 4).Select(arm =>
            Row(arm, _ => 1.0 / blocks.Length, _ => 1.0 / rounds.Length)));
        var means = l * theta;
        var covariance = l * unscaled * l.Transpose() * mse;

        Assert.Equal(records.Count - p, fit.Posterior.Df, 12);
        NumericAssert.Relative(mse, fit.Posterior.NoiseScaleSquared!.Value, 1e-10, "MS_error");
        var joint = fit.ArmsJoint!;
        for (int i = 0; i < 4; i++)
        {
            NumericAssert.Relative(means[i], fit.ArmMean(i)!.Value, 1e-11, $"mean {i}");
            for (int k = 0; k < 4; k++)
                NumericAssert.Absolute(covariance[i, k], joint.Scale(i, k), 1e-10 * covariance[i, i], $"scale[{i},{k}]");
        }
    }

    [Fact]
    public void Arms_confounded_with_rounds_are_unidentified_exactly_where_the_estimability_rule_says()
    {
        // Arm 0 only in round 1 and arm 1 only in round 2, nothing linking the rounds: under round adjustment neither arm
        // mean is estimable (only μ0 + μ1 is). Arm 2 appears in both blocks of round 1 and is tied to arm 0 there.
        var records = new List<PlotRecord>
        {
            new(0, 0, 1, 10), new(0, 1, 1, 12), new(2, 0, 1, 9), new(2, 1, 1, 14), new(0, 0, 1, 11),
            new(1, 0, 2, 15), new(1, 1, 2, 13), new(1, 0, 2, 16),
        };
        var fit = AdjustedModel.Fit(records, 3, ModelAdjustment.BlockAndRound, AdjustedModelPrior.Flat);
        var reference = Estimable(records, fit.Columns);
        for (int arm = 0; arm < 3; arm++) Assert.Equal(reference[arm], fit.IsIdentified(arm));
        Assert.All(reference, identified => Assert.False(identified));

        // Without round adjustment every arm is identified (each has plots).
        var plain = AdjustedModel.Fit(records, 3, ModelAdjustment.Block, AdjustedModelPrior.Flat);
        Assert.Equal(new[] { 0, 1, 2 }, plain.IdentifiedArms);
    }

    [Theory]
    [InlineData(21UL)]
    [InlineData(22UL)]
    public void Identification_follows_the_estimability_rule_on_sparse_records(ulong seed)
    {
        // A few plots scattered over 4 arms, 4 blocks and 3 rounds: some arms are estimable, some are not.
        var rng = new Xoshiro256StarStar(seed);
        var records = Enumerable.Range(0, 9)
            .Select(_ => new PlotRecord(rng.NextInt(4), rng.NextInt(4), 1 + rng.NextInt(3), Samplers.StandardNormal(ref rng)))
            .ToList();
        var fit = AdjustedModel.Fit(records, 4, ModelAdjustment.BlockAndRound, AdjustedModelPrior.Flat);
        var reference = Estimable(records, fit.Columns);
        bool noise = fit.Posterior.NoiseIdentified;
        for (int arm = 0; arm < 4; arm++) Assert.Equal(reference[arm] && noise, fit.IsIdentified(arm));
    }

    // e_arm is estimable when appending it to X does not raise the rank (MathNet SVD rank), in the model's own coding.
    private static bool[] Estimable(List<PlotRecord> records, ModelColumns columns)
    {
        var rows = records.Select(r =>
        {
            var x = new double[columns.Count];
            x[r.Arm] = 1;
            Code(x, columns.FirstBlockColumn, columns.Blocks, r.Block);
            Code(x, columns.FirstRoundColumn, columns.Rounds, r.Round);
            return x;
        }).ToList();
        var matrix = Matrix<double>.Build.DenseOfRowArrays(rows);
        int rank = matrix.Rank();
        return Enumerable.Range(0, columns.Arms).Select(arm =>
        {
            var unit = new double[columns.Count];
            unit[arm] = 1;
            return Matrix<double>.Build.DenseOfRowArrays(rows.Append(unit)).Rank() == rank;
        }).ToArray();
    }

    // Deviation coding as documented on AdjustedModel: 1 in the level's column, −1 in every column for the last level.
    private static void Code(double[] x, int first, IReadOnlyList<int> levels, int label)
    {
        if (levels.Count < 2) return;
        int level = levels.ToList().IndexOf(label);
        if (level < levels.Count - 1) x[first + level] = 1;
        else
            for (int i = 0; i < levels.Count - 1; i++) x[first + i] = -1;
    }
}
