using System.Globalization;
using DesignCompiler.Binding;
using DesignCompiler.Diagnostics;

namespace DesignCompiler.Tests.Language;

/// <summary>
/// Designs are read and messages are written the same under every culture: a German
/// culture, whose decimal separator is a comma, must neither change the bound numbers nor
/// what is printed.
/// </summary>
public sealed class CultureInvarianceTests
{
    private const string DesignWithDecimals = """
        trial "Winter wheat nitrogen rates" {
          seed 20261004
          rounds 3
          outcome yield "t/ha": normal noise unknown
          price 210.5 "EUR"
          policy top-two thompson beta 0.35
          default prior normal(mean 7.5, sd 1.25, noise 0.8 worth 4 plots)
          arm N0   "No nitrogen"
          arm N60  "60 kg N/ha" cost 66.75
          arm N120 "120 kg N/ha" cost 1.325e2
          plots 12 per round
          limit every arm <= 62.5% per round
          stop when loss <= 2.5 after round 2
          drop when best < 0.025
          scenario "plateau" { N0 5.9 N60 7.15 N120 8.05 noise 0.75 }
        }
        """;

    private static T UnderCulture<T>(string name, Func<T> action)
    {
        var before = CultureInfo.CurrentCulture;
        var beforeUi = CultureInfo.CurrentUICulture;
        try
        {
            CultureInfo.CurrentCulture = CultureInfo.GetCultureInfo(name);
            CultureInfo.CurrentUICulture = CultureInfo.GetCultureInfo(name);
            return action();
        }
        finally
        {
            CultureInfo.CurrentCulture = before;
            CultureInfo.CurrentUICulture = beforeUi;
        }
    }

    [Fact]
    public void A_design_with_decimals_binds_to_the_same_values_under_de_DE()
    {
        var german = UnderCulture("de-DE", () =>
        {
            Assert.Equal(",", CultureInfo.CurrentCulture.NumberFormat.NumberDecimalSeparator);
            return Checker.Bind(DesignWithDecimals);
        });
        var invariant = UnderCulture("", () => Checker.Bind(DesignWithDecimals));

        foreach (var design in new[] { german, invariant })
        {
            Assert.Equal(210.5, design.Valuation.Price);
            Assert.Equal(0.35, design.Policy.Parameter);
            var prior = Assert.IsType<NormalPriorSpec>(design.Arms[0].Prior);
            Assert.Equal(7.5, prior.Mean);
            Assert.Equal(1.25, prior.Sd);
            Assert.Equal(0.8, prior.NoiseGuess);
            Assert.Equal(4, prior.Worth);
            Assert.Equal(66.75, design.Arms[1].Cost);
            Assert.Equal(132.5, design.Arms[2].Cost);
            Assert.Equal(62.5, Assert.Single(design.Bounds).Amount);
            Assert.Equal(2.5, Assert.Single(design.StopRules).Criterion.Threshold);
            Assert.Equal(0.025, Assert.Single(design.DropRules).Criterion.Threshold);
            var scenario = Assert.Single(design.Scenarios);
            Assert.Equal(new[] { 5.9, 7.15, 8.05 }, scenario.TrueMeans);
            Assert.Equal(0.75, scenario.NoiseSd);
        }
    }

    [Fact]
    public void Messages_with_decimals_print_a_point_under_de_DE()
    {
        const string design = """
            trial "Peas" {
              seed 1
              rounds 2.5
              outcome yield "t/ha": normal noise sd 1.2
              default prior normal(mean 4.5, sd 1, noise 0.5)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """;
        var german = UnderCulture("de-DE", () => Checker.Render(design));
        Assert.Equal(UnderCulture("", () => Checker.Render(design)), german);
        Assert.Contains("not 2.5", german, StringComparison.Ordinal);
        Assert.Contains("(noise sd 1.2)", german, StringComparison.Ordinal);
    }

    [Fact]
    public void Every_golden_case_prints_the_same_under_de_DE()
    {
        var cases = Directory.EnumerateFiles(LanguagePaths.Cases, "*.trial", SearchOption.AllDirectories).ToList();
        Assert.NotEmpty(cases);
        var differing = UnderCulture("de-DE", () => cases
            .Where(path =>
            {
                var expected = Path.Combine(Path.GetDirectoryName(path)!, Path.GetFileNameWithoutExtension(path) + ".expected.txt");
                return File.Exists(expected)
                       && File.ReadAllText(expected).Replace("\r\n", "\n") !=
                       DiagnosticFormatter.FormatAll(Checker.Diagnose(Checker.ReadCase(path)));
            })
            .Select(path => Path.GetRelativePath(LanguagePaths.Cases, path))
            .ToList());
        Assert.Empty(differing);
    }
}
