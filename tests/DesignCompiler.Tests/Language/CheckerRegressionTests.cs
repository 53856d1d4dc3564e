namespace DesignCompiler.Tests.Language;

/// <summary>
/// Regression tests for problems once found in the parser, binder and feasibility check:
/// cascades of follow-on errors after a broken line, diagnostics out of order or repeated.
/// Every design is a small, otherwise valid one with a single mistake, so the expected
/// output is exactly one diagnostic (or none).
/// </summary>
public sealed class CheckerRegressionTests
{
    private static void AssertReports(string design, params string[] expected) =>
        Assert.Equal(expected, Checker.IdsAndPositions(design));

    [Fact]
    public void A_broken_header_is_reported_once()
    {
        AssertReports("""
            trial "Peas"
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD1004 1:1");
    }

    [Fact]
    public void A_broken_default_prior_line_does_not_make_every_arm_report_a_missing_prior()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD1001 5:26");
    }

    [Fact]
    public void A_broken_block_line_does_not_also_report_a_missing_plots_statement()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              block north plots 12 layot 3 x 4
            }
            """, "TD1003 8:24");
    }

    [Fact]
    public void A_broken_price_line_does_not_make_costs_report_a_missing_price()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome yield "t/ha": normal noise unknown
              price 180 EUR
              default prior normal(mean 4, sd 1)
              arm PEAT "Peat" cost 12
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD1003 5:13");
    }

    [Fact]
    public void A_control_naming_a_broken_arm_does_not_make_control_limits_report_a_missing_control()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ Liquid
              control LIQ
              plots 4 per round
              limit control >= 1 plot per round
            }
            """, "TD1001 7:11");
    }

    [Fact]
    public void A_broken_multi_line_scenario_does_not_close_the_trial()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
              scenario "peat wins" {
                PEAT 0.8
                LIQ high
              }
              stop when best >= 0.95
            }
            """, "TD1001 11:5");
    }

    [Fact]
    public void Any_keyword_of_the_language_is_refused_as_an_arm_code()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm stock "Farm-saved seed"
              arm round "Round seed"
              plots 4 per round
            }
            """, "TD2012 7:7", "TD2012 8:7");
    }

    [Fact]
    public void Feasibility_diagnostics_come_in_position_order()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 3
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              arm GRAN "Granules"
              plots 12 per round
              limit LIQ >= 5 plots per round
              limit LIQ <= 3 plots per round
              limit PEAT >= 2 plots per round
              limit PEAT stock 4 plots
            }
            """, "TD2041 10:3", "TD2044 13:3");
    }

    [Fact]
    public void A_per_block_clash_is_reported_once()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 12 per round
              limit LIQ >= 2 plots per block
              limit LIQ <= 1 plot per block
            }
            """, "TD2041 9:3");
    }

    [Fact]
    public void Two_statements_on_one_line_do_not_also_report_the_second_missing()
    {
        AssertReports("""
            trial "Peas" {
              seed 5 rounds 3
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD1003 2:10");
    }
}
