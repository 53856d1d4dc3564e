using System.Globalization;
using System.Text;
using BenchmarkDotNet.Attributes;
using DesignCompiler.Cli;

namespace DesignCompiler.Benchmarks;

/// <summary>
/// The commands as <c>trialc</c> runs them, in this process (so .NET start-up is not counted): check of a
/// 1,000-arm design, compile of every shipped example, and the ledger's record of a 500-plot round.
/// </summary>
public class CommandBenchmarks
{
    private string _dir = "";
    private string _thousandArms = "";
    private string _ledgerTemplate = "";
    private string _returnedSheet = "";

    [GlobalSetup]
    public void Setup()
    {
        _dir = Directory.CreateTempSubdirectory("trialc-bench-").FullName;
        _thousandArms = Path.Combine(_dir, "thousand-arms.trial");
        File.WriteAllText(_thousandArms, ThousandArmDesign());

        // A ledger with round 1 of the 500-plot design issued, and its sheet filled in.
        var design = Path.Combine(_dir, "five-hundred-plots.trial");
        File.Copy(BenchmarkSetup.DesignPath("five-hundred-plots.trial"), design);
        _ledgerTemplate = Path.Combine(_dir, "template.ledger");
        Run("compile", design, "--ledger", _ledgerTemplate, "--out", Path.Combine(_dir, "round1"));
        var sheet = Path.Combine(_dir, "round1", "five-hundred-plots-round1.csv");
        _returnedSheet = Path.Combine(_dir, "returned.csv");
        File.WriteAllLines(_returnedSheet, FillOutcomes(File.ReadAllLines(sheet)));
    }

    [GlobalCleanup]
    public void Cleanup() => Directory.Delete(_dir, recursive: true);

    [Benchmark]
    public int CheckThousandArms() => Run("check", _thousandArms);

    [Benchmark]
    [Arguments("cover-crops")]
    [Arguments("nitrogen-rates")]
    [Arguments("germination")]
    [Arguments("aphid-margins")]
    [Arguments("bed-rotation")]
    public int CompileExample(string example) =>
        Run("compile", ExamplePath(example), "--out", Path.Combine(_dir, "out-" + example));

    [Benchmark]
    public int RecordFiveHundredPlots()
    {
        // Each operation records into a fresh copy of the same ledger (the copy is part of the time).
        var ledger = Path.Combine(_dir, "record.ledger");
        File.Copy(_ledgerTemplate, ledger, overwrite: true);
        return Run("record", Path.Combine(_dir, "five-hundred-plots.trial"), _returnedSheet, "--ledger", ledger);
    }

    private static int Run(params string[] args)
    {
        var exit = TrialcApp.Run(args, TextWriter.Null, TextWriter.Null);
        if (exit != 0) throw new InvalidOperationException($"trialc {string.Join(' ', args)} exited with {exit}");
        return exit;
    }

    private static string ExamplePath(string name)
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            var candidate = Path.Combine(dir.FullName, "examples", name + ".trial");
            if (File.Exists(candidate)) return candidate;
        }
        throw new FileNotFoundException("the shipped examples were not found above " + AppContext.BaseDirectory);
    }

    /// <summary>An invented screen of 1,000 lines, each with its own prior, a share limit and a scenario value.</summary>
    public static string ThousandArmDesign()
    {
        var text = new StringBuilder();
        text.AppendLine("trial \"Thousand line screen\" {");
        text.AppendLine("  seed 5");
        text.AppendLine("  rounds 3");
        text.AppendLine("  outcome emerged: bernoulli");
        text.AppendLine("  goal maximize");
        text.AppendLine("  policy thompson");
        for (var i = 0; i < 1000; i++)
            text.AppendLine(string.Create(CultureInfo.InvariantCulture, $"  arm L{i:D4} \"Line {i}\" prior beta({1 + i % 5}, {1 + i % 7})"));
        text.AppendLine("  control L0000");
        text.AppendLine("  block east plots 1500 layout 30 x 50");
        text.AppendLine("  block west plots 1500 layout 30 x 50");
        text.AppendLine("  limit every arm >= 1 plots per round");
        text.AppendLine("  limit every arm <= 2% per round");
        text.AppendLine("  limit control >= 1% per round");
        text.AppendLine("  limit L0007 stock 20 plots");
        text.Append("  scenario \"one better\" { every arm 0.5");
        text.AppendLine(" L0500 0.6 }");
        text.AppendLine("}");
        return text.ToString();
    }

    // Fills the outcome column (8th) of every data row: an invented pattern of ones and zeros.
    private static IEnumerable<string> FillOutcomes(string[] lines)
    {
        for (var i = 0; i < lines.Length; i++)
        {
            var fields = lines[i].Split(',');
            if (i > 0 && fields.Length >= 8 && fields[0] == "1") fields[7] = i % 3 == 0 ? "0" : "1";
            yield return string.Join(',', fields);
        }
    }
}
