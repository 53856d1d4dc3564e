namespace DesignCompiler.Fuzz;

/// <summary>
/// Runs a target once on each of its warm-up inputs before the fuzzing loop takes its first input,
/// so that no fuzzed input pays for loading the zip and XML libraries, the static set-up (the issued
/// round is planned and rendered) and compiling every method on the way: about a second in a fresh
/// process, the whole of afl's one-second limit. <see cref="WarmForkServer"/> says where it runs and
/// why afl's clock is not running then.
/// </summary>
internal static unsafe class WarmUp
{
    /// <summary>SharpFuzz's coverage map size (64 KiB, as afl's default map).</summary>
    private const int MapBytes = 1 << 16;

    public static void Run(IFuzzTarget target)
    {
        // Instrumented code counts edges through SharpFuzz.Common.Trace.SharedMem, which is null
        // until the loop attaches afl's shared map: point it at a scratch map meanwhile, so the
        // warm-up neither faults nor leaves its edges (static set-up runs once) in the first input's
        // trace. The loop overwrites the pointer when it attaches afl's map.
        var scratch = (byte*)System.Runtime.InteropServices.NativeMemory.AllocZeroed(MapBytes);
        SharpFuzz.Common.Trace.SharedMem = scratch;
        foreach (var input in target.WarmUpInputs())
        {
            try
            {
                target.Run(input);
            }
            catch (Exception)
            {
                // A warm-up input that fails is a finding, but the inputs are seeds or copies of
                // them, so afl meets and records the failure itself; here it would only stop the loop.
            }
        }
        SharpFuzz.Common.Trace.PrevLocation = 0;
    }
}
