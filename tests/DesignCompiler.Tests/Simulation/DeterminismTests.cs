using System.Globalization;
using DesignCompiler.Simulation;
using DesignCompiler.Simulation.Partials;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Simulation;

/// <summary>
/// The same design, seed and replications give byte-identical reports whatever the thread
/// count, however the replications are sharded, and under any culture (common practice for
/// reproducible Monte Carlo: one random stream per replication and order-independent sums).
/// </summary>
public sealed class DeterminismTests
{
    [Theory]
    [InlineData("cover-crops.trial")]
    [InlineData("nitrogen-rates.trial")]
    public void Json_is_identical_for_one_and_two_threads(string example)
    {
        var one = Trialc.Invoke("simulate", RepoPaths.Example(example), "--reps", "24", "--threads", "1", "--format", "json");
        var two = Trialc.Invoke("simulate", RepoPaths.Example(example), "--reps", "24", "--threads", "2", "--format", "json");
        Assert.Equal(0, one.ExitCode);
        Assert.Equal(one.Out, two.Out);
        Assert.Contains("\"replications\": 24", one.Out);
    }

    [Theory]
    [InlineData("cover-crops.trial")]
    [InlineData("nitrogen-rates.trial")]
    public void Four_merged_shards_give_the_json_of_one_run(string example)
    {
        var whole = Trialc.Invoke("simulate", RepoPaths.Example(example), "--reps", "21", "--format", "json");
        Assert.Equal(0, whole.ExitCode);
        var parts = Enumerable.Range(1, 4).Select(_ => SimulationFixtures.TempFile(".part.json")).ToArray();
        try
        {
            for (var k = 1; k <= 4; k++)
            {
                var run = Trialc.Invoke("simulate", RepoPaths.Example(example), "--reps", "21", "--threads", k % 2 == 0 ? "1" : "2",
                    "--shard", FormattableString.Invariant($"{k}/4"), "--out", parts[k - 1]);
                Assert.True(run.ExitCode == 0, run.Error);
            }
            // Merged in a scrambled order: the sums are exact, so order cannot matter.
            var merged = Trialc.Invoke("merge", parts[2], parts[0], parts[3], parts[1], "--format", "json");
            Assert.True(merged.ExitCode == 0, merged.Error);
            Assert.Equal(whole.Out, merged.Out);
        }
        finally
        {
            foreach (var part in parts) File.Delete(part);
        }
    }

    [Fact]
    public void German_culture_gives_the_same_json_and_partials()
    {
        var path = RepoPaths.Example("nitrogen-rates.trial");
        var invariant = Trialc.Invoke("simulate", path, "--reps", "24", "--format", "json");
        var design = TestDesigns.Example("nitrogen-rates.trial");
        var partial = PartialWriter.Write(SimulationFixtures.Run(design, 24, shard: new Shard(1, 2)));
        var savedCulture = CultureInfo.CurrentCulture;
        var savedUi = CultureInfo.CurrentUICulture;
        try
        {
            CultureInfo.CurrentCulture = new CultureInfo("de-DE");
            CultureInfo.CurrentUICulture = new CultureInfo("de-DE");
            var german = Trialc.Invoke("simulate", path, "--reps", "24", "--format", "json");
            Assert.Equal(invariant.Out, german.Out);
            Assert.Equal(partial, PartialWriter.Write(SimulationFixtures.Run(design, 24, shard: new Shard(1, 2))));
            var text = Trialc.Invoke("simulate", path, "--reps", "24");
            Assert.DoesNotMatch(@"\d,\d{2} ±", text.Out);
        }
        finally
        {
            CultureInfo.CurrentCulture = savedCulture;
            CultureInfo.CurrentUICulture = savedUi;
        }
    }

    [Fact]
    public void A_partial_summary_reads_back_to_the_same_text()
    {
        var design = TestDesigns.Example("cover-crops.trial");
        var text = PartialWriter.Write(SimulationFixtures.Run(design, 20, shard: new Shard(2, 3)));
        Assert.Equal(text, PartialWriter.Write(PartialReader.Read(text)));
    }

    [Fact]
    public void Comparison_json_is_identical_for_one_and_two_threads()
    {
        var a = RepoPaths.Example("cover-crops.trial");
        var one = Trialc.Invoke("compare", a, a, "--reps", "24", "--threads", "1", "--format", "json");
        var two = Trialc.Invoke("compare", a, a, "--reps", "24", "--threads", "2", "--format", "json");
        Assert.Equal(0, one.ExitCode);
        Assert.Equal(one.Out, two.Out);
    }
}
