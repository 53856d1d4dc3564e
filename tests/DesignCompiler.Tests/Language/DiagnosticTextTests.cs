using DesignCompiler.Diagnostics;

namespace DesignCompiler.Tests.Language;

/// <summary>
/// The complete rendered text of a few diagnostics: the headline (file:line:col: severity id:
/// message), the source line with its line number, the caret line under the span, the hint,
/// notes with their own source lines, and the closing count.
/// </summary>
public sealed class DiagnosticTextTests
{
    [Fact]
    public void Unknown_statement_renders_headline_source_line_carets_and_hint()
    {
        const string design = """
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              polcy thompson
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """;
        Assert.Equal(
            "peas.trial:5:3: error TD1002: 'polcy' does not begin a statement\n" +
            " 5 |   polcy thompson\n" +
            "   |   ^^^^^\n" +
            "  = hint: did you mean 'policy'?\n" +
            "1 error, 0 warnings\n",
            Checker.Render(design, "peas.trial"));
    }

    [Fact]
    public void Layout_mismatch_renders_carets_under_rows_x_columns_and_a_two_digit_gutter()
    {
        const string design = """
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"

              # the north field
              block north plots 12 layout 3 x 5
            }
            """;
        Assert.Equal(
            "peas.trial:10:31: error TD2016: block 'north' has 12 plots but its layout 3 x 5 holds 15\n" +
            " 10 |   block north plots 12 layout 3 x 5\n" +
            "    |                               ^^^^^\n" +
            "  = hint: make the layout hold 12 plots, or the block have 15\n" +
            "1 error, 0 warnings\n",
            Checker.Render(design, "peas.trial"));
    }

    [Fact]
    public void Contradictory_limits_render_the_note_with_its_own_source_line()
    {
        const string design = """
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
        Assert.Equal(
            "peas.trial:10:3: error TD2041: every round: the limits on arm 'LIQ' ask for at least 4 and at most 2 plots per round\n" +
            " 10 |   limit LIQ >= 4 plots per round\n" +
            "    |   ^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^\n" +
            "peas.trial:9:3: note: the maximum is set here\n" +
            " 9 |   limit LIQ <= 2 plots per round\n" +
            "   |   ^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^\n" +
            "1 error, 0 warnings\n",
            Checker.Render(design, "peas.trial"));
    }

    [Fact]
    public void Unknown_arm_and_a_warning_render_in_order_with_both_counts()
    {
        const string design = """
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Peat"
              plots 4 per round
            	limit	PAET >= 1 plot per round
            }
            """;
        // The tab before 'limit' is printed as a space, so the carets stay under the code.
        Assert.Equal(
            "peas.trial:7:11: warning TD2017: arms 'PEAT' and 'LIQ' have the same label \"Peat\"; crews tell arms apart by label\n" +
            " 7 |   arm LIQ \"Peat\"\n" +
            "   |           ^^^^^^\n" +
            "peas.trial:9:8: error TD2011: there is no arm 'PAET'\n" +
            " 9 |  limit PAET >= 1 plot per round\n" +
            "   |        ^^^^\n" +
            "  = hint: did you mean 'PEAT'?\n" +
            "1 error, 1 warning\n",
            Checker.Render(design, "peas.trial"));
    }

    [Fact]
    public void A_clean_design_renders_nothing()
    {
        const string design = """
            trial "Peas" {
              seed 1
              rounds 2
              outcome nodulated: bernoulli
              default prior beta(1, 1)
              arm PEAT "Peat"
              arm LIQ "Liquid"
              plots 4 per round
            }
            """;
        Assert.Equal("", Checker.Render(design));
        Assert.Equal("", DiagnosticFormatter.FormatAll([]));
    }
}
