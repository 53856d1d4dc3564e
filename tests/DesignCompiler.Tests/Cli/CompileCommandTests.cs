using System.Globalization;
using System.Text.Json;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Cli;

/// <summary>trialc compile: the sheets and the plan, end to end.</summary>
public sealed class CompileCommandTests
{
    private static string TempDirectory() => Path.Combine(Path.GetTempPath(), "trialc-out-" + Guid.NewGuid().ToString("N"));

    [Fact]
    public void Compile_writes_csv_html_json_and_markdown_for_the_cover_crop_design()
    {
        var dir = TempDirectory();
        try
        {
            var run = Trialc.Invoke("compile", RepoPaths.Example("cover-crops.trial"), "--out", dir);
            Assert.Equal(0, run.ExitCode);
            foreach (var ext in new[] { "csv", "html", "json", "md", "xlsx" })
                Assert.True(File.Exists(Path.Combine(dir, "cover-crops-round1." + ext)), ext);
            Assert.Empty(Directory.GetFiles(dir, ".*partial*"));

            var csv = File.ReadAllText(Path.Combine(dir, "cover-crops-round1.csv"));
            var lines = csv.Split("\r\n", StringSplitOptions.RemoveEmptyEntries);
            // A '#' line traces the sheet; 'trialc record' skips it.
            Assert.Matches("^# Late-sown cover mixes; round 1 of 4; design [0-9a-f]{12}; seed 20260815; policy thompson; trialc \\d+\\.\\d+\\.\\d+$", lines[0]);
            Assert.Equal("round,block,plot,row,column,arm,label,outcome,notes", lines[1]);
            Assert.Equal(38, lines.Length);
            Assert.StartsWith("1,north,north-1-1,1,1,", lines[2]);
            // RFC 4180: a field with a comma is quoted; this label has none, so it stands bare.
            Assert.All(lines.Skip(2), l => Assert.EndsWith(",,", l));

            var html = File.ReadAllText(Path.Combine(dir, "cover-crops-round1.html"));
            Assert.Contains("product label, local regulations and qualified agronomic advice", html);
            Assert.Contains("Field map (4 rows &times; 5 columns)", html);
            Assert.Equal(2, html.Split("<section class=\"page\"").Length - 1);
        }
        finally
        {
            if (Directory.Exists(dir)) Directory.Delete(dir, true);
        }
    }

    public static TheoryData<string> Examples() =>
        [.. Directory.GetFiles(RepoPaths.Examples, "*.trial").Select(f => Path.GetFileName(f)).Order(StringComparer.Ordinal)];

    [Theory]
    [MemberData(nameof(Examples))]
    public void Every_example_compiles_to_csv_html_json_markdown_xlsx_and_the_round_report(string example)
    {
        var dir = TempDirectory();
        try
        {
            var run = Trialc.Invoke("compile", RepoPaths.Example(example), "--out", dir);
            Assert.True(run.ExitCode == 0, run.Error);
            var stem = Path.GetFileNameWithoutExtension(example);
            var expected = new[] { ".csv", ".html", ".json", ".md", ".xlsx", "-report.html" }.Select(e => $"{stem}-round1{e}").Order(StringComparer.Ordinal);
            Assert.Equal(expected, Directory.GetFiles(dir).Select(f => Path.GetFileName(f)).Order(StringComparer.Ordinal));
            Assert.All(Directory.GetFiles(dir), f => Assert.True(new FileInfo(f).Length > 500, f));
            foreach (var name in expected) Assert.Contains("  wrote " + Path.Combine(dir, name), run.Out);
        }
        finally
        {
            if (Directory.Exists(dir)) Directory.Delete(dir, true);
        }
    }

    [Fact]
    public void A_template_with_format_json_is_a_usage_error()
    {
        var run = Trialc.Invoke("compile", RepoPaths.Example("cover-crops.trial"), "--format", "json", "--template", "x.sbn");
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("--template writes a file beside the sheets; give --out DIR instead of --format json", run.Error);
        Assert.Equal("", run.Out);
    }

    [Fact]
    public void Json_plan_has_the_fields_scripts_rely_on()
    {
        var run = Trialc.Invoke("compile", RepoPaths.Example("cover-crops.trial"), "--format", "json");
        Assert.Equal(0, run.ExitCode);
        using var document = JsonDocument.Parse(run.Out);
        var root = document.RootElement;
        Assert.Equal("Late-sown cover mixes", root.GetProperty("trial").GetString());
        Assert.Equal(1, root.GetProperty("round").GetInt32());
        var arms = root.GetProperty("arms").EnumerateArray().ToList();
        Assert.Equal(["OV", "RC", "MP", "BP"], arms.Select(a => a.GetProperty("code").GetString()));
        Assert.Equal(36, arms.Sum(a => a.GetProperty("plots").GetInt32()));
        Assert.Equal(1.0, arms.Sum(a => a.GetProperty("probabilityBest").GetDouble()), 9);
        Assert.All(arms, a => Assert.True(a.TryGetProperty("posteriorMean", out _)));
        var blocks = root.GetProperty("blocks").EnumerateArray().ToList();
        Assert.Equal(["north", "south"], blocks.Select(b => b.GetProperty("name").GetString()));
        Assert.Equal(20, blocks[0].GetProperty("counts").EnumerateObject().Sum(p => p.Value.GetInt32()));
        var assignments = root.GetProperty("assignments").EnumerateArray().ToList();
        Assert.Equal(36, assignments.Count);
        Assert.Equal("north-1-1", assignments[0].GetProperty("plot").GetString());
        Assert.Equal(1, assignments[0].GetProperty("row").GetInt32());
    }

    [Fact]
    public void Compiling_twice_and_under_German_culture_gives_byte_identical_files()
    {
        var first = TempDirectory();
        var second = TempDirectory();
        var saved = CultureInfo.CurrentCulture;
        try
        {
            Assert.Equal(0, Trialc.Invoke("compile", RepoPaths.Example("nitrogen-rates.trial"), "--out", first).ExitCode);
            CultureInfo.CurrentCulture = new CultureInfo("de-DE");
            Assert.Equal(0, Trialc.Invoke("compile", RepoPaths.Example("nitrogen-rates.trial"), "--out", second).ExitCode);
            foreach (var file in Directory.GetFiles(first))
                Assert.Equal(File.ReadAllBytes(file), File.ReadAllBytes(Path.Combine(second, Path.GetFileName(file))));
            var json = File.ReadAllText(Path.Combine(second, "nitrogen-rates-round1.json"));
            Assert.DoesNotMatch("\\d,\\d{3}", json.Replace(", ", " "));
        }
        finally
        {
            CultureInfo.CurrentCulture = saved;
            foreach (var dir in new[] { first, second })
                if (Directory.Exists(dir)) Directory.Delete(dir, true);
        }
    }

    [Fact]
    public void An_unwritable_output_folder_is_an_error_not_a_crash()
    {
        var file = Path.GetTempFileName();
        try
        {
            // A file where the folder should be: the folder cannot be created.
            var run = Trialc.Invoke("compile", RepoPaths.Example("cover-crops.trial"), "--out", Path.Combine(file, "sub"));
            Assert.Equal(1, run.ExitCode);
            Assert.Contains("error TD5002: cannot write the output", run.Error);
        }
        finally
        {
            File.Delete(file);
        }
    }
}
