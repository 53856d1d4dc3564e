using System.Diagnostics;
using System.IO.Pipes;

namespace DesignCompiler.Fuzz;

/// <summary>
/// afl's side of SharpFuzz's out-of-process mode, with one change: a loop process's pid is given to
/// afl only once that process has warmed up.
/// </summary>
/// <remarks>
/// SharpFuzz's out-of-process mode (2.3.0) does not fork. The program afl starts is a server: it
/// starts a second <c>dotnet</c> process with the same command line, which runs inputs in a loop,
/// and starts a fresh one whenever that dies (a timeout, a stack overflow). Its server tells afl the
/// new process's pid at once, and afl's clock for an input starts when it reads the pid, so a fresh
/// process's start-up and first use of every library were charged to one fuzzed input: in a
/// 30-minute run of the xlsx target, four inputs of 1 to 8 bytes saved as hangs in the first 10 s, and,
/// with a warm-up in the loop process alone, two of the three seeds timed out in afl's dry run.
/// This server waits for the loop process to say it is warm before it answers afl, so afl never
/// times a start-up. The loop process itself is still SharpFuzz's: it finds its pipes in the
/// environment variables below, which are SharpFuzz's own names (a SharpFuzz upgrade must keep them;
/// a fuzz run shows at once if it did not, as the loop process would start a server of its own).
/// </remarks>
internal static class WarmForkServer
{
    private const string ControlHandle = "__SHARPFUZZ_CTL", StatusHandle = "__SHARPFUZZ_ST",
        ParentId = "__SHARPFUZZ_PID", InitialRun = "__SHARPFUZZ_INIT";

    /// <summary>The harness's own variable: the pipe on which a loop process says it is warm.</summary>
    private const string ReadyHandle = "DESIGNCOMPILER_FUZZ_READY";

    /// <summary>afl's status for a process that died: WIFSIGNALED holds for it, so afl records a crash (as SharpFuzz's server sends).</summary>
    private const int Crashed = 2;

    public static bool UnderAfl => Environment.GetEnvironmentVariable("__AFL_SHM_ID") is not null;

    public static bool IsLoopProcess => Environment.GetEnvironmentVariable(ReadyHandle) is not null;

    /// <summary>In a loop process: warm up, then say so to the server.</summary>
    public static void WarmUpAndSignal(IFuzzTarget target)
    {
        WarmUp.Run(target);
        using var ready = new AnonymousPipeClientStream(PipeDirection.Out, Environment.GetEnvironmentVariable(ReadyHandle)!);
        ready.WriteByte(1);
    }

    /// <summary>Talks to afl on its fork-server descriptors (198 in, 199 out) until afl stops.</summary>
    public static void Serve()
    {
        using var fromAfl = new BinaryReader(new AnonymousPipeClientStream(PipeDirection.In, "198"));
        using var toAfl = new BinaryWriter(new AnonymousPipeClientStream(PipeDirection.Out, "199"));
        toAfl.Write(0);
        for (var initial = true; ; initial = false)
        {
            using var control = new AnonymousPipeServerStream(PipeDirection.Out, HandleInheritability.Inheritable);
            using var status = new AnonymousPipeServerStream(PipeDirection.In, HandleInheritability.Inheritable);
            using var ready = new AnonymousPipeServerStream(PipeDirection.In, HandleInheritability.Inheritable);
            var start = new ProcessStartInfo("dotnet", Environment.CommandLine);
            start.Environment[ControlHandle] = control.GetClientHandleAsString();
            start.Environment[StatusHandle] = status.GetClientHandleAsString();
            start.Environment[ParentId] = Environment.ProcessId.ToString(System.Globalization.CultureInfo.InvariantCulture);
            start.Environment[InitialRun] = initial.ToString();
            start.Environment[ReadyHandle] = ready.GetClientHandleAsString();
            using var loop = Process.Start(start)!;
            control.DisposeLocalCopyOfClientHandle();
            status.DisposeLocalCopyOfClientHandle();
            ready.DisposeLocalCopyOfClientHandle();
            // A loop process that dies while warming up would die again on every restart: stop, so
            // afl says its fork server is gone instead of charging the death to an input.
            if (ready.ReadByte() < 0) throw new InvalidOperationException("the fuzzing loop process died while warming up");

            using var toLoop = new BinaryWriter(control);
            using var fromLoop = new BinaryReader(status);
            while (true)
            {
                fromAfl.ReadInt32();
                toAfl.Write(loop.Id);
                int? result = null;
                try
                {
                    toLoop.Write(0);
                    result = fromLoop.ReadInt32();
                }
                catch (IOException)
                {
                    // A broken pipe: the loop process died (afl killed it on a timeout, or a stack overflow).
                }
                toAfl.Write(result ?? Crashed);
                if (result is null) break;
            }
        }
    }
}
