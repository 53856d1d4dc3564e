using DesignCompiler.Simulation.Running;

namespace DesignCompiler.Simulation.Accumulators;

/// <summary>
/// Streaming summary of every simulated trial of one scenario: integer counts and histograms,
/// and exact sums for real-valued figures. Memory does not grow with the number of
/// replications, and two summaries merge into exactly the summary of all their replications,
/// in any order (threads, shards).
/// </summary>
public sealed class ScenarioAccumulator
{
    public ScenarioAccumulator(int arms, int rounds, int plotsPerRound, double margin)
    {
        Arms = arms;
        Rounds = rounds;
        PlotsPerRound = plotsPerRound;
        Margin = margin;
        CumulativeRegret = NewMoments(rounds);
        CorrectAfterRound = new long[rounds];
        WithinMarginAfterRound = new long[rounds];
        StoppedAfterRound = new Histogram(rounds);
        InfeasibleAtRound = new Histogram(rounds);
        PlotsByRound = Enumerable.Range(0, arms * rounds).Select(_ => new Histogram(plotsPerRound)).ToArray();
        PlotsTotal = Enumerable.Range(0, arms).Select(_ => new Histogram(plotsPerRound * rounds)).ToArray();
        Bias = NewMoments(arms);
    }

    public int Arms { get; }
    public int Rounds { get; }
    public int PlotsPerRound { get; }
    public double Margin { get; }

    public long Replications { get; private set; }

    /// <summary>Regret summed over rounds 1..r+1, per trial.</summary>
    public Moments[] CumulativeRegret { get; }

    public Moments NonBestPlots { get; } = new();

    public Moments PlotsSown { get; } = new();

    public Moments RoundsRun { get; } = new();

    /// <summary>Trials whose leader after round r+1 is truly best / within the margin of best.</summary>
    public long[] CorrectAfterRound { get; }

    public long[] WithinMarginAfterRound { get; }

    /// <summary>Trials a stop rule ended, by the number of rounds recorded when it fired.</summary>
    public Histogram StoppedAfterRound { get; }

    /// <summary>Trials that met a round the limits could not fill, by the number of rounds recorded before it.</summary>
    public Histogram InfeasibleAtRound { get; }

    /// <summary>The planner's message for the lowest-numbered infeasible trial (lowest, so it does not depend on thread timing).</summary>
    public (long Replication, string Message)? FirstInfeasible { get; private set; }

    /// <summary>Plots of arm a in round r: index a·Rounds + r.</summary>
    public Histogram[] PlotsByRound { get; }

    public Histogram[] PlotsTotal { get; }

    /// <summary>Final sample mean − true θ per arm, over the trials where the arm has data.</summary>
    public Moments[] Bias { get; }

    public CalibrationBins Calibration { get; } = new();

    public Histogram Plots(int arm, int round) => PlotsByRound[arm * Rounds + round];

    public void Add(ReplicationRecord record)
    {
        Replications++;
        var cumulative = 0.0;
        for (var r = 0; r < Rounds; r++)
        {
            cumulative += record.RoundRegret[r];
            CumulativeRegret[r].Add(cumulative);
            if (record.IsBest(record.LeaderAfterRound[r])) CorrectAfterRound[r]++;
            if (record.IsWithin(record.LeaderAfterRound[r], Margin)) WithinMarginAfterRound[r]++;
        }
        NonBestPlots.Add(record.NonBestPlots);
        PlotsSown.Add(record.PlotsSown);
        RoundsRun.Add(record.RoundsRun);

        if (record.Ending == TrialEnding.Stopped) StoppedAfterRound.Add(record.RoundsRun);
        else if (record.Ending == TrialEnding.Infeasible)
        {
            InfeasibleAtRound.Add(record.RoundsRun);
            NoteInfeasible(record.Replication, record.InfeasibleMessage ?? "a round could not be filled");
        }

        for (var a = 0; a < Arms; a++)
        {
            var total = 0;
            for (var r = 0; r < Rounds; r++)
            {
                Plots(a, r).Add(record.Plots[a, r]);
                total += record.Plots[a, r];
            }
            PlotsTotal[a].Add(total);
            if (record.Observations[a] > 0) Bias[a].Add(record.SampleMean[a] - record.TrueMean[a]);
            Calibration.Add(record.FinalProbabilityBest[a], record.IsBest(a));
        }
    }

    public void Add(ScenarioAccumulator other)
    {
        if (other.Arms != Arms || other.Rounds != Rounds || other.PlotsPerRound != PlotsPerRound || other.Margin != Margin)
            throw new ArgumentException("Summaries of different simulations cannot be merged.");
        Replications += other.Replications;
        for (var r = 0; r < Rounds; r++)
        {
            CumulativeRegret[r].Add(other.CumulativeRegret[r]);
            CorrectAfterRound[r] += other.CorrectAfterRound[r];
            WithinMarginAfterRound[r] += other.WithinMarginAfterRound[r];
        }
        NonBestPlots.Add(other.NonBestPlots);
        PlotsSown.Add(other.PlotsSown);
        RoundsRun.Add(other.RoundsRun);
        StoppedAfterRound.Add(other.StoppedAfterRound);
        InfeasibleAtRound.Add(other.InfeasibleAtRound);
        if (other.FirstInfeasible is { } note) NoteInfeasible(note.Replication, note.Message);
        for (var i = 0; i < PlotsByRound.Length; i++) PlotsByRound[i].Add(other.PlotsByRound[i]);
        for (var a = 0; a < Arms; a++)
        {
            PlotsTotal[a].Add(other.PlotsTotal[a]);
            Bias[a].Add(other.Bias[a]);
        }
        Calibration.Add(other.Calibration);
    }

    internal void SetReplications(long replications) => Replications = replications;

    internal void NoteInfeasible(long replication, string message)
    {
        if (FirstInfeasible is null || replication < FirstInfeasible.Value.Replication) FirstInfeasible = (replication, message);
    }

    private static Moments[] NewMoments(int count) => Enumerable.Range(0, count).Select(_ => new Moments()).ToArray();
}
