using SharpFuzz;

namespace DesignCompiler.Fuzz;

/// <summary>
/// <c>DesignCompiler.Fuzz TARGET</c> runs under afl-fuzz (SharpFuzz's out-of-process loop, so a
/// stack overflow is a recorded crash rather than a dead fork server, behind <see cref="WarmForkServer"/>).
/// <c>DesignCompiler.Fuzz TARGET --replay FILE...</c> runs saved inputs once each, outside the
/// fuzzer, and prints what each did: for triage, and to check a corpus after a fix.
/// </summary>
internal static class Program
{
    public static int Main(string[] args)
    {
        var target = args.Length > 0 ? FuzzTargets.Find(args[0]) : null;
        if (target is null) return Usage();

        if (args.Length > 1 && args[1] == "--replay") return Replay(target, args.Skip(2));
        if (args.Length == 3 && args[1] == "--write-seeds") return WriteSeeds(target, args[2]);
        if (args.Length > 1) return Usage();

        // Under afl this process is the fork server; the loop processes it starts warm up before
        // their first input (WarmForkServer says why it is not SharpFuzz's own server).
        if (WarmForkServer.UnderAfl && !WarmForkServer.IsLoopProcess)
        {
            WarmForkServer.Serve();
            return 0;
        }
        if (WarmForkServer.IsLoopProcess) WarmForkServer.WarmUpAndSignal(target);
        Fuzzer.OutOfProcess.Run(stream => target.Run(ReadAll(stream)));
        return 0;
    }

    private static int Replay(IFuzzTarget target, IEnumerable<string> paths)
    {
        // Warmed as the fuzzing loop is, so each time printed is the input's own, not the first input's start-up.
        var warming = System.Diagnostics.Stopwatch.GetTimestamp();
        WarmUp.Run(target);
        Console.WriteLine($"warm  {Elapsed(warming),8:F1} ms  (warm-up)");
        var failed = 0;
        foreach (var path in paths)
        {
            var started = System.Diagnostics.Stopwatch.GetTimestamp();
            try
            {
                target.Run(File.ReadAllBytes(path));
                Console.WriteLine($"ok    {Elapsed(started),8:F1} ms  {path}");
            }
            catch (Exception e)
            {
                failed++;
                Console.WriteLine($"FAIL  {Elapsed(started),8:F1} ms  {path}\n{e}");
            }
        }
        return failed == 0 ? 0 : 1;
    }

    private static int WriteSeeds(IFuzzTarget target, string directory)
    {
        Directory.CreateDirectory(directory);
        foreach (var (name, content) in target.GeneratedSeeds()) File.WriteAllBytes(Path.Combine(directory, name), content);
        return 0;
    }

    private static double Elapsed(long started) =>
        System.Diagnostics.Stopwatch.GetElapsedTime(started).TotalMilliseconds;

    private static byte[] ReadAll(Stream stream)
    {
        using var buffer = new MemoryStream();
        stream.CopyTo(buffer);
        return buffer.ToArray();
    }

    private static int Usage()
    {
        Console.Error.WriteLine("usage: DesignCompiler.Fuzz TARGET [--replay FILE... | --write-seeds DIR]");
        foreach (var t in FuzzTargets.All) Console.Error.WriteLine($"  {t.Name,-8} {t.Description}");
        return 2;
    }
}
