using System.Text.RegularExpressions;
using DesignCompiler.Tests.Ledger;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Sheets;

/// <summary>
/// <c>--template FILE.sbn</c>: the shipped letterhead renders for every example; a broken template is
/// refused at its line and column with nothing written; a template reads the model and nothing else.
/// </summary>
public sealed class UserTemplateTests
{
    private static string Letterhead => Path.Combine(RepoPaths.Examples, "templates", "letterhead-de.html.sbn");

    private static string TemporaryTemplate(string name, string text)
    {
        var folder = Path.Combine(Path.GetTempPath(), "trialc-template-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(folder);
        var path = Path.Combine(folder, name);
        File.WriteAllText(path, text);
        return path;
    }

    [Theory]
    [MemberData(nameof(CrewWorkbookTests.Examples), MemberType = typeof(CrewWorkbookTests))]
    public void The_shipped_letterhead_template_renders_one_german_page_per_block_for_every_example(string example)
    {
        using var round = new CompiledRound(example, "--template", Letterhead);
        var html = round.Text("letterhead-de.html");
        Assert.Contains($"  wrote {round.File("letterhead-de.html")}", round.Run.Out);
        Assert.Equal(round.Blocks.Count, Regex.Matches(html, "<section class=\"page\"").Count);
        Assert.Contains("<th>Parzelle</th>", html);
        Assert.Contains("<th>Ergebnis</th><th>Bemerkungen</th>", html);
        Assert.Contains($"Entwurf {round.DesignHashShort} &middot; Startwert {round.Seed}", html);
        // The built-in caution stays, beside the template's own German wording.
        Assert.Contains("product label, local regulations and qualified agronomic advice", html);
        Assert.Contains("Gebrauchsanleitung", html);
        Assert.DoesNotContain("{{", html);
        foreach (var (name, plots) in round.Blocks)
            Assert.Equal(plots, Regex.Matches(html, $"<tr><td>{Regex.Escape(name)}-[^<]*</td>").Count);
    }

    [Fact]
    public void A_template_that_does_not_parse_is_refused_at_its_line_and_column_and_nothing_is_written()
    {
        var template = TemporaryTemplate("broken.html.sbn", "<h1>{{ trial }}</h1>\n{{ for block in blocks }}\n<p>{{ block.name }</p>\n{{ end }}\n");
        var output = Path.Combine(Path.GetTempPath(), "trialc-none-" + Guid.NewGuid().ToString("N"));
        var run = Trialc.Invoke("compile", RepoPaths.Example("cover-crops.trial"), "--out", output, "--template", template);
        Assert.Equal(1, run.ExitCode);
        Assert.Matches($@"^{Regex.Escape(template)}:3:\d+: error TD6001: the template does not parse: ", run.Error);
        Assert.Contains("\n 3 | <p>{{ block.name }</p>\n", run.Error);
        Assert.Contains("= hint: templates are Scriban", run.Error);
        Assert.DoesNotContain("Exception", run.Error);
        Assert.Equal("", run.Out);
        Assert.False(Directory.Exists(output));
    }

    [Fact]
    public void A_misspelt_model_name_is_reported_where_it_is_with_the_name_it_was_meant_to_be()
    {
        var template = TemporaryTemplate("typo.txt.sbn", "{{ trial }}\n{{ for block in blocks }}\n  {{ block.plot_lsit }}\n{{ end }}\n");
        var output = Path.Combine(Path.GetTempPath(), "trialc-none-" + Guid.NewGuid().ToString("N"));
        var run = Trialc.Invoke("compile", RepoPaths.Example("cover-crops.trial"), "--out", output, "--template", template);
        Assert.Equal(1, run.ExitCode);
        Assert.StartsWith($"{template}:3:12: error TD6002: the template failed while rendering: Cannot get member with name plot_lsit\n", run.Error);
        Assert.Contains("= hint: did you mean 'plot_list'?", run.Error);
        Assert.False(Directory.Exists(output));
    }

    public static TheoryData<string, string, int> Refused() => new()
    {
        { "x {{ include 'sheet.html.sbn' }}", "include", 6 },
        { "{{ include_join ['a.sbn', 'b.sbn'] '' }}", "include_join", 4 },
        { "issued {{ date.now }}", "date.now", 11 },
        { "{{ date.utc_now | date.to_string '%F' }}", "date.utc_now", 4 },
        { "{{ math.random 1 100 }}", "math.random", 4 },
        { "{{ math.uuid }}", "math.uuid", 4 },
        { "{{ object.eval 'trial' }}", "object.eval", 4 },
    };

    [Theory]
    [MemberData(nameof(Refused))]
    public void Files_the_clock_randomness_and_running_text_are_refused_at_the_call(string text, string function, int column)
    {
        var template = TemporaryTemplate("refused.txt.sbn", text + "\n");
        var output = Path.Combine(Path.GetTempPath(), "trialc-none-" + Guid.NewGuid().ToString("N"));
        var run = Trialc.Invoke("compile", RepoPaths.Example("germination.trial"), "--out", output, "--template", template);
        Assert.Equal(1, run.ExitCode);
        Assert.StartsWith($"{template}:1:{column}: error TD6003: '{function}' is not available in a trialc template: ", run.Error);
        Assert.Contains("= hint: a template reads the model and nothing else", run.Error);
        Assert.False(Directory.Exists(output));
    }

    [Theory]
    // Records have methods, fields and a compiler-made EqualityContract; a template sees public properties only.
    [InlineData("{{ arms[0].get_type }}", "get_type")]
    [InlineData("{{ arms[0].equality_contract }}", "equality_contract")]
    [InlineData("{{ blocks[0].plot_list.get_enumerator }}", "get_enumerator")]
    public void Nothing_of_the_model_but_its_properties_can_be_reached(string text, string member)
    {
        var template = TemporaryTemplate("member.txt.sbn", text);
        var run = Trialc.Invoke("compile", RepoPaths.Example("germination.trial"), "--out", Path.Combine(Path.GetDirectoryName(template)!, "out"), "--template", template);
        Assert.Equal(1, run.ExitCode);
        Assert.Contains($"error TD6002: the template failed while rendering: Cannot get member with name {member}", run.Error);
    }

    [Fact]
    public void A_runaway_loop_ends_in_a_positioned_error()
    {
        var template = TemporaryTemplate("loop.txt.sbn", "{{ while true }}x{{ end }}");
        var run = Trialc.Invoke("compile", RepoPaths.Example("germination.trial"), "--out", Path.Combine(Path.GetDirectoryName(template)!, "out"), "--template", template);
        Assert.Equal(1, run.ExitCode);
        Assert.StartsWith($"{template}:1:4: error TD6002: the template failed while rendering: Exceeding number of iteration limit", run.Error);
    }

    [Fact]
    public void A_missing_template_file_is_a_clear_error()
    {
        var missing = Path.Combine(Path.GetTempPath(), "no-such-template-" + Guid.NewGuid().ToString("N") + ".sbn");
        var run = Trialc.Invoke("compile", RepoPaths.Example("germination.trial"), "--out", Path.GetTempPath(), "--template", missing);
        Assert.Equal(1, run.ExitCode);
        Assert.StartsWith($"{missing}: error TD6004: cannot read the template: no such file", run.Error);
    }

    [Fact]
    public void With_a_ledger_a_template_that_fails_while_rendering_issues_no_round()
    {
        using var trial = new LedgerTrial("cover-crops.trial");
        var template = TemporaryTemplate("late.txt.sbn", "{{ trial }}\n{{ blocks[0].nme }}\n");
        var failed = trial.Compile(1, "--template", template);
        Assert.Equal(1, failed.ExitCode);
        Assert.Contains($"{template}:2:14: error TD6002: ", failed.Error);
        Assert.Contains("did you mean 'name'?", failed.Error);
        Assert.False(Directory.Exists(trial.OutFolder(1)));
        Assert.False(File.Exists(trial.Ledger));

        // The round was not issued: compiling again issues round 1 as the ledger's first round entry.
        var good = TemporaryTemplate("plots.txt.sbn", "{{ for block in blocks }}{{ block.name }}: {{ block.plots }}\n{{ end }}");
        var run = trial.Compile(1, "--template", good);
        Assert.True(run.ExitCode == 0, run.Error);
        Assert.Contains("issued round 1 into the ledger", run.Out);
        Assert.Equal("north: 20\nsouth: 16\n", File.ReadAllText(Path.Combine(trial.OutFolder(1), "cover-crops-round1.plots.txt")));
    }

    [Fact]
    public void Status_renders_through_a_template_of_its_own_model_and_reports_its_errors_at_line_and_column()
    {
        using var trial = new LedgerTrial("aphid-margins.trial");
        trial.Issue(1);
        var template = TemporaryTemplate("standing.txt.sbn", "{{ trial }} after {{ rounds_recorded }} of {{ rounds }} rounds; seed {{ seed }}\n{{ for arm in arms }}{{ arm.code }} {{ arm.plots_issued }}\n{{ end }}");
        var run = Trialc.Invoke("status", trial.Design, "--ledger", trial.Ledger, "--template", template);
        Assert.True(run.ExitCode == 0, run.Error);
        Assert.StartsWith("Aphid", run.Out);
        Assert.Contains(" after 0 of ", run.Out);
        Assert.Matches(@"\n\w+ \d+\n", run.Out);

        var broken = TemporaryTemplate("broken.txt.sbn", "{{ for arm in arms }}\n{{ arm.plots_sown }}\n{{ end }}");
        var failed = Trialc.Invoke("status", trial.Design, "--ledger", trial.Ledger, "--template", broken);
        Assert.Equal(1, failed.ExitCode);
        Assert.StartsWith($"{broken}:2:8: error TD6002: ", failed.Error);

        // 'next' is three names in the status model; the nearest spelling, 'text', would be no help.
        var group = TemporaryTemplate("next.txt.sbn", "{{ trial }}: {{ next.text }}\n");
        var unknownGroup = Trialc.Invoke("status", trial.Design, "--ledger", trial.Ledger, "--template", group);
        Assert.Equal(1, unknownGroup.ExitCode);
        Assert.Contains("= hint: did you mean one of 'next_kind', 'next_round', 'next_text'?", unknownGroup.Error);
    }
}
