using System.Text;
using DesignCompiler.Rendering;
using DesignCompiler.Rendering.Output;
using DesignCompiler.Planning;
using DesignCompiler.Tests.Testing;

namespace DesignCompiler.Tests.Faults;

/// <summary>
/// Sheets are written under temporary names and renamed only when every file is complete, so a
/// failed write (a full disk, a write error part-way through a sheet) leaves no half-written sheet
/// under its final name, no temporary file behind, and the previous round's files as they were.
/// The failure is injected with <see cref="FailingStream"/>: these tests run as root, where file
/// permissions do not stop writes, and mounting a small filesystem is not possible everywhere.
/// </summary>
public sealed class SheetWriteFaultTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "trialc-faults-" + Guid.NewGuid().ToString("N"));

    public void Dispose()
    {
        if (Directory.Exists(_folder)) Directory.Delete(_folder, true);
    }

    private static IReadOnlyList<(string Name, byte[] Content)> CoverCropFiles()
    {
        var design = TestDesigns.Example("cover-crops.trial");
        var plan = RoundPlanner.For(design).Planner!.Plan(new TrialState(design.Arms.Count), 1).Plan!;
        var (files, problems) = RoundOutputs.Render(plan, design, "cover-crops");
        Assert.Empty(problems);
        return files;
    }

    [Theory]
    [InlineData(0, 0)]      // the disk is full from the first byte
    [InlineData(0, 700)]    // the first sheet (CSV) fails part-way
    [InlineData(1, 5000)]   // the HTML sheet fails part-way, after the CSV was complete
    [InlineData(3, 100)]    // the last file fails, after three were complete
    public void A_write_that_fails_part_way_leaves_no_sheet_and_no_temporary_file(int failingFile, long capacity)
    {
        var files = CoverCropFiles();
        var opened = 0;

        var failure = AtomicOutput.WriteAll(_folder, files,
            path => opened++ == failingFile ? new FailingStream(path, capacity) : new FileStream(path, FileMode.Create));

        Assert.NotNull(failure);
        Assert.Contains("No space left on device", failure);
        Assert.Equal(failingFile + 1, opened);
        // Nothing at all in the folder: no final name, no temporary.
        Assert.Empty(Directory.GetFileSystemEntries(_folder));
    }

    [Fact]
    public void A_failed_rewrite_keeps_the_previous_files_byte_for_byte()
    {
        var files = CoverCropFiles();
        Assert.Null(AtomicOutput.WriteAll(_folder, files));
        var before = Directory.GetFiles(_folder).Order(StringComparer.Ordinal).Select(File.ReadAllBytes).ToList();
        var changed = files.Select(f => (f.Name, Encoding.UTF8.GetBytes("changed " + f.Name))).ToList();
        var opened = 0;

        var failure = AtomicOutput.WriteAll(_folder, changed,
            path => opened++ == 2 ? new FailingStream(path, 3) : new FileStream(path, FileMode.Create));

        Assert.NotNull(failure);
        var after = Directory.GetFiles(_folder).Order(StringComparer.Ordinal).ToList();
        Assert.Equal(files.Select(f => f.Name).Order(StringComparer.Ordinal), after.Select(Path.GetFileName));
        Assert.Equal(before, after.Select(File.ReadAllBytes));
    }

    [Fact]
    public void A_folder_that_cannot_be_created_is_a_positioned_error_through_the_command_line()
    {
        // Root ignores permission bits, so the folder is made impossible instead: its parent is a regular file.
        Directory.CreateDirectory(_folder);
        var blocker = Path.Combine(_folder, "not-a-folder");
        File.WriteAllText(blocker, "");
        var target = Path.Combine(blocker, "round1");

        var run = Trialc.Invoke("compile", RepoPaths.Example("cover-crops.trial"), "--out", target);

        Assert.Equal(1, run.ExitCode);
        Assert.StartsWith(target + ": error TD5002: cannot write the output: ", run.Error);
        Assert.DoesNotContain("   at ", run.Error);
        Assert.Equal([blocker], Directory.GetFileSystemEntries(_folder));
    }
}
