using DesignCompiler.Diagnostics;
using DesignCompiler.Syntax;
using DesignCompiler.Text;

namespace DesignCompiler.Tests.Language;

/// <summary>
/// One bad design per test, written out in full, with the exact diagnostic ids and the
/// line:column each one points at. Line 1 is the 'trial' line in every design below.
/// </summary>
public sealed class DiagnosticPositionTests
{
    private static void AssertReports(string design, params string[] expected) =>
        Assert.Equal(expected, Checker.IdsAndPositions(design));

    private static Diagnostic Single(string design)
    {
        var diagnostics = Checker.Diagnose(design);
        Assert.True(diagnostics.Count == 1, DiagnosticFormatter.FormatAll(diagnostics));
        return diagnostics[0];
    }

    // --- syntax ------------------------------------------------------------------

    [Fact]
    public void Unknown_statement_word_points_at_the_word_and_suggests_the_keyword()
    {
        var design = """
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
              rotaton PEAT rest 1 round
            }
            """;
        AssertReports(design, "TD1002 9:3");
        Assert.Equal("did you mean 'rotation'?", Single(design).Hint);
    }

    [Fact]
    public void Misspelt_keyword_inside_a_statement_points_at_the_misspelt_word()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              goal maximise
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD1001 5:8");
    }

    [Fact]
    public void Missing_closing_brace_points_at_the_end_of_the_file()
    {
        AssertReports("trial \"Peas\" {\n  seed 1\n  rounds 2\n  outcome nodulated: bernoulli\n  default prior beta(1, 1)\n" +
                      "  arm PEAT \"Peat\"\n  arm LIQ \"Liquid\"\n  plots 4 per round",
            "TD1005 8:20");
    }

    [Fact]
    public void Text_after_the_trial_points_at_the_first_word_after_the_brace()
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
            }
              stop when best > 0.9
            """, "TD1006 10:3");
    }

    [Fact]
    public void Missing_header_points_at_the_first_statement_and_the_statements_are_still_checked()
    {
        AssertReports("""
              seed 1
              rounds 0
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD1004 1:3", "TD2004 2:10");
    }

    [Fact]
    public void Unterminated_string_points_at_the_end_of_its_line()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD1001 6:17");
    }

    [Fact]
    public void Two_statements_on_one_line_point_at_the_second()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"  arm LIQ "Liquid"
              arm GRAN "Granules"
              plots 4 per round
            }
            """, "TD1003 6:20");
    }

    [Fact]
    public void A_statement_on_a_broken_line_is_not_also_reported_missing()
    {
        // 'rounds' did not parse, so "the design has no 'rounds' statement" would be noise.
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds two
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD1001 3:10");
    }

    [Fact]
    public void A_misspelt_statement_word_is_not_also_reported_missing()
    {
        AssertReports("""
            trial "Peas" {
              sed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD1002 2:3");
    }

    [Fact]
    public void Lines_that_name_an_arm_from_a_broken_arm_line_are_not_reported_as_unknown_arms()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ Liquid
              plots 4 per round
              limit LIQ >= 1 plot per round
              scenario "s" { PEAT 0.5 LIQ 0.6 }
            }
            """, "TD1001 7:11");
    }

    [Fact]
    public void Broken_lines_are_all_reported_in_one_run()
    {
        AssertReports("""
            trial "Peas" {
              seed one
              rounds 2
              outcome nodulated bernoulli
              policy epsilon-greedy 0.1
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per rund
            }
            """, "TD1001 2:8", "TD1001 4:21", "TD1001 5:25", "TD1001 9:15");
    }

    [Fact]
    public void Input_over_the_size_limit_is_one_diagnostic_at_the_start()
    {
        var huge = "trial \"Big\" {\n" + new string('#', DesignParser.MaxCharacters) + "\n}\n";
        AssertReports(huge, "TD1010 1:1");
    }

    // --- the trial as a whole --------------------------------------------------------

    [Fact]
    public void Non_whole_rounds_point_at_the_number()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2.5
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD2003 3:10");
    }

    [Fact]
    public void Zero_rounds_point_at_the_number()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 0
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD2004 3:10");
    }

    [Fact]
    public void Missing_seed_points_at_the_trial_name()
    {
        var design = """
            trial "Peas" {
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """;
        AssertReports(design, "TD2001 1:7");
        Assert.Equal(new TextSpan(6, "\"Peas\"".Length), Single(design).Location.Span);
    }

    [Fact]
    public void Missing_outcome_points_at_the_trial_name()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD2001 1:7");
    }

    [Fact]
    public void Repeated_statement_points_at_the_repeat()
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
              seed 2
            }
            """, "TD2002 9:3");
    }

    [Fact]
    public void Binomial_of_zero_points_at_the_number()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome pods "pods of 10": binomial of 0
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD2004 4:42");
    }

    [Fact]
    public void Normal_noise_sd_of_zero_points_at_the_number()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome yield "t/ha": normal noise sd 0
              default prior normal(mean 4, sd 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD2004 4:41");
    }

    // --- arms and priors -----------------------------------------------------------

    [Fact]
    public void Duplicate_arm_code_points_at_the_second_code()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              arm PEAT "Peat again"
              plots 4 per round
            }
            """, "TD2010 8:7");
    }

    [Fact]
    public void Unknown_arm_in_control_points_at_the_code_with_a_near_code_as_hint()
    {
        var design = """
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQUID "Liquid"
              control LIQIUD
              plots 4 per round
            }
            """;
        AssertReports(design, "TD2011 8:11");
        Assert.Equal("did you mean 'LIQUID'?", Single(design).Hint);
    }

    [Fact]
    public void Unknown_arm_in_a_limit_points_at_the_code_with_a_near_code_as_hint()
    {
        var design = """
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQUID "Liquid"
              plots 4 per round
              limit PAET >= 1 plot per round
            }
            """;
        AssertReports(design, "TD2011 9:9");
        Assert.Equal("did you mean 'PEAT'?", Single(design).Hint);
    }

    [Fact]
    public void Unknown_arm_in_a_scenario_points_at_the_code_with_a_near_code_as_hint()
    {
        var design = """
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQUID "Liquid"
              plots 4 per round
              scenario "s" { PEAT 0.5 LIQUIDS 0.6 }
            }
            """;
        AssertReports(design, "TD2011 9:27");
        Assert.Equal("did you mean 'LIQUID'?", Single(design).Hint);
    }

    [Fact]
    public void Unknown_arm_in_a_rotation_points_at_the_code_with_a_near_code_as_hint()
    {
        var design = """
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQUID "Liquid"
              plots 4 per round
              rotation LIQUID not after PEATS
            }
            """;
        AssertReports(design, "TD2011 9:29");
        Assert.Equal("did you mean 'PEAT'?", Single(design).Hint);
    }

    [Fact]
    public void Unknown_arm_with_no_near_code_lists_the_arms()
    {
        var design = """
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQUID "Liquid"
              control GRANULES
              plots 4 per round
            }
            """;
        AssertReports(design, "TD2011 8:11");
        Assert.Equal("arms are: PEAT, LIQUID", Single(design).Hint);
    }

    [Fact]
    public void Reserved_word_as_arm_code_points_at_the_code()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm every "Every other"
              plots 4 per round
            }
            """, "TD2012 7:7");
    }

    [Fact]
    public void Fewer_than_two_arms_points_at_the_last_arm()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              plots 4 per round
            }
            """, "TD2013 6:3");
    }

    [Fact]
    public void Gamma_prior_on_a_bernoulli_outcome_points_at_the_prior()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior gamma(shape 1, rate 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD2020 5:17");
    }

    [Fact]
    public void Beta_prior_on_a_normal_outcome_points_at_the_arm_prior()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome yield "t/ha": normal noise unknown
              default prior normal(mean 4, sd 1)
              arm PEAT "Peat" prior beta(2, 2)
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD2020 6:25");
    }

    [Fact]
    public void Normal_prior_on_a_count_outcome_points_at_the_prior()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodules "per root": count
              default prior normal(mean 4, sd 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD2020 5:17");
    }

    [Fact]
    public void Beta_prior_with_a_zero_parameter_points_at_the_zero()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 0)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD2004 5:25");
    }

    [Fact]
    public void Arm_without_prior_and_no_default_points_at_each_such_arm()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              arm PEAT "Peat"
              arm LIQ "Liquid" prior beta(1, 1)
              arm GRAN "Granules"
              plots 4 per round
            }
            """, "TD2021 5:7", "TD2021 7:7");
    }

    [Fact]
    public void Cost_without_price_points_at_the_cost()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat" cost 12
              arm LIQ "Liquid"
              plots 4 per round
            }
            """, "TD2024 6:19");
    }

    // --- the field -------------------------------------------------------------------

    [Fact]
    public void Duplicate_block_points_at_the_second_name()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              block north plots 4
              block north plots 6
            }
            """, "TD2014 9:9");
    }

    [Fact]
    public void Plots_and_blocks_mixed_points_at_the_plots_statement()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              block north plots 4
              plots 4 per round
            }
            """, "TD2015 9:3");
    }

    [Fact]
    public void Layout_that_does_not_hold_the_plots_points_at_rows_x_columns()
    {
        var design = """
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              block north plots 12 layout 3 x 5
            }
            """;
        AssertReports(design, "TD2016 8:31");
        Assert.Equal("3 x 5".Length, Single(design).Location.Span.Length);
    }

    // --- limits --------------------------------------------------------------------

    [Fact]
    public void Share_over_100_percent_points_at_the_number()
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
              limit LIQ <= 150% per round
            }
            """, "TD2004 9:16");
    }

    [Fact]
    public void Limit_on_control_without_a_control_points_at_the_word_control()
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
              limit control >= 1 plot per round
            }
            """, "TD2040 9:9");
    }

    [Fact]
    public void Availability_window_outside_the_trial_points_at_the_round_number()
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
              limit LIQ until round 3
            }
            """, "TD2045 9:25");
    }

    [Fact]
    public void Empty_availability_window_points_at_the_window()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 3
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
              limit LIQ from round 3 until round 1
            }
            """, "TD2045 9:13");
    }

    // --- feasibility of the limits ---------------------------------------------------

    [Fact]
    public void Minimums_exceeding_a_block_point_at_the_limit_with_a_note_on_the_block()
    {
        var design = """
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm A1 "Peat"
              arm A2 "Liquid"
              arm A3 "Granules"
              arm A4 "Seed coat"
              arm A5 "None"
              block north plots 16 layout 4 x 4
              limit every arm >= 4 plots per block
            }
            """;
        AssertReports(design, "TD2042 12:3");
        var note = Assert.Single(Single(design).RelatedLocations);
        Assert.Equal(new LinePosition(11, 3), note.Location.Start);
    }

    [Fact]
    public void Minimums_exceeding_a_round_point_at_the_limit()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              arm GRAN "Granules"
              plots 8 per round
              limit every arm >= 3 plots per round
            }
            """, "TD2042 10:3");
    }

    [Fact]
    public void Maximums_too_small_to_fill_a_round_point_at_the_limit()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm A1 "Peat"
              arm A2 "Liquid"
              arm A3 "Granules"
              arm A4 "None"
              plots 10 per round
              limit every arm <= 20% per round
            }
            """, "TD2043 11:3");
    }

    [Fact]
    public void Minimum_above_maximum_points_at_the_minimum_with_a_note_on_the_maximum()
    {
        var design = """
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 10 per round
              limit LIQ <= 2 plots per round
              limit LIQ >= 4 plots per round
            }
            """;
        AssertReports(design, "TD2041 10:3");
        var note = Assert.Single(Single(design).RelatedLocations);
        Assert.Equal(new LinePosition(9, 3), note.Location.Start);
        Assert.Equal("the maximum is set here", note.Note);
    }

    [Fact]
    public void Stock_smaller_than_the_minimums_it_must_cover_points_at_the_stock()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 3
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 10 per round
              limit LIQ >= 2 plots per round
              limit LIQ stock 5 plots
            }
            """, "TD2044 10:3");
    }

    // --- stopping and dropping ---------------------------------------------------------

    [Fact]
    public void Stop_threshold_over_one_points_at_the_number()
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
              stop when best > 1.01
            }
            """, "TD2004 9:20");
    }

    [Fact]
    public void Negative_loss_threshold_points_at_the_number()
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
              drop when loss <= -1
            }
            """, "TD2004 9:21");
    }

    // --- scenarios ---------------------------------------------------------------------

    [Fact]
    public void Scenario_value_above_one_for_bernoulli_points_at_the_value()
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
              scenario "s" { every arm 1.2 }
            }
            """, "TD2062 9:28");
    }

    [Fact]
    public void Negative_scenario_value_for_count_points_at_the_value()
    {
        AssertReports("""
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodules "per root": count
              default prior gamma(shape 2, rate 0.2)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
              scenario "s" { PEAT 10 LIQ -3 }
            }
            """, "TD2062 9:30");
    }

    [Fact]
    public void Scenario_missing_an_arm_points_at_the_scenario_name()
    {
        var design = """
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
              scenario "peat wins" { PEAT 0.8 }
            }
            """;
        AssertReports(design, "TD2061 9:12");
        Assert.Equal("scenario \"peat wins\" gives no value for arm LIQ", Single(design).Message);
    }

    [Fact]
    public void Scenario_noise_on_a_bernoulli_outcome_points_at_the_noise_entry()
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
              scenario "s" { every arm 0.5 noise 0.1 }
            }
            """, "TD2064 9:32");
    }

    [Fact]
    public void Duplicate_scenario_points_at_the_second_name()
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
              scenario "s" { every arm 0.5 }
              scenario "s" { from prior }
            }
            """, "TD2060 10:12");
    }

    // --- several mistakes, line endings, tabs ------------------------------------------

    [Fact]
    public void Several_mistakes_are_all_reported_sorted_by_position()
    {
        // Parser and binder problems interleave by position, not by stage.
        AssertReports("""
            trial "Peas" {
              seed 1.5
              rounds 2
              outcome nodulated: bernoulli
              policy thomson
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm PEAT "Peat again"
              arm LIQ "Liquid"
              contrl PEAT
              plots 4 per round
              stop when best >= 2
            }
            """, "TD2003 2:8", "TD1001 5:10", "TD2010 8:7", "TD1002 10:3", "TD2004 12:21");
    }

    public static TheoryData<string, string> LineEndings() => new()
    {
        { "LF", "\n" },
        { "CR LF", "\r\n" },
        { "CR", "\r" },
    };

    [Theory]
    [MemberData(nameof(LineEndings))]
    public void Line_endings_and_a_byte_order_mark_do_not_move_positions(string name, string newline)
    {
        var lines = new[]
        {
            "trial \"Peas\" {",
            "  seed 1",
            "  rounds 2",
            "  outcome nodulated: bernoulli",
            "  default prior beta(1, 1)",
            "  arm PEAT \"Peat\"",
            "  arm LIQ \"Liquid",
            "  plots 4 per round",
            "  polcy thompson",
            "  stop when best >= 1.5",
            "}",
        };
        string[] expected = ["TD1001 7:18", "TD1002 9:3", "TD2004 10:21"];
        var text = string.Join(newline, lines) + newline;
        Assert.True(expected.SequenceEqual(Checker.IdsAndPositions(text)), name);
        Assert.True(expected.SequenceEqual(Checker.IdsAndPositions("\uFEFF" + text)), name + " with a byte-order mark");
    }

    [Fact]
    public void A_tab_counts_as_one_column()
    {
        AssertReports("trial \"Peas\" {\n\tseed 1\n\trounds 2\n\toutcome nodulated: bernoulli\n\tdefault prior beta(1, 1)\n" +
                      "\tarm PEAT\t\"Peat\"\n\tarm LIQ\t\"Liquid\"\n\tplots 4 per round\n\tlimit\tLIX\t>= 1 plot per round\n}\n",
            "TD2011 9:8");
    }
}
