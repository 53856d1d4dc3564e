using System.Text.Json;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Sheets;

/// <summary>An example compiled into a temporary folder (round 1 from the design alone), with its plan JSON at hand.</summary>
public sealed class CompiledRound : IDisposable
{
    public CompiledRound(string example, params string[] extra)
    {
        Stem = Path.GetFileNameWithoutExtension(example);
        Folder = Path.Combine(Path.GetTempPath(), "trialc-sheets-" + Guid.NewGuid().ToString("N"));
        Run = Trialc.Invoke(["compile", RepoPaths.Example(example), "--out", Folder, .. extra]);
        Assert.True(Run.ExitCode == 0, Run.Error);
        Plan = JsonDocument.Parse(System.IO.File.ReadAllText(File("json"))).RootElement.Clone();
    }

    public string Stem { get; }
    public string Folder { get; }
    public Trialc.Run Run { get; }
    public JsonElement Plan { get; }

    /// <summary>The round's output file with this extension (or suffix, such as "report.html").</summary>
    public string File(string extension) => Path.Combine(Folder, $"{Stem}-round1.{extension}");

    public string Text(string extension) => System.IO.File.ReadAllText(File(extension));

    /// <summary>The round report, written beside the sheets as STEM-round1-report.html.</summary>
    public string ReportText => System.IO.File.ReadAllText(Path.Combine(Folder, $"{Stem}-round1-report.html"));

    public string DesignHashShort => Plan.GetProperty("designHash").GetString()![..12];

    public string Seed => Plan.GetProperty("seed").GetRawText();

    public List<(string Name, int Plots)> Blocks =>
        Plan.GetProperty("blocks").EnumerateArray().Select(b => (b.GetProperty("name").GetString()!, b.GetProperty("plots").GetInt32())).ToList();

    public void Dispose()
    {
        if (Directory.Exists(Folder)) Directory.Delete(Folder, true);
    }
}
